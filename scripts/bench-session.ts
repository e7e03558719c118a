/**
 * The cost of being signed in: GET /api/me/units (session check plus one small row) against the
 * constant GET /api/ping, one connection, in the same run. Figures are printed, not enforced.
 * Started by scripts/bench.sh, which sets BENCH_URL.
 */
import { BASE, DURATION, measure, signIn } from "./lib/bench-http";

const TARGET = 0.6; // signed-in trivial read at ≥ 0.6 × the bare route's throughput

const cookie = await signIn();
for (const path of ["/api/ping", "/api/me/units"]) {
  for (let i = 0; i < 200; i++) await (await fetch(`${BASE}${path}`, { headers: { cookie } })).arrayBuffer();
}
const bare = await measure("/api/ping", cookie);
const signed = await measure("/api/me/units", cookie);
console.log(`1 connection, ${DURATION} s per route (latency per request, ms)`);
console.log("route               p50    p97.5    req/s    requests  non-200");
for (const r of [bare, signed]) {
  console.log(`${r.path.padEnd(18)} ${r.p50.toFixed(1).padStart(5)}  ${r.p975.toFixed(1).padStart(7)}  ${r.rps.toFixed(0).padStart(7)}  ${String(r.total).padStart(9)}  ${String(r.bad).padStart(7)}`);
}
const ratio = signed.rps / bare.rps;
console.log(`signed-in / bare: throughput ×${ratio.toFixed(2)} (target ≥ ${TARGET}: ${ratio >= TARGET ? "met" : "NOT met"}), p50 ×${(signed.p50 / bare.p50).toFixed(1)}`);
