"use client";
import { useCallback, useEffect, useId, useMemo, useRef, useState } from "react";
import useSWR from "swr";
import { DndContext, DragOverlay, KeyboardSensor, MouseSensor, TouchSensor, useSensor, useSensors, type DragEndEvent, type DragStartEvent } from "@dnd-kit/core";
import type { BoardCard as Card, BoardData } from "@/db/queries/board";
import type { Role } from "@/lib/auth/roles";
import { STAGES, STAGE_LABELS, stageIndex, type Stage } from "@/lib/stages/stages";
import { compareKeys } from "@/lib/stages/ordering";
import { skippedStages } from "@/lib/stages/skipped";
import { filtersToQuery, matchesFilters, type BoardFilters as Filters } from "@/lib/stages/board-filters";
import { sendJson } from "@/lib/http/send-json";
import { boardAnnouncements } from "./announcements";
import { BoardColumn } from "./board-column";
import { BoardFilters } from "./board-filters";
import { MoveReasonDialog, type ReasonRequest } from "./move-reason-dialog";
import { MoveToDialog } from "./move-to-dialog";
import { SkipDialog } from "./skip-dialog";
import { StageSwitcher } from "./stage-switcher";
import { boardCollisions, boardKeyboardCoordinates } from "./collisions";
import { planOnCard, planToEnd, stageOfTarget, type PlannedMove } from "./plan-move";
type MoveAnswer = { stage: Stage; position: string; version: number; stageEnteredAt: string };

async function fetchBoard(url: string): Promise<BoardData> {
  const res = await fetch(url, { cache: "no-store" });
  if (!res.ok) throw new Error(`The board couldn't be loaded (${res.status}). Reload the page.`);
  return res.json();
}

/** A touch on the wave handle drags at once; anywhere else on a card it waits for a long press. */
const onHandle = ({ event }: { event: Event }) => event.target instanceof Element && event.target.closest("[data-move-handle]") !== null;

/**
 * Auto-scroll while dragging, kept gentle: only near the very edge and slowly, so a card dragged
 * towards the next column isn't carried past it.
 */
const AUTO_SCROLL = { threshold: { x: 0.06, y: 0.12 }, acceleration: 2, interval: 8 };

/** The install board: a column per stage (one at a time on a phone), cards moved by mouse, touch, keyboard or "Move to…". */
export function Board({ initial, role, initialFilters, nowIso }: { initial: BoardData; role: Role; initialFilters: Filters; nowIso: string }) {
  const dndId = useId();
  const dragging = useRef(false);
  const { data = initial, mutate, error: loadError } = useSWR<BoardData>("/api/projects", fetchBoard, { fallbackData: initial, isPaused: () => dragging.current });
  const [filters, setFilters] = useState<Filters>(initialFilters);
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [status, setStatus] = useState<string | null>(null);
  const [saving, setSaving] = useState<string | null>(null);
  const [ask, setAsk] = useState<{ request: ReasonRequest; move: PlannedMove } | null>(null);
  const [skip, setSkip] = useState<PlannedMove | null>(null);
  const [moveTo, setMoveTo] = useState<Card | null>(null);
  const [activeId, setActiveId] = useState<string | null>(null);
  const [phoneStage, setPhoneStage] = useState<Stage>(() => initial.cards.find((c) => matchesFilters(c, initialFilters, new Date(nowIso)))?.stage ?? STAGES[0]);
  const now = useMemo(() => new Date(nowIso), [nowIso]);

  useEffect(() => {
    window.history.replaceState(window.history.state, "", `/board${filtersToQuery(filters)}`);
  }, [filters]);

  const visible = useMemo(() => data.cards.filter((c) => matchesFilters(c, filters, now)), [data.cards, filters, now]);
  const columns = useMemo(() => {
    const out = Object.fromEntries(STAGES.map((s) => [s, [] as Card[]])) as Record<Stage, Card[]>;
    for (const c of visible) out[c.stage].push(c);
    for (const s of STAGES) out[s].sort(compareKeys);
    return out;
  }, [visible]);
  // Tanks in service that need no attention are counted, not loaded; the switcher's count includes them.
  const inServiceRest = data.inServiceRest ?? 0;
  const counts = useMemo(() => Object.fromEntries(STAGES.map((s) => [s, columns[s].length + (s === "in_service" ? inServiceRest : 0)])) as Record<Stage, number>, [columns, inServiceRest]);
  const byId = useCallback((id: string) => data.cards.find((c) => c.id === id) ?? null, [data.cards]);

  const sensors = useSensors(
    useSensor(MouseSensor, { activationConstraint: { distance: 5 } }),
    useSensor(TouchSensor, { activationConstraint: { delay: 250, tolerance: 8 }, bypassActivationConstraint: onHandle }),
    useSensor(KeyboardSensor, { coordinateGetter: boardKeyboardCoordinates }),
  );

  const announcements = useMemo(() => {
    const locate = (id: string) => {
      const c = byId(id);
      if (!c) return null;
      const col = columns[c.stage];
      return { title: c.title, stage: c.stage, index: Math.max(0, col.findIndex((x) => x.id === id)), count: col.length };
    };
    const overLabel = (overId: string, active: string) => {
      const stage = stageOfTarget(overId);
      if (stage !== undefined) return stage ? `${STAGE_LABELS[stage]}, at the end` : null;
      const o = byId(overId);
      if (!o) return null;
      const col = columns[o.stage];
      const count = col.some((x) => x.id === active) ? col.length : col.length + 1;
      return `${STAGE_LABELS[o.stage]}, position ${col.findIndex((x) => x.id === overId) + 1} of ${count}`;
    };
    return boardAnnouncements(locate, overLabel);
  }, [byId, columns]);

  async function perform(move: PlannedMove, extra: { reason?: string; overrideReason?: string } = {}) {
    const { card } = move;
    const before = data;
    setErrors(({ [card.id]: _, ...rest }) => rest);
    setStatus(null);
    setSaving(card.id);
    await mutate({ ...data, cards: data.cards.map((c) => (c.id === card.id ? { ...c, stage: move.toStage, position: move.localPosition } : c)) }, { revalidate: false });
    const res = await sendJson<MoveAnswer>(`/api/projects/${card.id}/move`, "POST", { toStage: move.toStage, ...move.placement, version: card.version, ...extra });
    setSaving(null);
    if (res.ok) {
      await mutate((cur) => cur && { ...cur, cards: cur.cards.map((c) => (c.id === card.id ? { ...c, ...res.data } : c)) }, { revalidate: true });
      if (move.toStage !== card.stage) setStatus(`${card.title} is now in ${STAGE_LABELS[move.toStage]}.`);
      return;
    }
    await mutate(before, { revalidate: false });
    if (res.status === 409) {
      await mutate();
      setStatus(res.error);
      return;
    }
    const reasons = Array.isArray(res.data?.reasons) ? (res.data.reasons as string[]) : [];
    if (res.status === 422 && res.data?.canOverride && !extra.overrideReason) {
      setAsk({ move, request: { kind: "override", title: card.title, toLabel: STAGE_LABELS[move.toStage], reasons } });
      return;
    }
    setErrors((e) => ({ ...e, [card.id]: [res.error, ...reasons] }));
  }

  function onDragStart(e: DragStartEvent) {
    dragging.current = true;
    setActiveId(String(e.active.id));
  }

  /** Moves back ask why; moves that jump a stage ask first; the rest go straight to the server. */
  function decide(move: PlannedMove | null) {
    if (!move) return;
    const { card, toStage } = move;
    if (stageIndex(toStage) < stageIndex(card.stage)) {
      setAsk({ move, request: { kind: "back", title: card.title, toLabel: STAGE_LABELS[toStage], reasons: [] } });
      return;
    }
    if (skippedStages(card.stage, toStage).length) {
      setSkip(move);
      return;
    }
    void perform(move);
  }

  function onDragEnd({ active, over }: DragEndEvent) {
    dragging.current = false;
    setActiveId(null);
    const card = byId(String(active.id));
    if (!card || !over) return;
    const overId = String(over.id);
    const stage = stageOfTarget(overId);
    if (stage === null) return;
    if (stage) return decide(planToEnd(card, stage, columns));
    const target = byId(overId);
    if (target) decide(planOnCard(card, target, columns));
  }

  const active = activeId ? byId(activeId) : null;
  return (
    <div className="flex flex-col gap-4">
      <BoardFilters filters={filters} people={data.people} onChange={setFilters} shown={visible.length} total={data.cards.length} />
      <p role="status" aria-live="polite" className="min-h-5 text-sm text-muted" data-testid="board-status">
        {loadError ? "The board couldn't be refreshed; check the connection. What you see may be out of date." : status}
      </p>
      <DndContext
        id={dndId}
        sensors={sensors}
        collisionDetection={boardCollisions}
        accessibility={{ announcements, screenReaderInstructions: { draggable: "To move a card, press Space. Use the arrow keys to choose a column and place, Space to drop it there, or Escape to put it back." } }}
        autoScroll={AUTO_SCROLL}
        onDragStart={onDragStart}
        onDragEnd={onDragEnd}
        onDragCancel={() => {
          dragging.current = false;
          setActiveId(null);
        }}
      >
        <StageSwitcher counts={counts} chosen={phoneStage} onChoose={setPhoneStage} />
        <div className="flex gap-2 pb-4 md:overflow-x-auto" data-testid="board">
          {STAGES.map((s) => (
            <BoardColumn key={s} stage={s} cards={columns[s]} rest={s === "in_service" ? inServiceRest : 0} now={now} errors={errors} saving={saving} shownOnPhone={s === phoneStage} onMoveTo={setMoveTo} />
          ))}
        </div>
        <DragOverlay>{active ? <div className="w-56 rounded-lg border border-accent bg-card p-2.5 text-sm font-semibold shadow-lg">{active.title}</div> : null}</DragOverlay>
      </DndContext>
      {ask && (
        <MoveReasonDialog
          request={ask.request}
          onCancel={() => {
            if (ask.request.kind === "override") setErrors((e) => ({ ...e, [ask.move.card.id]: ["The gate is closed; the card stayed where it was.", ...ask.request.reasons] }));
            setAsk(null);
          }}
          onSubmit={(reason) => {
            const { move, request } = ask;
            setAsk(null);
            void perform(move, request.kind === "back" ? { reason } : { overrideReason: reason });
          }}
        />
      )}
      {moveTo && (
        <MoveToDialog
          title={moveTo.title}
          from={moveTo.stage}
          onCancel={() => setMoveTo(null)}
          onChoose={(to) => {
            const card = moveTo;
            setMoveTo(null);
            decide(planToEnd(card, to, columns));
          }}
        />
      )}
      {skip && (
        <SkipDialog
          title={skip.card.title}
          from={skip.card.stage}
          to={skip.toStage}
          skipped={skippedStages(skip.card.stage, skip.toStage)}
          onCancel={() => {
            setStatus(`${skip.card.title} stayed in ${STAGE_LABELS[skip.card.stage]}.`);
            setSkip(null);
          }}
          onConfirm={() => {
            const move = skip;
            setSkip(null);
            void perform(move);
          }}
        />
      )}
      {role === "crew" && <p className="text-xs text-muted">You see the projects you're assigned to. A closed gate can only be passed by the lead.</p>}
    </div>
  );
}
