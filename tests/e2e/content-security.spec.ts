import { expect, test, type Page } from "@playwright/test";
import { eq } from "drizzle-orm";
import { db, closeDb } from "@/db";
import { projects } from "@/db/schema";
import { DEMO, ready, signIn } from "../pages/sign-in-page";
import { pageRoutes } from "../support/page-routes";

test.afterAll(async () => {
  await closeDb();
});

async function projectId(title: string) {
  const [p] = await db().select({ id: projects.id }).from(projects).where(eq(projects.title, title));
  return p.id;
}

/** Records CSP violations the page reports (the DOM event and the console message), from the first byte. */
async function watchViolations(page: Page): Promise<string[]> {
  const seen: string[] = [];
  await page.exposeFunction("__reportCsp", (line: string) => seen.push(line));
  await page.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) => {
      (window as unknown as { __reportCsp: (s: string) => void }).__reportCsp(`${e.effectiveDirective} blocked ${e.blockedURI || "inline"} on ${location.pathname}`);
    });
  });
  page.on("console", (msg) => {
    if (/Content Security Policy|Refused to (load|execute|apply)/i.test(msg.text())) seen.push(`console: ${msg.text()}`);
  });
  return seen;
}

// The demo's paludarium in cycling (client Hollis, crew Priya) has readings, a chart and photos.
const ROLES = [
  { role: "lead", email: DEMO.lead },
  { role: "crew", email: DEMO.crew2 },
  { role: "client", email: DEMO.client },
] as const;

for (const { role, email } of ROLES) {
  test(`every page passes the content security policy for the ${role}`, async ({ page }) => {
    test.setTimeout(420_000);
    const seen = await watchViolations(page);
    const id = await projectId("Brandt garden-room paludarium");
    const routes = pageRoutes().map((r) => r.replace("[id]", id).replace("[token]", "not-a-real-invitation-token"));
    expect(routes.length).toBeGreaterThan(15);

    // Signed out first: the landing, sign-in and invitation pages.
    for (const route of routes.filter((r) => r === "/" || r === "/sign-in" || r.startsWith("/invitation"))) {
      await page.goto(route);
      await ready(page);
    }
    await signIn(page, email);
    // Checking the password takes a moment by design (scrypt); a loaded machine can stretch it.
    await expect(page.getByTestId("signed-in-as")).toBeVisible({ timeout: 30_000 });

    for (const route of routes) {
      const res = await page.goto(route);
      expect(res, route).not.toBeNull();
      const csp = res!.headers()["content-security-policy"] ?? "";
      expect(csp, `${route} has a nonce-based policy`).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]{16,}'/);
      expect(res!.headers()["x-frame-options"]).toBe("DENY");
      expect(res!.headers()["x-content-type-options"]).toBe("nosniff");
      // Scripts ran under the policy: React hydrated the page.
      await ready(page);
    }
    expect(seen, `CSP violations for the ${role}`).toEqual([]);
  });
}

test("injected markup's inline handler is blocked and reported, so the watch above would see it", async ({ page }) => {
  const seen = await watchViolations(page);
  await page.goto("/sign-in");
  await ready(page);
  expect(seen).toEqual([]);
  // What a stored cross-site-scripting flaw would plant: an inline event handler.
  await page.evaluate(() => document.body.insertAdjacentHTML("beforeend", '<img src="/no-such-image.png" onerror="window.__ran = true">'));
  await expect.poll(() => seen.join("\n")).toMatch(/script-src/);
  expect(await page.evaluate(() => (window as unknown as { __ran?: boolean }).__ran)).toBeUndefined();
});

test("API answers carry nosniff, frame protection and a referrer policy", async ({ request }) => {
  const res = await request.get("/api/ping");
  expect(res.headers()["x-content-type-options"]).toBe("nosniff");
  expect(res.headers()["x-frame-options"]).toBe("DENY");
  expect(res.headers()["referrer-policy"]).toBe("strict-origin-when-cross-origin");
  expect(res.headers()["content-security-policy"]).toContain("frame-ancestors 'none'");
  // Served over plain HTTP here, so no HSTS (browsers ignore it over HTTP anyway: RFC 6797 §8.1).
  expect(res.headers()["strict-transport-security"]).toBeUndefined();
});
