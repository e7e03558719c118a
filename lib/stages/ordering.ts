import { generateKeyBetween } from "fractional-indexing";

export type Placed = { id: string; position: string };

/** Byte order, the order fractional-indexing keys are built for (the database sorts with collate "C"). */
export function compareKeys(a: Placed, b: Placed): number {
  if (a.position !== b.position) return a.position < b.position ? -1 : 1;
  return a.id < b.id ? -1 : a.id > b.id ? 1 : 0;
}

/** A key strictly between two keys; tolerates equal or crossed neighbours by placing after `a`. */
export function keyBetween(a: string | null, b: string | null): string {
  if (a !== null && b !== null && a >= b) return generateKeyBetween(a, null);
  return generateKeyBetween(a, b);
}

export type Placement = { beforeId?: string; afterId?: string; position?: number };

/**
 * The key for a card dropped into `column` (sorted, without the card itself): just before
 * `beforeId`, just after `afterId`, at 0-based `position`, or at the end. A neighbour that is no
 * longer in the column leaves the card at the end.
 */
export function keyForPlacement(column: Placed[], placement: Placement): string {
  const sorted = [...column].sort(compareKeys);
  let index = sorted.length;
  if (placement.beforeId) {
    const i = sorted.findIndex((c) => c.id === placement.beforeId);
    if (i >= 0) index = i;
  } else if (placement.afterId) {
    const i = sorted.findIndex((c) => c.id === placement.afterId);
    if (i >= 0) index = i + 1;
  } else if (placement.position !== undefined) {
    index = Math.max(0, Math.min(sorted.length, Math.floor(placement.position)));
  }
  return keyBetween(sorted[index - 1]?.position ?? null, sorted[index]?.position ?? null);
}

/** Moves `id` in an ordered list of ids to sit at `toIndex` (after removal); a pure helper for the board's optimistic update. */
export function moveInList<T>(list: T[], fromIndex: number, toIndex: number): T[] {
  const out = [...list];
  const [item] = out.splice(fromIndex, 1);
  out.splice(Math.max(0, Math.min(out.length, toIndex)), 0, item);
  return out;
}
