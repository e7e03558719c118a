import { arrayMove } from "@dnd-kit/sortable";
import type { BoardCard as Card } from "@/db/queries/board";
import { isStage, type Stage } from "@/lib/stages/stages";
import { keyBetween, type Placement } from "@/lib/stages/ordering";

export type PlannedMove = { card: Card; toStage: Stage; placement: Placement; localPosition: string };

/** The stage a drop target stands for: a column, a stage in the phone's switcher, or null for a card. */
export function stageOfTarget(overId: string): Stage | null | undefined {
  const m = /^(column|switch):(.+)$/.exec(overId);
  if (!m) return undefined;
  return isStage(m[2]) ? m[2] : null;
}

/** Where a card lands when dropped at the end of a stage. Null when nothing would change. */
export function planToEnd(card: Card, toStage: Stage, columns: Record<Stage, Card[]>): PlannedMove | null {
  const list = columns[toStage].filter((c) => c.id !== card.id);
  if (toStage === card.stage && columns[toStage].at(-1)?.id === card.id) return null;
  return finish(card, toStage, list, list.length);
}

/** Where a card lands when dropped on another card (before it, or after it within its own column). */
export function planOnCard(card: Card, target: Card, columns: Record<Stage, Card[]>): PlannedMove | null {
  const toStage = target.stage;
  const full = columns[toStage];
  if (toStage === card.stage) {
    const from = full.findIndex((c) => c.id === card.id);
    const to = full.findIndex((c) => c.id === target.id);
    if (from === to) return null;
    return finish(card, toStage, arrayMove(full, from, to).filter((c) => c.id !== card.id), to);
  }
  return finish(card, toStage, full, full.findIndex((c) => c.id === target.id));
}

function finish(card: Card, toStage: Stage, list: Card[], index: number): PlannedMove {
  const placement: Placement = list[index] ? { beforeId: list[index].id } : list[index - 1] ? { afterId: list[index - 1].id } : {};
  let localPosition = card.position;
  try {
    localPosition = keyBetween(list[index - 1]?.position ?? null, list[index]?.position ?? null);
  } catch {
    // The server places it; the local key only orders the optimistic view.
  }
  return { card, toStage, placement, localPosition };
}
