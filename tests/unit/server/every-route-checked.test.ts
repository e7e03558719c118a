import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { isCheckedRoute } from "@/server/route";
import { isCheckedAction } from "@/server/action";

const ROOT = fileURLToPath(new URL("../../..", import.meta.url));
const METHODS = new Set(["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"]);
// Route segment settings Next reads from a route file; they are values, not endpoints.
const SEGMENT_CONFIG = new Set(["dynamic", "revalidate", "runtime", "fetchCache", "preferredRegion", "maxDuration", "dynamicParams"]);
// The auth library's own endpoints (sign-in, sign-out, CSRF token) check their own CSRF token and
// body; they are the one place a session is made rather than read.
const OWN_CHECKS = new Set(["app/api/auth/[...nextauth]/route.ts"]);

function walk(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) walk(path, out);
    else if (/\.(ts|tsx)$/.test(name)) out.push(path);
  }
  return out;
}

const rel = (p: string) => relative(ROOT, p).split("\\").join("/");
const routeFiles = walk(join(ROOT, "app/api")).filter((p) => /\/route\.tsx?$/.test(p));
const serverActionFiles = [...walk(join(ROOT, "app")), ...walk(join(ROOT, "server")), ...walk(join(ROOT, "components"))].filter((p) =>
  /^\s*["']use server["']/.test(readFileSync(p, "utf8")),
);

describe("every endpoint goes through the checked wrappers", () => {
  it("finds the route files and server actions to check", () => {
    expect(routeFiles.length).toBeGreaterThan(30);
    expect(serverActionFiles.length).toBeGreaterThan(0);
  });

  it.each(routeFiles.map(rel))("%s exports only wrapped handlers", async (file) => {
    if (OWN_CHECKS.has(file)) return;
    const mod = (await import(join(ROOT, file))) as Record<string, unknown>;
    const exported = Object.keys(mod).filter((k) => !SEGMENT_CONFIG.has(k));
    expect(exported.length, `${file} exports no handler`).toBeGreaterThan(0);
    for (const name of exported) {
      expect(METHODS.has(name), `${file} exports ${name}, which is not an HTTP method`).toBe(true);
      expect(isCheckedRoute(mod[name]), `${file}: ${name} is not made by publicRoute, userRoute or projectRoute`).toBe(true);
    }
  });

  it.each(serverActionFiles.map(rel))("%s exports only checked actions", async (file) => {
    const mod = (await import(join(ROOT, file))) as Record<string, unknown>;
    for (const [name, value] of Object.entries(mod)) {
      expect(isCheckedAction(value), `${file}: ${name} is not made by action or projectAction`).toBe(true);
    }
  });
});
