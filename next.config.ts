import type { NextConfig } from "next";
import { API_CSP, STATIC_SECURITY_HEADERS } from "./lib/http/security-headers";

const nextConfig: NextConfig = {
  // The test run builds into its own folder so it never clashes with a running dev or demo server.
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  poweredByHeader: false,
  serverExternalPackages: ["pg", "sharp", "heic-decode", "libheif-js", "bcryptjs", "nodemailer", "graphile-worker", "rate-limiter-flexible"],
  // Types are checked once, for the whole repository, by `tsc` in the test run.
  typescript: { ignoreBuildErrors: true },
  // Pages get their nonce-based policy and HSTS from proxy.ts; these apply to every response.
  async headers() {
    return [
      { source: "/:path*", headers: STATIC_SECURITY_HEADERS },
      { source: "/api/:path*", headers: [{ key: "Content-Security-Policy", value: API_CSP }] },
    ];
  },
};

export default nextConfig;
