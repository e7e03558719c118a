"use client";
import Link from "next/link";
import { useSortable } from "@dnd-kit/sortable";
import { CSS } from "@dnd-kit/utilities";
import type { BoardCard as Card } from "@/db/queries/board";
import { daysSince, isOverdue } from "@/lib/stages/board-filters";
import { STAGE_LABELS, nextStage } from "@/lib/stages/stages";

const initials = (name: string) =>
  name
    .split(/\s+/)
    .filter(Boolean)
    .map((w) => w[0]!.toUpperCase())
    .slice(0, 2)
    .join("");

/** One project on the board: a drag handle, its link, who is on it, and what its next stage needs. */
export function BoardCard({ card, now, error, saving }: { card: Card; now: Date; error?: string[]; saving?: boolean }) {
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging } = useSortable({ id: card.id, data: { stage: card.stage } });
  const days = daysSince(card.stageEnteredAt, now);
  const next = nextStage(card.stage);
  const overdue = isOverdue(card, now);
  const people = [...(card.leadName && card.leadId ? [{ id: card.leadId, name: card.leadName, lead: true }] : []), ...card.crew.map((c) => ({ ...c, lead: false }))];
  return (
    <li
      ref={setNodeRef}
      style={{ transform: CSS.Translate.toString(transform), transition }}
      className={`rounded-lg border bg-card p-2.5 text-sm shadow-sm ${isDragging ? "opacity-60 ring-2 ring-accent" : ""} ${error ? "border-danger" : "border-line"}`}
      data-testid="board-card"
      data-card-id={card.id}
      data-stage={card.stage}
      aria-busy={saving || undefined}
    >
      <div className="flex items-start gap-2">
        <button
          type="button"
          ref={setActivatorNodeRef}
          {...attributes}
          {...listeners}
          aria-label={`Move ${card.title}`}
          className="mt-0.5 shrink-0 cursor-grab touch-none rounded px-1 text-muted hover:bg-paper active:cursor-grabbing"
        >
          <svg viewBox="0 0 10 16" className="h-4 w-2.5" fill="currentColor" aria-hidden="true">
            <circle cx="2.5" cy="3" r="1.3" /><circle cx="7.5" cy="3" r="1.3" /><circle cx="2.5" cy="8" r="1.3" /><circle cx="7.5" cy="8" r="1.3" /><circle cx="2.5" cy="13" r="1.3" /><circle cx="7.5" cy="13" r="1.3" />
          </svg>
        </button>
        <div className="min-w-0 flex-1">
          <Link href={`/projects/${card.id}`} className="font-semibold leading-snug hover:underline">
            {card.title}
          </Link>
          <p className="truncate text-xs text-muted">
            {card.clientName} · {card.siteTown}
          </p>
        </div>
      </div>
      <div className="mt-2 flex flex-wrap items-center gap-1.5 text-xs">
        <span className={overdue ? "font-semibold text-caution" : "text-muted"}>
          {days === 0 ? "Entered today" : `${days} ${days === 1 ? "day" : "days"} in stage`}
          {overdue && " · overdue"}
        </span>
        <span className="ml-auto flex -space-x-1" aria-label={`People: ${people.map((p) => p.name).join(", ") || "nobody assigned"}`}>
          {people.map((p) => (
            <span
              key={`${p.id}-${p.lead}`}
              title={`${p.name}${p.lead ? " (lead)" : ""}`}
              className={`inline-flex h-6 w-6 items-center justify-center rounded-full border border-card text-[9px] font-bold tracking-tighter ${p.lead ? "bg-accent text-white" : "bg-paper text-ink"}`}
              aria-hidden="true"
            >
              {initials(p.name)}
            </span>
          ))}
        </span>
      </div>
      {card.nextNeeds && next && (
        <p
          className={`mt-2 rounded px-1.5 py-1 text-xs ${card.nextNeeds.length ? "bg-caution-soft text-caution" : "bg-ok-soft text-ok"}`}
          title={card.nextNeeds.join(" ")}
          data-testid="next-needs"
        >
          {card.nextNeeds.length ? `Before ${STAGE_LABELS[next]}: ${card.nextNeeds[0]}${card.nextNeeds.length > 1 ? ` (+${card.nextNeeds.length - 1} more)` : ""}` : `Ready for ${STAGE_LABELS[next]}`}
        </p>
      )}
      {card.quarantineDaysLeft != null && (
        <p className="mt-1 text-xs text-muted" data-testid="quarantine-days">
          {card.quarantineDaysLeft > 0 ? `Fish in quarantine: ${card.quarantineDaysLeft} ${card.quarantineDaysLeft === 1 ? "day" : "days"} left` : "Fish ready to leave quarantine"}
        </p>
      )}
      {error && (
        <div role="alert" className="mt-2 rounded bg-danger-soft px-1.5 py-1 text-xs text-danger" data-testid="card-error">
          {error.map((e) => (
            <p key={e}>{e}</p>
          ))}
        </div>
      )}
    </li>
  );
}
