import type { Range } from "./species";

/** The shared part of two closed ranges, or null when they don't meet. Symmetric in its arguments. */
export function overlap(a: Range, b: Range): Range | null {
  const min = Math.max(a.min, b.min);
  const max = Math.min(a.max, b.max);
  return min <= max ? { min, max } : null;
}

export function inRange(value: number, r: Range): boolean {
  return value >= r.min && value <= r.max;
}

export function formatRange(r: Range, unit: string, digits = 0): string {
  const f = (n: number) => n.toFixed(digits);
  return `${f(r.min)}–${f(r.max)}${unit ? ` ${unit}` : ""}`;
}
