/**
 * What the HTTP benchmarks share: the app's address, the bench lead's real sign-in, and one
 * autocannon run with its latency percentiles. Figures are printed by the callers, never enforced.
 */
import autocannon from "autocannon";

export const BASE = process.env.BENCH_URL ?? "http://127.0.0.1:3199";
export const DURATION = Number(process.env.BENCH_SECONDS ?? 10);
export const LEAD = { email: "bench-lead@bench.test", password: "bench-password-1" };

/**
 * The real sign-in flow (CSRF token, then the credentials callback) against `base`; returns the
 * cookies it set, by name. The bench lead on the bench app unless told otherwise.
 */
export async function signInCookies(base = BASE, email = LEAD.email, password = LEAD.password): Promise<Map<string, string>> {
  const jar = new Map<string, string>();
  const keep = (res: Response) => {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const i = pair.indexOf("=");
      jar.set(pair.slice(0, i), pair.slice(i + 1));
    }
  };
  const header = () => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
  const csrf = await fetch(`${base}/api/auth/csrf`);
  keep(csrf);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: header() },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
  keep(res);
  if (![...jar.keys()].some((k) => k.includes("session-token"))) throw new Error(`Sign-in as ${email} failed (${res.status}).`);
  return jar;
}

/** The bench lead's cookie header. */
export async function signIn(): Promise<string> {
  return [...(await signInCookies())].map(([k, v]) => `${k}=${v}`).join("; ");
}

const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];

/** One timed run against `path` with the given cookie; latencies in ms, throughput in req/s. */
export async function measure(path: string, cookie: string, connections = 1) {
  const times: number[] = [];
  let bad = 0;
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon({ url: `${BASE}${path}`, connections, duration: DURATION, headers: { cookie } }, (err, res) => (err ? reject(err) : resolve(res)));
    instance.on("response", (_client: unknown, status: number, _bytes: number, ms: number) => {
      if (status !== 200) bad++;
      times.push(ms);
    });
  });
  times.sort((a, b) => a - b);
  return {
    path,
    p50: percentile(times, 50),
    p95: percentile(times, 95),
    p975: percentile(times, 97.5),
    rps: result.requests.average,
    total: times.length,
    bad,
    bytes: result.throughput.average,
  };
}
