import { OVERDUE_GRACE_HOURS } from "./overdue";

type V = { startsAt: Date; completedAt: Date | null; cancelledAt: Date | null };

/** A tank's routine visits as the Service tab lists them: coming, overdue (no report a day on), done (newest first), skipped lately. */
export function groupServiceVisits<T extends V>(visits: T[], now: Date) {
  const graceMs = OVERDUE_GRACE_HOURS * 3600_000;
  const open = visits.filter((v) => !v.completedAt && !v.cancelledAt);
  return {
    upcoming: open.filter((v) => v.startsAt.getTime() + graceMs > now.getTime()),
    overdue: open.filter((v) => v.startsAt.getTime() + graceMs <= now.getTime()),
    past: visits.filter((v) => v.completedAt).reverse(),
    skipped: visits.filter((v) => v.cancelledAt && v.startsAt.getTime() > now.getTime() - 90 * 86_400_000),
  };
}
