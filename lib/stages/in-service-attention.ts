/**
 * Which tanks in service the board shows as cards. In service is the longest part of a tank's life,
 * so the board would grow with the whole portfolio if every tank there were a card; it shows only
 * the ones that need someone's attention and counts the rest (they are a click away in a list).
 *
 * The rule lives here alone so that later signals (a service visit due or overdue, a flag set by the
 * lead) are added in one place. The board's query selects a superset of candidates with the same
 * cut-off (`attentionSince`) and then keeps the tanks this function says need attention.
 */

/** A tank stays on the board this many days after handover, so a card just dropped into in service stays in view. */
export const RECENT_HANDOVER_DAYS = 14;

const DAY = 86_400_000;

/** What the rule reads about one tank in service. Optional signals are ignored when absent. */
export type InServiceSignals = {
  /** When the tank entered in service (its latest handover). */
  handedOverAt: Date | string;
  /** When the next routine visit is due, if the tank has a service plan. */
  nextVisitDue?: Date | string | null;
  /** Routine visits past their time with no signed-off report (lib/service/overdue). */
  overdueVisits?: number;
  /** Set by a person when a tank needs looking at for a reason the records don't show. */
  flagged?: boolean;
};

export type AttentionReason = "recently_handed_over" | "visit_due" | "visit_overdue" | "flagged";

/** Words for the column header and the list, in the order the reasons are checked. */
export const ATTENTION_WORDS: Record<AttentionReason, string> = {
  recently_handed_over: `handed over in the last ${RECENT_HANDOVER_DAYS} days`,
  visit_due: "a service visit due",
  visit_overdue: "a service visit overdue",
  flagged: "flagged",
};

/** The earliest handover that still counts as recent at `now`. */
export function attentionSince(now: Date): Date {
  return new Date(now.getTime() - RECENT_HANDOVER_DAYS * DAY);
}

/** Why this tank needs attention now; an empty list means it only needs counting. */
export function inServiceAttention(tank: InServiceSignals, now: Date): AttentionReason[] {
  const reasons: AttentionReason[] = [];
  const handedOver = new Date(tank.handedOverAt).getTime();
  if (handedOver >= attentionSince(now).getTime()) reasons.push("recently_handed_over");
  if (tank.nextVisitDue != null && new Date(tank.nextVisitDue).getTime() <= now.getTime()) reasons.push("visit_due");
  if ((tank.overdueVisits ?? 0) > 0) reasons.push("visit_overdue");
  if (tank.flagged) reasons.push("flagged");
  return reasons;
}

/** True when the board should show this tank as a card. */
export function needsAttention(tank: InServiceSignals, now: Date): boolean {
  return inServiceAttention(tank, now).length > 0;
}

/** The in-service column's header line: what its cards are and how many more are in service. */
export function inServiceHeaderWords(shown: number, rest: number): string {
  const what = `${shown.toLocaleString("en")} needing attention (${ATTENTION_WORDS.recently_handed_over} or ${ATTENTION_WORDS.visit_overdue})`;
  return rest > 0 ? `${what}; ${rest.toLocaleString("en")} more in service` : what;
}
