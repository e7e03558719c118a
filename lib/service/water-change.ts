/**
 * Where nitrate settles under a regular water-change routine, and what routine keeps it under a limit.
 *
 * The model: nitrate rises by R mg/L a day (fish waste turned to nitrate by the filter, less whatever
 * plants take up), and every T days a fraction f of the water is replaced with tap water holding
 * N_tap mg/L. Derived here (it has the form of the steady state of any repeated dose with a fixed
 * fraction lost per period, a geometric series: the "dose" is R·T, the fraction kept 1 − f):
 *
 *   just after a change:  a = (1 − f)·b + f·N_tap          (mixing: keep 1 − f of the tank, add f of tap)
 *   just before the next: b = a + R·T                      (a steady rise over T days)
 *
 * At steady state both repeat, so b = (1 − f)·b + f·N_tap + R·T, hence f·b = R·T + f·N_tap and
 *
 *   b = R·T/f + N_tap,      a = b − R·T = R·T·(1 − f)/f + N_tap.
 *
 * From any start the gap to b shrinks by (1 − f) per cycle, so the tank approaches it geometrically.
 */

/** The planner's starting limit: a level many keepers aim to stay under for community fish (common practice, not a standard). */
export const DEFAULT_NITRATE_LIMIT_MGL = 40;

export type WaterChangeRoutine = {
  /** How fast nitrate rises between changes, mg/L per day (≥ 0). */
  risePerDayMgL: number;
  /** Fraction of the water changed each time, in (0, 1]. */
  changeFraction: number;
  /** Days between changes (> 0). */
  intervalDays: number;
  /** Nitrate in the replacement water, mg/L (≥ 0). */
  tapNitrateMgL: number;
};

export type SteadyState = { beforeChangeMgL: number; afterChangeMgL: number };

function requireFinite(value: number, what: string): void {
  if (!Number.isFinite(value)) throw new RangeError(`${what} must be a number, not ${value}.`);
}

function checkRise(risePerDayMgL: number): void {
  requireFinite(risePerDayMgL, "The nitrate rise per day");
  if (risePerDayMgL < 0) throw new RangeError(`The nitrate rise per day cannot be negative (got ${risePerDayMgL} mg/L a day).`);
}

function checkFraction(changeFraction: number): void {
  requireFinite(changeFraction, "The fraction changed");
  if (changeFraction <= 0 || changeFraction > 1) {
    throw new RangeError(`The fraction changed must be more than 0 and at most 1 (all the water); got ${changeFraction}.`);
  }
}

function checkInterval(intervalDays: number): void {
  requireFinite(intervalDays, "The days between changes");
  if (intervalDays <= 0) throw new RangeError(`The days between changes must be more than 0 (got ${intervalDays}).`);
}

function checkTap(tapNitrateMgL: number): void {
  requireFinite(tapNitrateMgL, "The tap water's nitrate");
  if (tapNitrateMgL < 0) throw new RangeError(`The tap water's nitrate cannot be negative (got ${tapNitrateMgL} mg/L).`);
}

function checkLimit(limitMgL: number): void {
  requireFinite(limitMgL, "The nitrate limit");
  if (limitMgL <= 0) throw new RangeError(`The nitrate limit must be more than 0 mg/L (got ${limitMgL}).`);
}

function checkRoutine(r: WaterChangeRoutine): void {
  checkRise(r.risePerDayMgL);
  checkFraction(r.changeFraction);
  checkInterval(r.intervalDays);
  checkTap(r.tapNitrateMgL);
}

/** The steady-state nitrate just before and just after each change (derivation above). */
export function steadyStateNitrate(routine: WaterChangeRoutine): SteadyState {
  checkRoutine(routine);
  const { risePerDayMgL: r, changeFraction: f, intervalDays: t, tapNitrateMgL: tap } = routine;
  const risePerCycle = r * t;
  return {
    beforeChangeMgL: risePerCycle / f + tap,
    afterChangeMgL: (risePerCycle * (1 - f)) / f + tap,
  };
}

/** One change: keep 1 − f of the tank's water and top up with tap water. */
export function afterOneChange(nitrateMgL: number, changeFraction: number, tapNitrateMgL: number): number {
  checkFraction(changeFraction);
  checkTap(tapNitrateMgL);
  return (1 - changeFraction) * nitrateMgL + changeFraction * tapNitrateMgL;
}

/**
 * The longest interval, in days, for which the level before each change stays at or under the limit:
 * R·T/f + N_tap ≤ L ⇔ T ≤ f·(L − N_tap)/R. Infinity when nitrate does not rise; null when the tap
 * water alone is over the limit (no interval helps).
 */
export function longestIntervalDays(o: { risePerDayMgL: number; changeFraction: number; tapNitrateMgL: number; limitMgL: number }): number | null {
  checkRise(o.risePerDayMgL);
  checkFraction(o.changeFraction);
  checkTap(o.tapNitrateMgL);
  checkLimit(o.limitMgL);
  const headroom = o.limitMgL - o.tapNitrateMgL;
  if (headroom < 0) return null;
  if (o.risePerDayMgL === 0) return Number.POSITIVE_INFINITY;
  return (o.changeFraction * headroom) / o.risePerDayMgL;
}

/**
 * The smallest fraction that keeps the level before each change at or under the limit:
 * f ≥ R·T/(L − N_tap). Null when even changing all the water each time is not enough, or the tap
 * water alone is over the limit; 0 when nitrate does not rise (any change will do).
 */
export function smallestChangeFraction(o: { risePerDayMgL: number; intervalDays: number; tapNitrateMgL: number; limitMgL: number }): number | null {
  checkRise(o.risePerDayMgL);
  checkInterval(o.intervalDays);
  checkTap(o.tapNitrateMgL);
  checkLimit(o.limitMgL);
  const headroom = o.limitMgL - o.tapNitrateMgL;
  if (o.risePerDayMgL === 0) return headroom < 0 ? null : 0;
  // Stryker disable next-line EqualityOperator: at zero headroom R·T/0 is Infinity, which the > 1 check below also turns into null
  if (headroom <= 0) return null;
  const fraction = (o.risePerDayMgL * o.intervalDays) / headroom;
  return fraction > 1 ? null : fraction;
}

/** Litres to take out and replace for a change of `percent` % of the tank's net water volume. */
export function litresToChange(percent: number, netVolumeL: number): number {
  requireFinite(percent, "The change percentage");
  requireFinite(netVolumeL, "The tank's water volume");
  if (percent <= 0 || percent > 100) throw new RangeError(`The change must be more than 0 % and at most 100 % (got ${percent} %).`);
  if (netVolumeL <= 0) throw new RangeError(`The tank's water volume must be more than 0 L (got ${netVolumeL}).`);
  return (percent / 100) * netVolumeL;
}

export type SawtoothPoint = { day: number; nitrateMgL: number };

/**
 * The steady-state sawtooth over `cycles` changes, for a chart: the level just after a change at
 * day 0, T, 2T… and just before the next one, at the same day (a vertical drop).
 */
export function sawtoothPoints(routine: WaterChangeRoutine, cycles: number): SawtoothPoint[] {
  if (!Number.isInteger(cycles) || cycles < 1) throw new RangeError(`The number of cycles to draw must be a whole number of at least 1 (got ${cycles}).`);
  const { beforeChangeMgL, afterChangeMgL } = steadyStateNitrate(routine);
  const points: SawtoothPoint[] = [{ day: 0, nitrateMgL: afterChangeMgL }];
  for (let i = 1; i <= cycles; i++) {
    const day = i * routine.intervalDays;
    points.push({ day, nitrateMgL: beforeChangeMgL }, { day, nitrateMgL: afterChangeMgL });
  }
  return points;
}

// Floating point can land a hair either side of a whole number (0.1 × 70 = 7.000000000000001), and a
// plan said in whole days or percent must not lose a day or add a percent to that.
const ROUNDING_SLACK = 1e-9;

/** The longest whole number of days within `days` (for saying "every N days"). */
export function wholeDaysWithin(days: number): number {
  return Math.floor(days + ROUNDING_SLACK);
}

/** The smallest whole percentage at or above `fraction` (for saying "change N %"). */
export function wholePercentAtLeast(fraction: number): number {
  return Math.ceil(fraction * 100 - ROUNDING_SLACK);
}
