import { toDisplay, unitLabel, type QuantityKind, type UnitSystem } from "../tank/units";

const PLACES: Record<QuantityKind, Record<UnitSystem, number>> = {
  length: { metric: 0, imperial: 1 },
  mass: { metric: 0, imperial: 0 },
  volume: { metric: 0, imperial: 0 },
  temperature: { metric: 1, imperial: 0 },
  pressure: { metric: 2, imperial: 0 },
  flow: { metric: 1, imperial: 1 },
};

/** Grouped digits with a fixed number of places, e.g. 1,274 or 11.57. */
export function formatNumber(value: number, places: number): string {
  return value.toLocaleString("en-GB", { minimumFractionDigits: places, maximumFractionDigits: places });
}

/** A stored SI value in the person's units, always with its unit: "1,800 mm", "70.9 in". */
export function formatQuantity(kind: QuantityKind, si: number, system: UnitSystem, places?: number): string {
  const p = places ?? PLACES[kind][system];
  return `${formatNumber(toDisplay(kind, si, system), p)} ${unitLabel(kind, system)}`;
}

/** The person's units first, the other system after it: "632 L (167 gal)". */
export function formatBoth(kind: QuantityKind, si: number, system: UnitSystem): string {
  const other: UnitSystem = system === "metric" ? "imperial" : "metric";
  return `${formatQuantity(kind, si, system)} (${formatQuantity(kind, si, other)})`;
}

/** Floor area, m² or ft² (1 ft = 0.3048 m exactly, NIST Handbook 44, Appendix C). */
export function formatArea(m2: number, system: UnitSystem): string {
  return system === "metric" ? `${formatNumber(m2, 2)} m²` : `${formatNumber(m2 / (0.3048 * 0.3048), 1)} ft²`;
}
