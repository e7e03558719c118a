/**
 * The cost of being signed in: GET /api/me/units (session check plus one small row) against the
 * constant GET /api/ping, one connection, in the same run. Figures are printed, not enforced.
 * Started by scripts/bench.sh, which sets BENCH_URL.
 */
import autocannon from "autocannon";

const BASE = process.env.BENCH_URL ?? "http://127.0.0.1:3199";
const LEAD = { email: "bench-lead@bench.test", password: "bench-password-1" };
const DURATION = Number(process.env.BENCH_SECONDS ?? 10);
const TARGET = 0.6; // signed-in trivial read at ≥ 0.6 × the bare route's throughput

async function signIn(): Promise<string> {
  const jar = new Map<string, string>();
  const keep = (res: Response) => {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const i = pair.indexOf("=");
      jar.set(pair.slice(0, i), pair.slice(i + 1));
    }
  };
  const header = () => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
  const csrf = await fetch(`${BASE}/api/auth/csrf`);
  keep(csrf);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const res = await fetch(`${BASE}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: header() },
    body: new URLSearchParams({ csrfToken, email: LEAD.email, password: LEAD.password, json: "true" }),
  });
  keep(res);
  if (![...jar.keys()].some((k) => k.includes("session-token"))) throw new Error(`Sign-in failed (${res.status}).`);
  return header();
}

const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];

async function measure(path: string, cookie: string) {
  const times: number[] = [];
  let bad = 0;
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon({ url: `${BASE}${path}`, connections: 1, duration: DURATION, headers: { cookie } }, (err, res) => (err ? reject(err) : resolve(res)));
    instance.on("response", (_client: unknown, status: number, _bytes: number, ms: number) => {
      if (status !== 200) bad++;
      times.push(ms);
    });
  });
  times.sort((a, b) => a - b);
  return { path, p50: percentile(times, 50), p975: percentile(times, 97.5), rps: result.requests.average, total: times.length, bad };
}

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
