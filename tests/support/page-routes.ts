import { readdirSync, statSync } from "node:fs";
import { join, relative } from "node:path";

/** Every page the app has, from the files under app/: route groups dropped, dynamic segments left for the caller to fill. */
export function pageRoutes(dir = "app"): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) out.push(...pageRoutes(path));
    else if (name === "page.tsx") {
      const route = "/" + relative("app", dir).split("/").filter((s) => s && !s.startsWith("(")).join("/");
      out.push(route);
    }
  }
  return out.sort();
}
