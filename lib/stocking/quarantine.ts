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

/**
 * Fish recorded straight into the display (not through a holding tank in the plan) must have had the
 * company's full quarantine elsewhere, or carry the lead's written reason why not.
 */
export function directBatchQuarantineReason(opts: { days: number | null; requiredDays: number; override: string | null }): string | null {
  if (opts.override) return null;
  const had = opts.days ?? 0;
  if (had >= opts.requiredDays) return null;
  const hadWords = opts.days == null ? "no quarantine recorded" : `${had} ${had === 1 ? "day" : "days"} of quarantine`;
  return `New fish are quarantined for ${opts.requiredDays} days before the display; this batch had ${hadWords}. Put it in a holding tank through the stocking plan, or the lead records why it can go in now.`;
}
