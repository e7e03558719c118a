import type { BoardCard } from "@/db/queries/board";
import { isOverdue } from "@/lib/stages/board-filters";
import { sinceWords } from "@/lib/stages/card-words";

/** One short line of status on a card. `tone` picks its colour; the words must stand alone. */
export type StatusLine = { key: string; text: string; tone: "quiet" | "caution" | "ok" | "danger" };

/**
 * The small status lines under a card's title, in the order shown. Add a line here (lateness,
 * quarantine, a deposit…) and every card shows it; keep each line a few words.
 */
export function cardStatusLines(card: BoardCard, now: Date): StatusLine[] {
  const lines: StatusLine[] = [];
  const behind = isOverdue(card, now);
  lines.push({ key: "since", text: `${sinceWords(card.stageEnteredAt, now)}${behind ? " · behind plan" : ""}`, tone: behind ? "caution" : "quiet" });
  return lines;
}
