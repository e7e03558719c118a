import type { Stage } from "../stages/stages";

export type Tick = { itemId: string; done: boolean; at: Date; seq: number };
export type ChecklistItemRef = { id: string; stage: Stage };

/**
 * When each stage's checklist was first complete: ticks are replayed in order (the newest row per
 * item is its state), and a stage counts once every one of its current items is done together.
 */
export function checklistMilestones(items: readonly ChecklistItemRef[], ticks: readonly Tick[]): { stage: Stage; at: Date }[] {
  const byStage = new Map<Stage, string[]>();
  for (const item of items) byStage.set(item.stage, [...(byStage.get(item.stage) ?? []), item.id]);
  const stageOf = new Map(items.map((i) => [i.id, i.stage]));
  const state = new Map<string, boolean>();
  const reached = new Map<Stage, Date>();
  for (const t of [...ticks].sort((a, b) => a.seq - b.seq)) {
    state.set(t.itemId, t.done);
    const stage = stageOf.get(t.itemId);
    if (!stage || reached.has(stage) || !t.done) continue;
    if (byStage.get(stage)!.every((id) => state.get(id) === true)) reached.set(stage, t.at);
  }
  return [...reached].map(([stage, at]) => ({ stage, at }));
}

export type TimelineEntry =
  | { kind: "stage"; id: string; at: Date; fromStage: Stage | null; toStage: Stage; override: boolean; reason: string | null; byName: string }
  | { kind: "checklist"; id: string; at: Date; stage: Stage }
  | { kind: "photo"; id: string; at: Date; caption: string | null; fileName: string }
  | { kind: "note"; id: string; at: Date; body: string; byName: string; shared: boolean };

/**
 * The client's timeline, newest first. Notes not marked shared are dropped here as well as in the
 * query, so an internal note can't reach a client even if a caller passes one in.
 */
export function clientTimeline(entries: readonly TimelineEntry[]): TimelineEntry[] {
  return entries.filter((e) => e.kind !== "note" || e.shared === true).sort((a, b) => b.at.getTime() - a.at.getTime());
}
