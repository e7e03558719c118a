/**
 * The HTTP benchmark in one run, against the running app (started by scripts/bench.sh with
 * BENCH_TIMING=1): the bare GET /api/ping, a signed-in trivial read (GET /api/me/units), the board
 * (GET /api/projects) with 500 active projects, then again after 2,000 tanks in service are added;
 * each at 1 and 4 connections, with p50, p97.5 and req/s, the ratios we aim for, where a board
 * read's time goes (from the Server-Timing header) and the SQL queries per board read.
 * Figures are printed, not enforced.
 */
import { BASE, DURATION, LEAD, measure, signIn } from "./lib/bench-http";
import { eq } from "drizzle-orm";
import { closeDb, db, pool } from "../db";
import { users } from "../db/schema";
import { getBoard } from "../db/queries/board";
import { seedInService } from "./bench-seed-in-service";

const CONNECTION_SETS = (process.env.BENCH_CONNECTIONS ?? "1,4").split(",").map(Number);
const IN_SERVICE = Number(process.env.BENCH_IN_SERVICE ?? 2000);
type Run = Awaited<ReturnType<typeof measure>>;

const cookie = await signIn();
const get = (path: string) => fetch(`${BASE}${path}`, { headers: { cookie } });

async function warm(path: string, connections: number) {
  await Promise.all(Array.from({ length: connections }, async () => {
    for (let i = 0; i < 50; i++) await (await get(path)).arrayBuffer();
  }));
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length ? s[Math.floor(s.length / 2)] : 0;
};

/** Median of each Server-Timing part over `n` sequential reads, beside the time the client saw. */
async function breakdown(path: string, n = 100) {
  const parts = new Map<string, number[]>();
  const seen: number[] = [];
  for (let i = 0; i < n; i++) {
    const start = performance.now();
    const res = await get(path);
    await res.arrayBuffer();
    seen.push(performance.now() - start);
    for (const entry of (res.headers.get("server-timing") ?? "").split(",")) {
      const m = /^\s*([\w-]+);dur=([\d.]+)/.exec(entry);
      if (m) parts.set(m[1], [...(parts.get(m[1]) ?? []), Number(m[2])]);
    }
  }
  return { seen: median(seen), parts: [...parts].map(([name, xs]) => ({ name, ms: median(xs) })) };
}

const WORDS: Record<string, string> = {
  session: "session check (cookie decrypt + cached account)",
  handler: "handler (everything below, and the response object)",
  q_cards: "  query: cards, people, unread, in-service count",
  q_gate_facts: "  query: gate facts",
  q_cycle_inputs_x4: "  queries: cycle rules, starts, readings, doses (4)",
  q_durations: "  query: stage durations",
  cards_built: "  building the cards (JS)",
  gates: "    of which gate evaluation",
  json: "  JSON serialisation",
};

function printBreakdown(label: string, b: Awaited<ReturnType<typeof breakdown>>) {
  console.log(`\nwhere a board read's time goes, ${label} (median of 100 sequential reads, ms; the queries run side by side, so they overlap)`);
  if (!b.parts.length) {
    console.log("  (no Server-Timing header: start the app with BENCH_TIMING=1)");
    return;
  }
  for (const p of b.parts) console.log(`${(WORDS[p.name] ?? p.name).padEnd(58)} ${p.ms.toFixed(2).padStart(7)}`);
  const inApp = (b.parts.find((p) => p.name === "session")?.ms ?? 0) + (b.parts.find((p) => p.name === "handler")?.ms ?? 0);
  console.log(`${"client saw (rest: HTTP, routing, Next's response path)".padEnd(58)} ${b.seen.toFixed(2).padStart(7)}  (rest ${(b.seen - inApp).toFixed(2)})`);
}

const line = (label: string, r: Run) =>
  console.log(`${label.padEnd(30)} ${r.p50.toFixed(1).padStart(6)}  ${r.p975.toFixed(1).padStart(7)}  ${r.rps.toFixed(0).padStart(7)}  ${String(r.total).padStart(8)}  ${String(r.bad).padStart(7)}`);
const header = (connections: number) => {
  console.log(`\n${connections} connection${connections === 1 ? "" : "s"}, ${DURATION} s per route (latency per request, ms)`);
  console.log(`${"route".padEnd(30)} ${"p50".padStart(6)}  ${"p97.5".padStart(7)}  ${"req/s".padStart(7)}  ${"requests".padStart(8)}  non-200`);
};
const verdict = (ok: boolean) => (ok ? "met" : "NOT met");

async function boardSize() {
  const res = await get("/api/projects");
  const body = await res.text();
  const json = JSON.parse(body) as { cards: unknown[]; inServiceRest: number };
  return { status: res.status, cards: json.cards.length, rest: json.inServiceRest, bytes: Buffer.byteLength(body) };
}

for (const path of ["/api/ping", "/api/me/units", "/api/projects"]) await warm(path, Math.max(...CONNECTION_SETS));
const small = await boardSize();
console.log(`board(500): ${small.status}, ${small.cards} cards, ${small.rest} more in service counted, ${(small.bytes / 1024).toFixed(1)} KiB`);

const results = new Map<string, Run>();
for (const c of CONNECTION_SETS) {
  header(c);
  for (const [label, path] of [["bare /api/ping", "/api/ping"], ["signed-in /api/me/units", "/api/me/units"], ["board(500)", "/api/projects"]] as const) {
    const r = await measure(path, cookie, c);
    results.set(`${label}@${c}`, r);
    line(label, r);
  }
}
const smallBreakdown = await breakdown("/api/projects");
printBreakdown("board(500)", smallBreakdown);

console.log(`\n== adding ${IN_SERVICE} tanks in service handed over long ago`);
const seeded = await seedInService(IN_SERVICE);
console.log(`added ${seeded.added}: ${seeded.inServiceNow} in service now; ${seeded.stageEvents} stage events, ${seeded.waterTests} water tests, ${seeded.messages} messages more`);
await warm("/api/projects", Math.max(...CONNECTION_SETS));
const big = await boardSize();
console.log(`board(500+${IN_SERVICE}): ${big.status}, ${big.cards} cards, ${big.rest} more in service counted, ${(big.bytes / 1024).toFixed(1)} KiB`);
for (const c of CONNECTION_SETS) {
  header(c);
  const r = await measure("/api/projects", cookie, c);
  results.set(`board(big)@${c}`, r);
  line(`board(500+${IN_SERVICE})`, r);
}
const bigBreakdown = await breakdown("/api/projects");
printBreakdown(`board(500+${IN_SERVICE})`, bigBreakdown);

const r = (k: string) => results.get(k);
console.log("\n== targets");
const bare1 = r("bare /api/ping@1"), signed1 = r("signed-in /api/me/units@1"), board1 = r("board(500)@1"), big1 = r("board(big)@1"), board4 = r("board(500)@4");
if (bare1 && signed1) console.log(`signed-in / bare throughput, 1 connection: ×${(signed1.rps / bare1.rps).toFixed(2)} (target ≥ 0.6: ${verdict(signed1.rps / bare1.rps >= 0.6)})`);
if (board1 && big1) console.log(`board(500+${IN_SERVICE}) / board(500) p50, 1 connection: ×${(big1.p50 / board1.p50).toFixed(2)} (target ≤ 1.2: ${verdict(big1.p50 / board1.p50 <= 1.2)})`);
// The count of the rest is a number in the answer: a few more digits are not growth with the portfolio.
console.log(`board response size: ${small.bytes} → ${big.bytes} bytes, ${small.cards} → ${big.cards} cards (target: not growing: ${verdict(big.cards <= small.cards && big.bytes <= small.bytes + 16)})`);
if (bare1 && board1) console.log(`board(500) / bare throughput, 1 connection: ×${(board1.rps / bare1.rps).toFixed(2)} (target ≥ 0.1: ${verdict(board1.rps / bare1.rps >= 0.1)})`);
if (board4) console.log(`board(500) p97.5 / p50, 4 connections: ×${(board4.p975 / board4.p50).toFixed(2)} (target < 3: ${verdict(board4.p975 / board4.p50 < 3)})`);
const os = await import("node:os");
console.log(`machine load average (1 min) at the end: ${os.loadavg()[0].toFixed(1)} on ${os.cpus().length} cores (figures from a busy machine are noisy)`);

// Query count: the same query function the route runs, through a pool that counts what it is asked.
const p = pool();
const original = p.query.bind(p);
let count = 0;
p.query = ((...args: Parameters<typeof original>) => {
  count++;
  return original(...args);
}) as typeof p.query;
const [lead] = await db().select().from(users).where(eq(users.email, LEAD.email));
const [crew] = await db().select().from(users).where(eq(users.email, "crew-0@bench.test"));
const counts: string[] = [];
for (const who of [lead, crew]) {
  count = 0;
  const b = await getBoard(who);
  counts.push(`${who.role} (${b.cards.length} cards, ${b.inServiceRest} counted): ${count} queries`);
}
console.log(`SQL queries per board read: ${counts.join("; ")}`);
p.query = original;
await closeDb();
