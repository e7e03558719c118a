/**
 * A project's checklist state from its tick history: the newest tick (highest seq) per item
 * decides whether it is done, and retired items don't count.
 */
import type { Stage } from "../stages/stages";

export type ChecklistItemLike = { id: string; stage: Stage; retiredAt: Date | string | null };
export type TickLike = { itemId: string; done: boolean; seq: number };
export type MeasureSpec = { unit: string; min: number; max: number };

/** The newest tick per item, by seq. */
export function latestTicks<T extends TickLike>(ticks: T[]): Map<string, T> {
  const out = new Map<string, T>();
  for (const t of ticks) {
    const prev = out.get(t.itemId);
    if (!prev || t.seq > prev.seq) out.set(t.itemId, t);
  }
  return out;
}

export type StageProgress = { stage: Stage; done: number; total: number; complete: boolean };

/** Done and total per stage, for the stages given, over the items still in use. */
export function stageProgress(stages: readonly Stage[], items: ChecklistItemLike[], ticks: TickLike[]): StageProgress[] {
  const latest = latestTicks(ticks);
  return stages.map((stage) => {
    const live = items.filter((i) => i.stage === stage && !i.retiredAt);
    const done = live.filter((i) => latest.get(i.id)?.done === true).length;
    return { stage, done, total: live.length, complete: live.length > 0 && done === live.length };
  });
}

/** Whole percent for a progress bar; an empty stage shows 0. */
export function percent(done: number, total: number): number {
  return total > 0 ? Math.round((done / total) * 100) : 0;
}

/** Checks a measured value against the item's range; the sentence names the range and unit. */
export function checkMeasuredValue(spec: MeasureSpec, value: number | null | undefined): string | null {
  if (value === null || value === undefined || !Number.isFinite(value)) return `Enter the measured value in ${spec.unit}.`;
  if (value < spec.min || value > spec.max) {
    return `${value} ${spec.unit} is outside the allowed ${spec.min}–${spec.max} ${spec.unit}. Correct it before ticking, or note why and ask the lead.`;
  }
  return null;
}
