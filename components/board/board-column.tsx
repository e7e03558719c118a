"use client";
import Link from "next/link";
import { useDroppable } from "@dnd-kit/core";
import { SortableContext, verticalListSortingStrategy } from "@dnd-kit/sortable";
import type { BoardCard as Card } from "@/db/queries/board";
import { STAGE_LABELS, type Stage } from "@/lib/stages/stages";
import { TankMark } from "@/components/ui/tank-mark";
import { STAGE_TONE } from "@/components/ui/stage-tone";
import { BoardCard } from "./board-card";
import { installsWords } from "./count-words";
import { inServiceHeaderWords } from "@/lib/stages/in-service-attention";

export const columnId = (stage: Stage) => `column:${stage}`;

/**
 * One stage's column, headed by the tank as it stands at that stage; the whole column is a drop
 * target so an empty stage can take a card. On a phone only the chosen stage's column shows.
 */
export function BoardColumn({ stage, cards, rest = 0, now, errors, saving, shownOnPhone, onMoveTo }: { stage: Stage; cards: Card[]; rest?: number; now: Date; errors: Record<string, string[]>; saving: string | null; shownOnPhone: boolean; onMoveTo: (card: Card) => void }) {
  const inService = stage === "in_service";
  const { setNodeRef, isOver } = useDroppable({ id: columnId(stage), data: { stage } });
  const tone = STAGE_TONE[stage];
  return (
    <section
      aria-labelledby={`col-${stage}`}
      className={`${shownOnPhone ? "flex" : "hidden"} min-w-0 flex-1 flex-col rounded-xl bg-paper md:flex md:min-w-44`}
      data-testid={`column-${stage}`}
    >
      <header className="flex items-end gap-2 px-2.5 pt-2 pb-2">
        <TankMark stage={stage} className={`h-7 w-9 shrink-0 ${tone.fill}`} />
        <div className="min-w-0">
          <h2 id={`col-${stage}`} className={`text-sm font-semibold leading-tight ${tone.text}`}>
            {STAGE_LABELS[stage]}
          </h2>
          <p className="text-xs text-muted" data-testid={inService ? "in-service-count" : undefined}>
            {inService ? inServiceHeaderWords(cards.length, rest) : installsWords(cards.length)}
          </p>
          {inService && (
            <Link href="/board/in-service" className="text-xs font-semibold text-accent hover:underline" data-testid="in-service-all">
              All tanks in service
            </Link>
          )}
        </div>
      </header>
      <SortableContext id={columnId(stage)} items={cards.map((c) => c.id)} strategy={verticalListSortingStrategy}>
        <ul ref={setNodeRef} className={`flex min-h-24 flex-1 flex-col gap-2 rounded-b-xl px-2 pt-1 pb-3 ${isOver ? `${tone.soft}` : ""}`}>
          {cards.map((c) => (
            <BoardCard key={c.id} card={c} now={now} error={errors[c.id]} saving={saving === c.id} onMoveTo={onMoveTo} />
          ))}
          {cards.length === 0 && <li className="rounded-lg border border-dashed border-line px-2 py-4 text-center text-xs text-muted">{inService ? "Nothing needs attention" : "Nothing at this stage"}</li>}
        </ul>
      </SortableContext>
    </section>
  );
}
