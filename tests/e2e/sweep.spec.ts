import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Browser, type Page } from "@playwright/test";
import { and, eq, isNull } from "drizzle-orm";
import { db, closeDb } from "@/db";
import { invoices, projects, quotes, users, visits } from "@/db/schema";
import { DEMO, ready, signIn } from "../pages/sign-in-page";
import { pageRoutes } from "../support/page-routes";

test.afterAll(async () => {
  await closeDb();
});

// A wide desktop and a common phone width, both in CSS pixels (common practice).
const SIZES = [
  { name: "desktop", width: 1440, height: 900 },
  { name: "phone", width: 390, height: 844 },
] as const;

const ROLES = [
  { role: "lead", email: DEMO.lead, home: /\/board$/ },
  { role: "crew", email: DEMO.crew2, home: /\/board$/ },
  { role: "client", email: DEMO.client, home: /\/portal$/ },
] as const;

// The eight sweeps only read, so they run side by side with each other and with the other browser tests.
test.describe.configure({ mode: "parallel" });

/**
 * Real ids from the demo data: the client's paludarium in cycling (crew Priya), a quote and an
 * invoice of one of the client's projects, and a routine service visit of a tank in service.
 */
async function demoIds() {
  const [p] = await db().select({ id: projects.id }).from(projects).where(eq(projects.title, "Brandt garden-room paludarium"));
  const [client] = await db().select({ id: users.id }).from(users).where(eq(users.email, DEMO.client));
  const [q] = await db()
    .select({ id: quotes.id })
    .from(quotes)
    .innerJoin(projects, eq(projects.id, quotes.projectId))
    .where(eq(projects.clientId, client.id))
    .limit(1);
  const [i] = await db()
    .select({ id: invoices.id })
    .from(invoices)
    .innerJoin(projects, eq(projects.id, invoices.projectId))
    .where(eq(projects.clientId, client.id))
    .limit(1);
  const [v] = await db()
    .select({ id: visits.id, projectId: visits.projectId })
    .from(visits)
    .where(and(eq(visits.kind, "service visit"), isNull(visits.cancelledAt)))
    .limit(1);
  return { projectId: p.id, quoteId: q?.id, invoiceId: i?.id, visit: v };
}

async function routesToVisit() {
  const ids = await demoIds();
  const none = "00000000-0000-4000-8000-000000000000";
  return pageRoutes().map((r) =>
    r
      // A visit report belongs to its own project, a tank in service.
      .replace("/projects/[id]/service/visits/[visitId]", ids.visit ? `/projects/${ids.visit.projectId}/service/visits/${ids.visit.id}` : `/projects/${ids.projectId}/service/visits/${none}`)
      .replace("[id]", ids.projectId)
      .replace("[quoteId]", ids.quoteId ?? none)
      .replace("[invoiceId]", ids.invoiceId ?? none)
      .replace("[token]", "not-a-real-invitation-token"),
  );
}

const signedOut = (r: string) => r === "/" || r === "/sign-in" || r.startsWith("/invitation");

/**
 * The pages axe also reads at the phone width. Its rules read the page's markup, which is the same at
 * both widths; what the phone adds is layout: the folded menu (on every page, so any of these reads
 * it), the board's stage switcher, and the pages built phone-first. Every page still gets the
 * sideways-scroll and console checks at both widths.
 */
const PHONE_AXE = [/^\/$/, /^\/sign-in$/, /^\/board$/, /^\/due$/, /^\/portal$/, /^\/account$/, /^\/projects\/[^/]+$/, /^\/projects\/[^/]+\/(install|water|service\/visits\/[^/]+)$/];

/**
 * Visits each route and lists what is wrong: sideways scroll, console errors, serious or critical axe
 * findings. Every "not found" answer is the same page, so axe reads it once per sweep.
 */
async function sweep(page: Page, routes: string[], axeFor: (route: string) => boolean = () => true): Promise<string[]> {
  const problems: string[] = [];
  let notFoundChecked = false;
  let errors: string[] = [];
  page.on("console", (msg) => {
    if (msg.type() === "error") errors.push(msg.text());
  });
  page.on("pageerror", (e) => errors.push(`uncaught: ${e.message}`));
  for (const route of routes) {
    errors = [];
    const res = await page.goto(route);
    await ready(page);
    const status = res?.status() ?? 0;
    // A page the role may not see answers 404 (or 403) on purpose; the browser logs that status once.
    const expected = status === 404 || status === 403 ? /Failed to load resource: the server responded with a status of 40[34]/ : null;
    const unexpected = errors.filter((e) => !(expected && expected.test(e)));
    if (unexpected.length) problems.push(`${route}: console ${unexpected.join(" | ")}`);
    const { scrollWidth, innerWidth } = await page.evaluate(() => ({ scrollWidth: document.documentElement.scrollWidth, innerWidth: window.innerWidth }));
    if (scrollWidth > innerWidth) problems.push(`${route}: scrolls sideways (${scrollWidth} > ${innerWidth})`);
    if (expected) {
      if (notFoundChecked) continue;
      notFoundChecked = true;
    } else if (!axeFor(route)) continue;
    // Only violations are asked for: gathering every passing node is most of axe's time on a long page.
    const axe = await new AxeBuilder({ page }).options({ resultTypes: ["violations"] }).analyze();
    for (const v of axe.violations.filter((v) => v.impact === "serious" || v.impact === "critical")) {
      problems.push(`${route}: axe ${v.impact} ${v.id} at ${v.nodes.map((n) => n.target.join(" ")).slice(0, 3).join(", ")}`);
    }
  }
  return problems;
}

const axeAt = (size: (typeof SIZES)[number]) => (route: string) => size.name === "desktop" || PHONE_AXE.some((p) => p.test(route));

async function contextFor(browser: Browser, size: (typeof SIZES)[number]) {
  const phone = size.name === "phone";
  return browser.newContext({ viewport: { width: size.width, height: size.height }, isMobile: phone, hasTouch: phone });
}

for (const size of SIZES) {
  const axeWords = size.name === "desktop" ? "no serious accessibility finding" : "no serious accessibility finding on the pages the phone lays out its own way";
  test(`signed-out pages at ${size.width}px: no sideways scroll, no console error, ${axeWords}`, async ({ browser }) => {
    test.setTimeout(120_000);
    const context = await contextFor(browser, size);
    const page = await context.newPage();
    const problems = await sweep(page, (await routesToVisit()).filter(signedOut), axeAt(size));
    await context.close();
    expect(problems).toEqual([]);
  });

  for (const { role, email, home } of ROLES) {
    test(`every page for the ${role} at ${size.width}px: no sideways scroll, no console error, ${axeWords}`, async ({ browser }) => {
      test.setTimeout(600_000);
      const routes = (await routesToVisit()).filter((r) => !signedOut(r));
      expect(routes.length).toBeGreaterThan(15);
      const context = await contextFor(browser, size);
      const page = await context.newPage();
      await signIn(page, email);
      // Checking the password takes a moment by design (scrypt); a loaded machine can stretch it.
      await expect(page).toHaveURL(home, { timeout: 30_000 });
      const problems = await sweep(page, routes, axeAt(size));
      await context.close();
      expect(problems).toEqual([]);
    });
  }
}
