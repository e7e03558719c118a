"use client";
import { useCallback, useEffect, useId, useMemo, useRef, useState } from "react";
import useSWR from "swr";
import { DndContext, DragOverlay, KeyboardSensor, PointerSensor, TouchSensor, closestCorners, useSensor, useSensors, type DragEndEvent, type DragStartEvent } from "@dnd-kit/core";
import { arrayMove, sortableKeyboardCoordinates } from "@dnd-kit/sortable";
import type { BoardCard as Card, BoardData } from "@/db/queries/board";
import type { Role } from "@/lib/auth/roles";
import { STAGES, STAGE_LABELS, isStage, stageIndex, type Stage } from "@/lib/stages/stages";
import { compareKeys, keyBetween, type Placement } from "@/lib/stages/ordering";
import { filtersToQuery, matchesFilters, type BoardFilters as Filters } from "@/lib/stages/board-filters";
import { sendJson } from "@/lib/http/send-json";
import { boardAnnouncements } from "./announcements";
import { BoardColumn } from "./board-column";
import { BoardFilters } from "./board-filters";
import { MoveReasonDialog, type ReasonRequest } from "./move-reason-dialog";

type PlannedMove = { card: Card; toStage: Stage; placement: Placement; localPosition: string };
type MoveAnswer = { stage: Stage; position: string; version: number; stageEnteredAt: string };

async function fetchBoard(url: string): Promise<BoardData> {
  const res = await fetch(url, { cache: "no-store" });
  if (!res.ok) throw new Error(`The board couldn't be loaded (${res.status}). Reload the page.`);
  return res.json();
}

/** The install board: a column per stage, cards moved by pointer, touch or keyboard. */
export function Board({ initial, role, initialFilters, nowIso }: { initial: BoardData; role: Role; initialFilters: Filters; nowIso: string }) {
  const dndId = useId();
  const dragging = useRef(false);
  const { data = initial, mutate, error: loadError } = useSWR<BoardData>("/api/projects", fetchBoard, { fallbackData: initial, isPaused: () => dragging.current });
  const [filters, setFilters] = useState<Filters>(initialFilters);
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [status, setStatus] = useState<string | null>(null);
  const [saving, setSaving] = useState<string | null>(null);
  const [ask, setAsk] = useState<{ request: ReasonRequest; move: PlannedMove } | null>(null);
  const [activeId, setActiveId] = useState<string | null>(null);
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
  const byId = useCallback((id: string) => data.cards.find((c) => c.id === id) ?? null, [data.cards]);

  const sensors = useSensors(
    useSensor(PointerSensor, { activationConstraint: { distance: 5 } }),
    useSensor(TouchSensor, { activationConstraint: { delay: 200, tolerance: 6 } }),
    useSensor(KeyboardSensor, { coordinateGetter: sortableKeyboardCoordinates }),
  );

  const announcements = useMemo(() => {
    const locate = (id: string) => {
      const c = byId(id);
      if (!c) return null;
      const col = columns[c.stage];
      return { title: c.title, stage: c.stage, index: Math.max(0, col.findIndex((x) => x.id === id)), count: col.length };
    };
    const overLabel = (overId: string, active: string) => {
      if (overId.startsWith("column:")) {
        const stage = overId.slice(7);
        return isStage(stage) ? `${STAGE_LABELS[stage]}, at the end` : null;
      }
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

  function onDragEnd({ active, over }: DragEndEvent) {
    dragging.current = false;
    setActiveId(null);
    const card = byId(String(active.id));
    if (!card || !over) return;
    const overId = String(over.id);
    let toStage: Stage;
    let list: Card[];
    let index: number;
    if (overId.startsWith("column:")) {
      const s = overId.slice(7);
      if (!isStage(s)) return;
      toStage = s;
      list = columns[s].filter((c) => c.id !== card.id);
      index = list.length;
      if (s === card.stage && columns[s].at(-1)?.id === card.id) return;
    } else {
      const target = byId(overId);
      if (!target) return;
      toStage = target.stage;
      const full = columns[toStage];
      if (toStage === card.stage) {
        const from = full.findIndex((c) => c.id === card.id);
        const to = full.findIndex((c) => c.id === overId);
        if (from === to) return;
        list = arrayMove(full, from, to).filter((c) => c.id !== card.id);
        index = to;
      } else {
        list = full;
        index = full.findIndex((c) => c.id === overId);
      }
    }
    const placement: Placement = list[index] ? { beforeId: list[index].id } : list[index - 1] ? { afterId: list[index - 1].id } : {};
    let localPosition = card.position;
    try {
      localPosition = keyBetween(list[index - 1]?.position ?? null, list[index]?.position ?? null);
    } catch {
      // The server places it; the local key only orders the optimistic view.
    }
    const move = { card, toStage, placement, localPosition };
    if (stageIndex(toStage) < stageIndex(card.stage)) {
      setAsk({ move, request: { kind: "back", title: card.title, toLabel: STAGE_LABELS[toStage], reasons: [] } });
      return;
    }
    void perform(move);
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
        collisionDetection={closestCorners}
        accessibility={{ announcements, screenReaderInstructions: { draggable: "To move a card, press Space. Use the arrow keys to choose a column and place, Space to drop it there, or Escape to put it back." } }}
        onDragStart={onDragStart}
        onDragEnd={onDragEnd}
        onDragCancel={() => {
          dragging.current = false;
          setActiveId(null);
        }}
      >
        <div className="flex gap-3 overflow-x-auto pb-4" data-testid="board">
          {STAGES.map((s) => (
            <BoardColumn key={s} stage={s} cards={columns[s]} now={now} errors={errors} saving={saving} />
          ))}
        </div>
        <DragOverlay>{active ? <div className="w-60 rounded-lg border border-accent bg-card p-2.5 text-sm font-semibold shadow-lg">{active.title}</div> : null}</DragOverlay>
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
      {role === "crew" && <p className="text-xs text-muted">You see the projects you're assigned to. A closed gate can only be passed by the lead.</p>}
    </div>
  );
}
