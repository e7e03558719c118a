"use client";
import type { SyntheticEvent } from "react";
import Link from "next/link";
import { useSortable } from "@dnd-kit/sortable";
import { CSS } from "@dnd-kit/utilities";
import type { BoardCard as Card } from "@/db/queries/board";
import { peopleWords } from "@/lib/stages/card-words";
import { STAGE_LABELS, nextStage } from "@/lib/stages/stages";
import { cardStatusLines, type StatusLine } from "./card-lines";

const LINE_TONE: Record<StatusLine["tone"], string> = {
  quiet: "text-muted",
  caution: "font-semibold text-caution",
  ok: "text-ok",
  danger: "font-semibold text-danger",
};

/** Three short waves: the handle a thumb holds on a touch screen, and the keyboard's way in. */
function WaveHandle() {
  return (
    <svg viewBox="0 0 16 16" className="h-4 w-4" fill="none" stroke="currentColor" strokeWidth={1.5} strokeLinecap="round" aria-hidden="true">
      <path d="M2 4.5 q1.5 -1.5 3 0 t3 0 t3 0 t3 0 M2 8.5 q1.5 -1.5 3 0 t3 0 t3 0 t3 0 M2 12.5 q1.5 -1.5 3 0 t3 0 t3 0 t3 0" />
    </svg>
  );
}

/**
 * One project on the board. The whole card drags with a mouse; on a touch screen a long press
 * drags it (a quick swipe still scrolls) and the wave handle drags at once; the keyboard picks it up
 * from the same handle, which shows, with a ring round the card, when it has focus. "Move to…" does
 * the same without dragging.
 */
export function BoardCard({ card, now, error, saving, onMoveTo }: { card: Card; now: Date; error?: string[]; saving?: boolean; onMoveTo: (card: Card) => void }) {
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging } = useSortable({
    id: card.id,
    data: { stage: card.stage },
    attributes: { roleDescription: "movable card" },
  });
  // dnd-kit types its listeners loosely; each is a plain event handler.
  const on = (name: string) => listeners?.[name] as ((e: SyntheticEvent) => void) | undefined;
  const next = nextStage(card.stage);
  const lines = cardStatusLines(card, now);
  return (
    // The whole card is a pointer drag surface; keyboard and screen-reader users move it from its
    // handle (below), which carries the keyboard listener and the button role.
    // eslint-disable-next-line jsx-a11y/no-noninteractive-element-interactions
    <li
      ref={setNodeRef}
      style={{ transform: CSS.Translate.toString(transform), transition }}
      onMouseDown={on("onMouseDown")}
      onTouchStart={on("onTouchStart")}
      className={`relative cursor-grab touch-manipulation select-none rounded-lg border bg-card p-2.5 text-sm shadow-sm active:cursor-grabbing has-[[data-move-handle]:focus-visible]:ring-2 has-[[data-move-handle]:focus-visible]:ring-accent has-[[data-move-handle]:focus-visible]:ring-offset-2 ${isDragging ? "opacity-50" : ""} ${error ? "border-danger" : "border-line"}`}
      data-testid="board-card"
      data-card-id={card.id}
      data-stage={card.stage}
      aria-busy={saving || undefined}
    >
      <div className="flex items-start gap-2">
        <div className="min-w-0 flex-1">
          <Link href={`/projects/${card.id}`} draggable={false} className="font-semibold leading-snug hover:underline">
            {card.title}
          </Link>
          <p className="text-xs text-muted">
            {card.clientName} · {card.siteTown}
          </p>
        </div>
        <button
          type="button"
          ref={setActivatorNodeRef}
          {...attributes}
          onKeyDown={on("onKeyDown")}
          data-move-handle=""
          aria-label={`Move ${card.title}`}
          className="-mr-1 -mt-1 shrink-0 touch-none rounded p-1.5 text-muted hover:bg-paper pointer-fine:sr-only pointer-fine:focus-visible:not-sr-only"
        >
          <WaveHandle />
        </button>
      </div>
      <p className="mt-1.5 text-xs text-ink" data-testid="card-people">
        {peopleWords(card.leadName, card.crew.map((c) => c.name))}
      </p>
      {card.unreadMessages > 0 && (
        <Link href={`/projects/${card.id}/talk`} className="text-xs font-semibold text-accent hover:underline" data-testid="card-unread">
          {card.unreadMessages} new {card.unreadMessages === 1 ? "message" : "messages"} from the client
        </Link>
      )}
      <ul className="text-xs" data-testid="card-lines">
        {lines.map((l) => (
          <li key={l.key} className={LINE_TONE[l.tone]} data-testid={`card-line-${l.key}`}>
            {l.text}
          </li>
        ))}
      </ul>
      {card.nextNeeds && next && (
        <p
          className={`mt-2 rounded px-1.5 py-1 text-xs ${card.nextNeeds.length ? "bg-caution-soft text-caution" : "bg-ok-soft text-ok"}`}
          title={card.nextNeeds.join(" ")}
          data-testid="next-needs"
        >
          {card.nextNeeds.length ? `Before ${STAGE_LABELS[next]}: ${card.nextNeeds[0]}${card.nextNeeds.length > 1 ? ` (+${card.nextNeeds.length - 1} more)` : ""}` : `Ready for ${STAGE_LABELS[next]}`}
        </p>
      )}
      {error && (
        <div role="alert" className="mt-2 rounded bg-danger-soft px-1.5 py-1 text-xs text-danger" data-testid="card-error">
          {error.map((e) => (
            <p key={e}>{e}</p>
          ))}
        </div>
      )}
      <div className="mt-1.5 flex justify-end">
        <button type="button" onClick={() => onMoveTo(card)} className="rounded px-1.5 py-1 text-xs font-medium text-accent underline-offset-2 hover:underline">
          Move to…<span className="sr-only"> {card.title}</span>
        </button>
      </div>
    </li>
  );
}
