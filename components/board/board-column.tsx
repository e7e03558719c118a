"use client";
import { useDroppable } from "@dnd-kit/core";
import { SortableContext, verticalListSortingStrategy } from "@dnd-kit/sortable";
import type { BoardCard as Card } from "@/db/queries/board";
import { STAGE_LABELS, type Stage } from "@/lib/stages/stages";
import { StageGlyph } from "@/components/ui/stage-glyph";
import { STAGE_TONE } from "@/components/ui/stage-tone";
import { BoardCard } from "./board-card";

export const columnId = (stage: Stage) => `column:${stage}`;

/** One stage's column; the whole column is a drop target so an empty stage can take a card. */
export function BoardColumn({ stage, cards, now, errors, saving }: { stage: Stage; cards: Card[]; now: Date; errors: Record<string, string[]>; saving: string | null }) {
  const { setNodeRef, isOver } = useDroppable({ id: columnId(stage), data: { stage } });
  const tone = STAGE_TONE[stage];
  return (
    <section aria-labelledby={`col-${stage}`} className={`flex w-64 shrink-0 flex-col rounded-xl border-t-4 ${tone.border} bg-paper/70`} data-testid={`column-${stage}`}>
      <h2 id={`col-${stage}`} className={`flex items-center gap-1.5 px-3 py-2 text-sm font-semibold ${tone.text}`}>
        <StageGlyph stage={stage} />
        <span className="text-ink">{STAGE_LABELS[stage]}</span>
        <span className="ml-auto rounded-full bg-card px-2 text-xs text-muted">{cards.length}</span>
      </h2>
      <SortableContext id={columnId(stage)} items={cards.map((c) => c.id)} strategy={verticalListSortingStrategy}>
        <ul ref={setNodeRef} className={`flex min-h-24 flex-1 flex-col gap-2 px-2 pb-3 ${isOver ? "rounded-lg bg-accent-soft/60" : ""}`}>
          {cards.map((c) => (
            <BoardCard key={c.id} card={c} now={now} error={errors[c.id]} saving={saving === c.id} />
          ))}
          {cards.length === 0 && <li className="rounded-lg border border-dashed border-line px-2 py-4 text-center text-xs text-muted">No cards here</li>}
        </ul>
      </SortableContext>
    </section>
  );
}
