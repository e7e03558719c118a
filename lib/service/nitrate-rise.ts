/**
 * How fast nitrate rises in a tank in service, from its own water tests.
 *
 * Between two tests with no water change in between, nitrate only rises; a fall means water was
 * changed (or a reading was low), and such a pair says nothing about the rise, so it is left out.
 * A pair that straddles a change but still rose understates the rise; taking the median of the rising
 * pairs keeps one such pair (or one odd reading) from setting the answer.
 */

export type NitrateReading = { takenAt: Date; nitrateMgL: number | null };

export type NitrateRise = { risePerDayMgL: number; pairs: number; fromAt: Date; toAt: Date };

export type RiseOptions = { windowDays: number; minPairs: number; minGapDays: number };

export const RISE_DEFAULTS: Readonly<RiseOptions> = {
  /** Only tests this recent count: the stock and feeding change over a tank's life. */
  windowDays: 90,
  /** Fewer rising pairs than this give no estimate. */
  minPairs: 2,
  /** Two tests closer than this are too close for a kit's resolution to show a rise. */
  minGapDays: 1,
};

const DAY_MS = 86_400_000;

function median(sorted: number[]): number {
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/**
 * The median rise per day over consecutive tests that rose, among tests in the last `windowDays`
 * before `now`; null when there are fewer than `minPairs` such pairs.
 */
export function estimateNitrateRise(readings: NitrateReading[], now: Date, options: Partial<RiseOptions> = {}): NitrateRise | null {
  const { windowDays, minPairs, minGapDays } = { ...RISE_DEFAULTS, ...options };
  const since = now.getTime() - windowDays * DAY_MS;
  const tests = readings
    .filter((r): r is { takenAt: Date; nitrateMgL: number } => r.nitrateMgL !== null && r.takenAt.getTime() >= since && r.takenAt.getTime() <= now.getTime())
    .sort((a, b) => a.takenAt.getTime() - b.takenAt.getTime());
  const pairs: { rate: number; fromAt: Date; toAt: Date }[] = [];
  for (let i = 1; i < tests.length; i++) {
    const a = tests[i - 1];
    const b = tests[i];
    const days = (b.takenAt.getTime() - a.takenAt.getTime()) / DAY_MS;
    if (days < minGapDays || b.nitrateMgL <= a.nitrateMgL) continue;
    pairs.push({ rate: (b.nitrateMgL - a.nitrateMgL) / days, fromAt: a.takenAt, toAt: b.takenAt });
  }
  // At least one pair, whatever minPairs says: no pair is no measurement.
  if (pairs.length < Math.max(1, minPairs)) return null;
  const rates = pairs.map((p) => p.rate).sort((x, y) => x - y);
  return { risePerDayMgL: median(rates), pairs: pairs.length, fromAt: pairs[0].fromAt, toAt: pairs[pairs.length - 1].toAt };
}
