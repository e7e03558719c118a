import { fromDisplay, toDisplay, type QuantityKind, type UnitSystem } from "../tank/units";

/**
 * Forms hold what a person typed, as text in their own units; storage is SI. These helpers convert
 * at that edge. A field left as it was shown keeps its stored SI value exactly, so opening and
 * saving a design in inches doesn't nudge it by rounding (which would make an approval stale).
 */

export type NumberKind = QuantityKind | "plain";

/** Decimal places shown when a stored value is put into a form field. */
const PLACES: Record<NumberKind, Record<UnitSystem, number>> = {
  length: { metric: 1, imperial: 2 },
  mass: { metric: 1, imperial: 1 },
  volume: { metric: 1, imperial: 1 },
  temperature: { metric: 1, imperial: 1 },
  pressure: { metric: 2, imperial: 1 },
  flow: { metric: 1, imperial: 1 },
  plain: { metric: 2, imperial: 2 },
};

/** A stored SI value as the text a form shows; empty for no value. */
export function toFieldText(kind: NumberKind, si: number | null | undefined, system: UnitSystem): string {
  if (si === null || si === undefined || !Number.isFinite(si)) return "";
  const shown = kind === "plain" ? si : toDisplay(kind, si, system);
  return String(Number(shown.toFixed(fieldPlaces(kind, system, shown))));
}

/**
 * Places a practitioner reads: whole millimetres for sizes (so 168 in shows as 4267 mm, not
 * 4267.2), tenths for thicknesses under 100 mm; inches to 0.01 under 10 in, else 0.1.
 */
function fieldPlaces(kind: NumberKind, system: UnitSystem, shown: number): number {
  if (kind === "length") {
    if (system === "metric") return Math.abs(shown) < 100 ? 1 : 0;
    return Math.abs(shown) < 10 ? 2 : 1;
  }
  return PLACES[kind][system];
}

/**
 * Typed text back to an SI number: undefined when empty, NaN when it isn't a number (the schema
 * then says so). A comma is read as a decimal point.
 */
export function fromFieldText(kind: NumberKind, text: string | null | undefined, system: UnitSystem): number | undefined {
  const t = (text ?? "").trim().replace(",", ".");
  if (t === "") return undefined;
  const n = Number(t);
  if (!Number.isFinite(n)) return Number.NaN;
  return kind === "plain" ? n : fromDisplay(kind, n, system);
}

/** Like fromFieldText, but a field still showing the stored value's text keeps the stored value. */
export function keepOrConvert(kind: NumberKind, text: string, system: UnitSystem, stored: number | null | undefined): number | undefined {
  if (stored !== null && stored !== undefined && text === toFieldText(kind, stored, system)) return stored;
  return fromFieldText(kind, text, system);
}

export function getPath(obj: unknown, path: string): unknown {
  let cur: unknown = obj;
  for (const key of path.split(".")) {
    if (cur === null || typeof cur !== "object") return undefined;
    cur = (cur as Record<string, unknown>)[key];
  }
  return cur;
}
