import type { BoardCard } from "@/db/queries/board";
import { dayWords, sinceWords } from "@/lib/stages/card-words";

/** One short line of status on a card. `tone` picks its colour; the words must stand alone. */
export type StatusLine = { key: string; text: string; tone: "quiet" | "caution" | "ok" | "danger" };

type LineFacts = Pick<BoardCard, "stageEnteredAt" | "lateBy" | "quarantineDaysLeft"> & Partial<Pick<BoardCard, "nextServiceVisitAt" | "overdueVisits">>;

const days = (n: number) => `${n} ${n === 1 ? "day" : "days"}`;

/**
 * The small status lines under a card's title, in the order shown. Add a line here and every card
 * shows it; keep each line a few words. Lateness is measured against the card's own stage only.
 */
export function cardStatusLines(card: LineFacts, now: Date): StatusLine[] {
  const lines: StatusLine[] = [];
  const since = sinceWords(card.stageEnteredAt, now);
  lines.push(
    card.lateBy > 0
      ? { key: "since", text: `${since} · ${days(card.lateBy)} over this stage's usual time`, tone: "caution" }
      : { key: "since", text: since, tone: "quiet" },
  );
  if (card.quarantineDaysLeft != null) {
    lines.push(
      card.quarantineDaysLeft > 0
        ? { key: "quarantine", text: `Fish in quarantine: ${days(card.quarantineDaysLeft)} left`, tone: "quiet" }
        : { key: "quarantine", text: "Fish ready to leave quarantine", tone: "ok" },
    );
  }
  if (card.overdueVisits) {
    lines.push({ key: "service-overdue", text: `${card.overdueVisits === 1 ? "1 visit" : `${card.overdueVisits} visits`} overdue, no report`, tone: "danger" });
  }
  if (card.nextServiceVisitAt) lines.push({ key: "service-next", text: `Next visit ${dayWords(card.nextServiceVisitAt, now)}`, tone: "quiet" });
  return lines;
}
