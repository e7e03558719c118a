import "server-only";
import { AsyncLocalStorage } from "node:async_hooks";
import { env } from "../env";

/**
 * Where a request's time goes, for the benchmark's breakdown. Off unless BENCH_TIMING is set: then
 * the route wrapper opens a record per request and answers with a Server-Timing header. Parts that
 * run side by side overlap, so their times don't add up to the whole.
 */
type Record_ = Map<string, number>;
const store = new AsyncLocalStorage<Record_>();

export const timingOn = () => env().BENCH_TIMING;

/** Runs `fn` with a fresh record when timing is on; returns its result and the record. */
export async function withTiming<T>(fn: () => Promise<T>): Promise<{ result: T; parts: Record_ | null }> {
  if (!timingOn()) return { result: await fn(), parts: null };
  const parts: Record_ = new Map();
  const result = await store.run(parts, fn);
  return { result, parts };
}

/** Adds `ms` to the part named `label` of the current request's record, if one is open. */
export function addTime(label: string, ms: number) {
  const parts = store.getStore();
  if (parts) parts.set(label, (parts.get(label) ?? 0) + ms);
}

/** Times a promise as one part (no cost beyond a check when timing is off). */
export async function timed<T>(label: string, work: Promise<T> | (() => Promise<T>)): Promise<T> {
  if (!store.getStore()) return typeof work === "function" ? work() : work;
  const start = performance.now();
  try {
    return await (typeof work === "function" ? work() : work);
  } finally {
    addTime(label, performance.now() - start);
  }
}

/** Times synchronous work as one part. */
export function timedSync<T>(label: string, work: () => T): T {
  if (!store.getStore()) return work();
  const start = performance.now();
  try {
    return work();
  } finally {
    addTime(label, performance.now() - start);
  }
}

/** The Server-Timing header value for a record: `name;dur=1.23` per part. */
export function serverTimingHeader(parts: Record_): string {
  return [...parts].map(([name, ms]) => `${name.replace(/[^a-z0-9_-]/gi, "_")};dur=${ms.toFixed(2)}`).join(", ");
}
