/**
 * First load on a slow phone, against an app serving the demo (started by scripts/bench.sh on
 * BENCH_DEMO_URL): /board as the lead, a demo project's install day as the lead, /portal as the demo
 * client. Each page opens in a fresh browser context (empty cache) with the CPU slowed 4× and a slow
 * 4G link through the DevTools protocol, and reports the largest contentful paint and the JavaScript
 * shipped (compressed as sent, and gzipped here for a figure that doesn't depend on the server).
 * Targets: LCP < 2.5 s ("good" in web.dev's Core Web Vitals), ≤ 200 kB of JavaScript compressed.
 * Figures are printed, not enforced.
 */
import { gzipSync } from "node:zlib";
import { chromium, type BrowserContext } from "@playwright/test";
import { eq } from "drizzle-orm";
import { closeDb, db } from "../db";
import { projects, users } from "../db/schema";
import { signInCookies } from "./lib/bench-http";

const BASE = process.env.BENCH_DEMO_URL ?? "http://127.0.0.1:3198";
const PASSWORD = "demo-tank-2026";
const LEAD = "maren@saltmarsh-stone.test";
const CLIENT = "hollis@client.test";
// Slow 4G as used for phone tests (common practice): 150 ms round trip, 1.6 Mbit/s down, 750 kbit/s up.
const NETWORK = { offline: false, latency: 150, downloadThroughput: (1.6 * 1024 * 1024) / 8, uploadThroughput: (750 * 1024) / 8 };
const CPU_SLOWDOWN = 4;
const RUNS = Number(process.env.BENCH_PHONE_RUNS ?? 3);

async function cookieFor(email: string) {
  const jar = await signInCookies(BASE, email, PASSWORD);
  const host = new URL(BASE).hostname;
  return [...jar].map(([name, value]) => ({ name, value, domain: host, path: "/" }));
}

const browser = await chromium.launch({
  executablePath: "/usr/bin/chromium",
  args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
});

async function phoneContext(cookies: Awaited<ReturnType<typeof cookieFor>>): Promise<BrowserContext> {
  const context = await browser.newContext({ viewport: { width: 390, height: 844 }, deviceScaleFactor: 3, isMobile: true, hasTouch: true });
  await context.addCookies(cookies);
  // The last largest-contentful-paint entry is the page's LCP.
  await context.addInitScript(() => {
    const w = window as unknown as { __lcp: number | null; __lcpWhat: string };
    w.__lcp = null;
    w.__lcpWhat = "";
    new PerformanceObserver((list) => {
      for (const e of list.getEntries() as (PerformanceEntry & { element?: Element | null; size?: number })[]) {
        w.__lcp = e.startTime;
        const el = e.element;
        w.__lcpWhat = el ? `<${el.tagName.toLowerCase()}> "${(el.textContent ?? "").trim().slice(0, 40)}"` : "(removed element)";
      }
    }).observe({ type: "largest-contentful-paint", buffered: true });
  });
  return context;
}

async function firstLoad(path: string, cookies: Awaited<ReturnType<typeof cookieFor>>) {
  const context = await phoneContext(cookies);
  const page = await context.newPage();
  const cdp = await page.context().newCDPSession(page);
  await cdp.send("Network.enable");
  await cdp.send("Network.emulateNetworkConditions", NETWORK);
  await cdp.send("Emulation.setCPUThrottlingRate", { rate: CPU_SLOWDOWN });
  const scripts: Promise<{ url: string; sent: number; gzipped: number }>[] = [];
  page.on("response", (res) => {
    if (res.request().resourceType() !== "script") return;
    scripts.push(
      (async () => {
        const [sizes, body] = await Promise.all([res.request().sizes(), res.body().catch(() => Buffer.alloc(0))]);
        return { url: res.url(), sent: sizes.responseBodySize, gzipped: gzipSync(body, { level: 9 }).byteLength };
      })(),
    );
  });
  const res = await page.goto(`${BASE}${path}`, { waitUntil: "load", timeout: 120_000 });
  await page.waitForLoadState("networkidle", { timeout: 60_000 }).catch(() => {});
  const { lcp, what, fcp, html, css } = await page.evaluate(() => {
    const w = window as unknown as { __lcp: number | null; __lcpWhat: string };
    const nav = performance.getEntriesByType("navigation")[0] as PerformanceNavigationTiming | undefined;
    const paint = performance.getEntriesByName("first-contentful-paint")[0];
    const res = performance.getEntriesByType("resource") as PerformanceResourceTiming[];
    const css = res.filter((r) => r.initiatorType === "link" && r.name.includes(".css"));
    return {
      lcp: w.__lcp,
      what: w.__lcpWhat,
      fcp: paint?.startTime ?? null,
      html: nav ? { end: nav.responseEnd, bytes: nav.transferSize } : null,
      css: css.map((r) => ({ end: r.responseEnd, bytes: r.transferSize })),
    };
  });
  const js = await Promise.all(scripts);
  await context.close();
  return { status: res?.status() ?? 0, finalPath: new URL(page.url()).pathname, lcp, what, fcp, html, css, sent: js.reduce((a, s) => a + s.sent, 0), gzipped: js.reduce((a, s) => a + s.gzipped, 0), files: js.length, js };
}

const [install] = await db().select({ id: projects.id, title: projects.title }).from(projects).where(eq(projects.stage, "aquascape")).limit(1);
const [client] = await db().select({ id: users.id }).from(users).where(eq(users.email, CLIENT));
await closeDb();
if (!install || !client) throw new Error("The demo isn't loaded on the phone benchmark's database.");

const lead = await cookieFor(LEAD);
const hollis = await cookieFor(CLIENT);
const pages = [
  { label: "/board (lead)", path: "/board", cookies: lead },
  { label: `install day (${install.title})`, path: `/projects/${install.id}/install`, cookies: lead },
  { label: "/portal (demo client)", path: "/portal", cookies: hollis },
];
console.log(`phone: CPU ÷${CPU_SLOWDOWN}, ${NETWORK.latency} ms RTT, 1.6 Mbit/s down, 750 kbit/s up, empty cache; median LCP of ${RUNS} loads`);
console.log(`${"page".padEnd(48)} ${"LCP ms".padStart(7)}  ${"JS sent kB".padStart(10)}  ${"JS gzip kB".padStart(10)}  files  targets (LCP < 2500 ms, JS ≤ 200 kB)`);
const details: string[] = [];
for (const p of pages) {
  const runs = [];
  for (let i = 0; i < RUNS; i++) runs.push(await firstLoad(p.path, p.cookies));
  const lcps = runs.map((r) => r.lcp ?? Number.POSITIVE_INFINITY).sort((a, b) => a - b);
  const lcp = lcps[Math.floor(lcps.length / 2)];
  const last = runs.at(-1)!;
  const ok = lcp < 2500 && last.gzipped / 1000 <= 200;
  const where = last.finalPath === p.path ? "" : ` (ended on ${last.finalPath}, status ${last.status})`;
  console.log(`${p.label.padEnd(48)} ${lcp.toFixed(0).padStart(7)}  ${(last.sent / 1000).toFixed(1).padStart(10)}  ${(last.gzipped / 1000).toFixed(1).padStart(10)}  ${String(last.files).padStart(5)}  ${ok ? "met" : "NOT met"}${where}`);
  const biggest = [...last.js].sort((a, b) => b.gzipped - a.gzipped).slice(0, 4);
  const cssEnd = Math.max(0, ...last.css.map((c) => c.end));
  details.push(
    `${p.label}: FCP ${last.fcp?.toFixed(0)} ms; LCP element ${last.what}; HTML ${((last.html?.bytes ?? 0) / 1000).toFixed(1)} kB sent, done at ${last.html?.end.toFixed(0)} ms; CSS ${(last.css.reduce((a, c) => a + c.bytes, 0) / 1000).toFixed(1)} kB, done at ${cssEnd.toFixed(0)} ms`,
  );
  details.push(`${p.label}: largest scripts ${biggest.map((s) => `${s.url.split("/").pop()} ${(s.gzipped / 1000).toFixed(1)} kB`).join(", ")}`);
}
console.log(details.join("\n"));
await browser.close();
