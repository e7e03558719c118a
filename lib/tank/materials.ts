/**
 * Shopping and set-up quantities: how much substrate to order, how long the
 * fill takes, and how much water conditioner to add.
 */

export interface SubstrateQuantityInput {
  /** Inside length and width of the area to cover, mm. */
  footprintLengthMm: number;
  footprintWidthMm: number;
  depthMm: number;
  /** Bed (bulk) density, kg/m³; see SUBSTRATE_PROPERTIES for typical figures. */
  bulkDensityKgM3: number;
  /** Bag size by weight, kg. */
  bagSizeKg?: number;
  /** Bag size by volume, L. */
  bagSizeL?: number;
}

export interface SubstrateQuantity {
  volumeL: number;
  massKg: number;
  /** Whole bags to buy; null when no bag size was given. */
  bags: number | null;
}

/**
 * Rounds up to whole items, ignoring floating-point dust so that exactly
 * 5 bags' worth doesn't become 6.
 */
function wholeItems(count: number): number {
  return Math.ceil(count - 1e-9);
}

/**
 * Substrate for a bed: volume = length × width × depth (prism), mass = volume ×
 * bulk density, bags = volume or mass ÷ bag size rounded up. When both bag sizes
 * are given the larger count is used, because labels rarely agree with each other.
 */
export function substrateQuantity(input: SubstrateQuantityInput): SubstrateQuantity {
  // mm³ → L: 1 L = 10⁶ mm³ (SI Brochure, 9th ed., Table 8: litre = dm³).
  const volumeL = (input.footprintLengthMm * input.footprintWidthMm * input.depthMm) / 1e6;
  // kg/m³ × L ÷ 1000 L/m³.
  const massKg = (volumeL * input.bulkDensityKgM3) / 1000;
  const counts: number[] = [];
  if (input.bagSizeKg !== undefined && input.bagSizeKg > 0) counts.push(wholeItems(massKg / input.bagSizeKg));
  if (input.bagSizeL !== undefined && input.bagSizeL > 0) counts.push(wholeItems(volumeL / input.bagSizeL));
  return { volumeL, massKg, bags: counts.length > 0 ? Math.max(...counts) : null };
}

/** A conditioner label's dose: `ml` millilitres treats `perLitres` litres of water. */
export interface ConditionerDose {
  ml: number;
  perLitres: number;
}

export interface FillPlanInput {
  /** Water to add, L (tank net volume plus sump, as the caller sees fit). */
  netVolumeL: number;
  /** Hose flow, L/min; measure it with hoseFlowFromBucket. */
  hoseFlowLPerMin: number;
  /** Conditioner dose from the label; omit when no conditioner is used. */
  conditionerDose?: ConditionerDose;
}

export interface FillPlan {
  fillTimeMinutes: number;
  /** Conditioner to add, mL; null when no dose was given. */
  conditionerMl: number | null;
}

/**
 * Fill time = volume ÷ flow; conditioner = volume × (label mL ÷ label litres),
 * straight proportion as dosing labels state it.
 */
export function fillPlan(input: FillPlanInput): FillPlan {
  if (!(input.hoseFlowLPerMin > 0)) throw new RangeError("hoseFlowLPerMin must be more than zero");
  const dose = input.conditionerDose;
  if (dose !== undefined && !(dose.perLitres > 0)) throw new RangeError("conditionerDose.perLitres must be more than zero");
  return {
    fillTimeMinutes: input.netVolumeL / input.hoseFlowLPerMin,
    conditionerMl: dose === undefined ? null : (input.netVolumeL * dose.ml) / dose.perLitres,
  };
}

/**
 * Hose flow from the bucket test, L/min: time how long the hose takes to fill a
 * bucket of known size (common practice). flow = litres ÷ (seconds ÷ 60).
 */
export function hoseFlowFromBucket(bucketL: number, seconds: number): number {
  if (!(seconds > 0)) throw new RangeError("seconds must be more than zero");
  return (bucketL * 60) / seconds;
}
