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

/** 1 lbf = 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N exactly (NIST Handbook 44, Appendix C). */
const KN_PER_LBF = (0.45359237 * 9.80665) / 1000;
/** 1 lbf·ft = 4.4482216152605 N × 0.3048 m (NIST Handbook 44, Appendix C). */
const KNM_PER_LBF_FT = KN_PER_LBF * 0.3048;
/** 1 lb/ft³ = 0.45359237 kg / 0.3048³ m³ = 16.018463 kg/m³ (NIST Handbook 44, Appendix C). */
const KG_M3_PER_LB_FT3 = 0.45359237 / 0.3048 ** 3;

/** A panel thickness: 0.1 mm or 0.01 in, the precision glass is specified to. */
export function formatThickness(mm: number, system: UnitSystem): string {
  return system === "metric" ? `${formatNumber(mm, 1)} mm` : `${formatNumber(mm / 25.4, 2)} in`;
}

/** A force: kN to 2 places, or lbf to the pound. */
export function formatForce(kN: number, system: UnitSystem): string {
  return system === "metric" ? `${formatNumber(kN, 2)} kN` : `${formatNumber(kN / KN_PER_LBF, 0)} lbf`;
}

/** A bending moment: kN·m to 2 places, or lbf·ft to the unit. */
export function formatMoment(kNm: number, system: UnitSystem): string {
  return system === "metric" ? `${formatNumber(kNm, 2)} kN·m` : `${formatNumber(kNm / KNM_PER_LBF_FT, 0)} lbf·ft`;
}

/** A density: kg/m³ to 0.1, or lb/ft³ to 0.01. */
export function formatDensity(kgM3: number, system: UnitSystem): string {
  return system === "metric" ? `${formatNumber(kgM3, 1)} kg/m³` : `${formatNumber(kgM3 / KG_M3_PER_LB_FT3, 2)} lb/ft³`;
}

/** A pressure from kPa: kPa to 0.01, or psf to the unit. */
export function formatPressure(kPa: number, system: UnitSystem): string {
  return formatQuantity("pressure", kPa, system);
}

/** A share of an allowance as a whole percentage. */
export function formatShare(ratio: number): string {
  return `${formatNumber(ratio * 100, 0)} %`;
}
