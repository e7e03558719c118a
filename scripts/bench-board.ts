/**
 * Drives the running app with autocannon: the board (GET /api/projects, 500 projects, as the lead)
 * against the constant GET /api/ping, then counts the SQL queries one board read runs. Figures are
 * printed, not enforced. Started by scripts/bench.sh, which sets BENCH_URL and DATABASE_URL.
 */
import { BASE, DURATION, LEAD, measure, signIn } from "./lib/bench-http";
import { eq } from "drizzle-orm";
import { closeDb, db, pool } from "../db";
import { users } from "../db/schema";
import { getBoard } from "../db/queries/board";

// One connection measures a request's own latency; several show throughput with requests queued.
const CONNECTION_SETS = (process.env.BENCH_CONNECTIONS ?? "1,4").split(",").map(Number);
const CONNECTIONS = Math.max(...CONNECTION_SETS);

const cookie = await signIn();
const check = await fetch(`${BASE}/api/projects`, { headers: { cookie } });
const board = (await check.json()) as { cards: unknown[] };
console.log(`board: ${check.status}, ${board.cards.length} cards, ${(JSON.stringify(board).length / 1024).toFixed(0)} KiB`);

// Warm up: JIT, the pool's connections, PostgreSQL's caches.
for (const path of ["/api/ping", "/api/projects"]) {
  await Promise.all(Array.from({ length: CONNECTIONS }, async () => {
    for (let i = 0; i < 50; i++) await (await fetch(`${BASE}${path}`, { headers: { cookie } })).arrayBuffer();
  }));
}

for (const connections of CONNECTION_SETS) {
  const ping = await measure("/api/ping", cookie, connections);
  const boardRun = await measure("/api/projects", cookie, connections);
  console.log(`\n${connections} connection${connections === 1 ? "" : "s"}, ${DURATION} s per route (latency per request, ms)`);
  console.log("route               p50      p95      req/s    requests  non-200");
  for (const r of [ping, boardRun]) {
    console.log(`${r.path.padEnd(18)} ${r.p50.toFixed(1).padStart(6)}  ${r.p95.toFixed(1).padStart(7)}  ${r.rps.toFixed(0).padStart(7)}  ${String(r.total).padStart(9)}  ${String(r.bad).padStart(7)}`);
  }
  console.log(`board / ping: p50 ×${(boardRun.p50 / ping.p50).toFixed(1)}, p95 ×${(boardRun.p95 / ping.p95).toFixed(1)}, req/s ÷${(ping.rps / boardRun.rps).toFixed(1)}`);
  console.log(`board p95 ${boardRun.p95.toFixed(1)} ms: ${boardRun.p95 < 50 ? "under" : "OVER"} the 50 ms target`);
}
const [load1] = (await import("node:os")).loadavg();
console.log(`machine load average (1 min) at the end: ${load1.toFixed(1)} on ${(await import("node:os")).cpus().length} cores`);

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
  counts.push(`${who.role} (${b.cards.length} cards): ${count} queries`);
}
console.log(`\nSQL queries per board read: ${counts.join("; ")}`);
p.query = original;
await closeDb();
