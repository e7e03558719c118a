/** The long view of a tank's water: nitrate, pH and temperature from every valid test, oldest first. */

export type TrendReading = { takenAt: Date; voided: boolean; nitrateMgL: number | null; pH: number | null; tempC: number | null };

export type TrendPoint = { at: number; nitrateMgL: number | null; pH: number | null; tempC: number | null };

/**
 * Valid readings (not voided, not dated after `now` plus the clock tolerance) that measured at least
 * one of the three, oldest first, with the time as milliseconds for a time axis.
 */
export function trendPoints(readings: TrendReading[], now: Date, futureToleranceMs = 0): TrendPoint[] {
  const latest = now.getTime() + futureToleranceMs;
  return readings
    .filter((r) => !r.voided && r.takenAt.getTime() <= latest && (r.nitrateMgL !== null || r.pH !== null || r.tempC !== null))
    .map((r) => ({ at: r.takenAt.getTime(), nitrateMgL: r.nitrateMgL, pH: r.pH, tempC: r.tempC }))
    .sort((a, b) => a.at - b.at);
}
