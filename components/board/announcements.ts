import type { Announcements } from "@dnd-kit/core";
import { STAGE_LABELS, type Stage } from "@/lib/stages/stages";

export type Locate = (id: string) => { title: string; stage: Stage; index: number; count: number } | null;

/** Screen-reader messages for dragging a card, in our own words. */
export function boardAnnouncements(locate: Locate, overLabel: (overId: string, activeId: string) => string | null): Announcements {
  const where = (id: string) => {
    const c = locate(id);
    return c ? `${STAGE_LABELS[c.stage]}, position ${c.index + 1} of ${c.count}` : "the board";
  };
  const title = (id: string) => locate(id)?.title ?? "The card";
  return {
    onDragStart: ({ active }) => `Picked up ${title(String(active.id))}. It is in ${where(String(active.id))}. Use the arrow keys to move it, Space to drop, Escape to put it back.`,
    onDragOver: ({ active, over }) => {
      if (!over) return `${title(String(active.id))} is not over a column.`;
      return `${title(String(active.id))} is over ${overLabel(String(over.id), String(active.id)) ?? "a column"}.`;
    },
    onDragEnd: ({ active, over }) => {
      if (!over) return `${title(String(active.id))} was put back; it is still in ${where(String(active.id))}.`;
      return `${title(String(active.id))} was dropped in ${overLabel(String(over.id), String(active.id)) ?? "a column"}.`;
    },
    onDragCancel: ({ active }) => `Moving ${title(String(active.id))} was cancelled. It is back in ${where(String(active.id))}.`,
  };
}
