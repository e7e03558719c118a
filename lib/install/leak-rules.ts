/** The fill and leak-test records and the rules between them. */

export const LEAK_KINDS = ["filled", "at fill", "after 24 hours"] as const;
export type LeakKind = (typeof LEAK_KINDS)[number];

/**
 * Earliest the "after 24 hours" check may be recorded, in hours after the fill. A seep can take a
 * day to show at a seam or a bulkhead fitting, so the check waits most of a day (common practice);
 * 20 hours leaves room for a crew visiting the next morning.
 */
export const MIN_HOURS_BEFORE_DAY_CHECK = 20;

export type LeakRow = { kind: LeakKind; passed: boolean; at: Date };

/** Why this check can't be recorded now, or null when it can. */
export function leakCheckRefusal(kind: LeakKind, rows: LeakRow[], now: Date): string | null {
  if (kind === "filled") return null;
  const fills = rows.filter((r) => r.kind === "filled");
  if (!fills.length) return "Record the fill first: the leak checks are timed from it.";
  if (kind === "at fill") return null;
  const lastFill = fills.reduce((a, b) => (b.at > a.at ? b : a));
  const hours = (now.getTime() - lastFill.at.getTime()) / 3_600_000;
  if (hours < MIN_HOURS_BEFORE_DAY_CHECK) {
    const wait = Math.ceil((MIN_HOURS_BEFORE_DAY_CHECK - hours) * 10) / 10;
    return `The tank was filled ${hours.toFixed(1)} hours ago. The day-after check needs at least ${MIN_HOURS_BEFORE_DAY_CHECK} hours, so a slow seep has time to show: come back in ${wait} ${wait === 1 ? "hour" : "hours"}.`;
  }
  return null;
}

/** What the gate into cycling reads: a fill recorded and the latest day-after check passed. */
export function leakTestPassed(rows: LeakRow[]): boolean {
  if (!rows.some((r) => r.kind === "filled")) return false;
  const day = rows.filter((r) => r.kind === "after 24 hours");
  if (!day.length) return false;
  return day.reduce((a, b) => (b.at > a.at ? b : a)).passed;
}
