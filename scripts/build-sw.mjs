// Builds the service worker (sw/service-worker.ts, with serwist) into public/sw.js before `next build`.
// Next's own bundler doesn't build service workers, and a file in public/ is served at /sw.js with
// the site-wide scope the worker needs. The output is generated, so it is git-ignored.
import { build } from "esbuild";

await build({
  entryPoints: ["sw/service-worker.ts"],
  outfile: "public/sw.js",
  bundle: true,
  format: "iife",
  target: "es2020",
  minify: true,
  legalComments: "none",
  define: { "process.env.NODE_ENV": '"production"' },
  logLevel: "warning",
});
