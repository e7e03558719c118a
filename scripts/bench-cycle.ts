/**
 * Benchmark for evaluateCycle on 10,000 readings: `npx tsx scripts/bench-cycle.ts`.
 * Prints median and p95 ms per call for sorted and shuffled input. Timings
 * are reported, not enforced: it exits non-zero only if something throws.
 */

import { evaluateCycle } from "../lib/cycling/evaluate-cycle";
import type { AmmoniaDose, WaterTest } from "../lib/cycling/readings";

const READINGS = 10_000;
const STEP_MINUTES = 5;
const WARMUP_RUNS = 200;
const TIMED_RUNS = 2_000;
const T0 = Date.UTC(2025, 2, 1, 8, 0, 0);
const DAY = 86_400_000;

// Seeded PRNG (mulberry32) so every run times the same invented data.
function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

const clamp01 = (x: number) => Math.min(1, Math.max(0, x));

// Invented shape of a fishless cycle logged by a probe every 5 minutes
// (about 35 days): ammonia held at 2 mg/L then gone by day 14, nitrite
// peaking near day 14 and gone by day 31, nitrate building up.
function inventedCycle(random: () => number): { readings: WaterTest[]; doses: AmmoniaDose[] } {
  const noisy = (v: number) => (v === 0 ? 0 : Math.max(0, Math.round(v * (0.9 + 0.2 * random()) * 100) / 100));
  const readings: WaterTest[] = [];
  for (let i = 0; i < READINGS; i++) {
    const t = T0 + i * STEP_MINUTES * 60_000;
    const day = (t - T0) / DAY;
    const ammonia = day < 5 ? 2 : 2 * clamp01((14 - day) / 9);
    const nitrite = day < 14 ? 5 * clamp01((day - 3) / 11) : 5 * clamp01((31 - day) / 17);
    readings.push({
      id: `bench-${String(i).padStart(5, "0")}`,
      takenAt: new Date(t),
      ammoniaMgL: noisy(ammonia),
      nitriteMgL: noisy(nitrite),
      nitrateMgL: noisy(Math.max(0, (day - 8) * 4)),
      pH: 7.4 + 0.4 * random(),
      tempC: 25 + random(),
      khDkh: 5 + random(),
    });
  }
  const doses: AmmoniaDose[] = [];
  for (let d = 0; d <= 31; d++) {
    doses.push({ id: `dose-${d}`, dosedAt: new Date(T0 + d * DAY + 3_600_000), targetMgL: 2 });
  }
  return { readings, doses };
}

function shuffle<T>(items: T[], random: () => number): T[] {
  const out = [...items];
  for (let i = out.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [out[i], out[j]] = [out[j], out[i]];
  }
  return out;
}

// Nearest-rank percentile (the smallest sample with at least p of the samples at or below it).
function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.ceil(p * sorted.length) - 1)];
}

function time(label: string, run: () => unknown): void {
  for (let i = 0; i < WARMUP_RUNS; i++) run();
  const samples: number[] = [];
  for (let i = 0; i < TIMED_RUNS; i++) {
    const start = performance.now();
    run();
    samples.push(performance.now() - start);
  }
  samples.sort((a, b) => a - b);
  const median = percentile(samples, 0.5).toFixed(3);
  const p95 = percentile(samples, 0.95).toFixed(3);
  // The minimum shows the cost without interference from other processes or GC.
  const min = samples[0].toFixed(3);
  console.log(`  ${label.padEnd(15)} median ${median} ms, p95 ${p95} ms, min ${min} ms (${TIMED_RUNS} runs)`);
}

function main(): void {
  const random = prng(20250301);
  const { readings, doses } = inventedCycle(random);
  const shuffled = shuffle(readings, random);
  const now = new Date(readings[readings.length - 1].takenAt.getTime() + 3_600_000);

  const verdict = evaluateCycle(readings, { now, doses });
  const days = ((READINGS * STEP_MINUTES) / 1440).toFixed(1);
  console.log(`evaluateCycle over ${READINGS} readings (invented ${STEP_MINUTES}-minute data, ${days} days, ${doses.length} doses)`);
  console.log(`  verdict: ready=${verdict.ready}, phase=${verdict.phase}`);
  time("sorted input", () => evaluateCycle(readings, { now, doses }));
  time("shuffled input", () => evaluateCycle(shuffled, { now, doses }));
}

try {
  main();
} catch (error) {
  console.error(error);
  process.exitCode = 1;
}
