/**
 * Quarantine before the display. Common practice is about four weeks in a separate holding tank, so
 * that disease shows there rather than among the established fish; the company may set its own period.
 */
export const DEFAULT_QUARANTINE_DAYS = 28;
export const QUARANTINE_DAYS_LIMITS = { min: 0, max: 120 } as const;
const DAY_MS = 86_400_000;

export function quarantineEndsAt(startedAt: Date, days: number): Date {
  return new Date(startedAt.getTime() + days * DAY_MS);
}

/** Whole days left (rounded up), never below zero. */
export function quarantineDaysLeft(startedAt: Date, days: number, now: Date): number {
  return Math.max(0, Math.ceil((quarantineEndsAt(startedAt, days).getTime() - now.getTime()) / DAY_MS));
}

export type QuarantineVerdict = { done: boolean; reason: string | null };

/** Whether a batch may leave quarantine for the display: the period has run, or the lead overrode it in writing. */
export function quarantineVerdict(opts: { startedAt: Date | null; days: number; now: Date; override: string | null }): QuarantineVerdict {
  if (opts.override) return { done: true, reason: null };
  if (!opts.startedAt) return { done: false, reason: "This batch hasn't been through quarantine; put it in a holding tank first." };
  const left = quarantineDaysLeft(opts.startedAt, opts.days, opts.now);
  if (left === 0) return { done: true, reason: null };
  return { done: false, reason: `Quarantine runs ${opts.days} days; ${left} ${left === 1 ? "day is" : "days are"} left.` };
}
