/**
 * How much ammonia solution to add for a fishless cycle.
 *
 * Source: mass balance from the definitions of mass concentration
 * (mg/L × L = mg) and of a % w/w solution (mg of NH3 per mL =
 * density g/mL × 1000 mg/g × percent / 100).
 */

/** Volume of one drop from a dropper bottle, in mL (common practice: 20 drops to the mL). */
export const ML_PER_DROP = 0.05;

/** What to dose, and into what. */
export interface AmmoniaDoseInput {
  /** Water volume in litres (after rock and substrate), not the glass's nominal size. */
  tankVolumeL: number;
  /** Total ammonia to reach, mg/L as NH3 (the usual kit basis). */
  targetMgL: number;
  /** Strength of the solution, % w/w as NH3. A label giving % ammonium hydroxide (NH4OH) must be converted first: × 17.03 / 35.05. */
  sourcePercent: number;
  /** Total ammonia already in the water, mg/L as NH3. */
  currentMgL?: number;
  /**
   * Density of the solution in g/mL. Dilute ammonia is a little under 1 (about 0.96 at 10 %, from
   * memory). Leaving it at 1 overstates the ammonia in each mL, so the mL to add come out about 4 %
   * too few: it understates the dose.
   */
  sourceDensityGPerMl?: number;
}

/** How much to add. Nothing is rounded: round for display only. */
export interface AmmoniaDosePlan {
  /** mg of NH3 to add. */
  mgNH3: number;
  /** mL of the solution. */
  mL: number;
  /** The same volume in drops of ML_PER_DROP. */
  drops: number;
}

function assertRange(name: string, value: number, min: number, max: number, minExclusive: boolean): void {
  const aboveMin = minExclusive ? value > min : value >= min;
  if (!Number.isFinite(value) || !aboveMin || value > max) {
    throw new RangeError(`${name} must be ${minExclusive ? "more than" : "at least"} ${min} and at most ${max} (got ${value}).`);
  }
}

/**
 * mL (and drops) of an ammonia solution that raise `tankVolumeL` from
 * `currentMgL` to `targetMgL` total ammonia, all on an NH3 basis. If the
 * kit reads "as N", convert the target first (× NH3_PER_N in
 * free-ammonia.ts). Returns zeros when the water is already at or above
 * the target. Throws RangeError for impossible inputs.
 */
export function ammoniaDose({
  tankVolumeL,
  targetMgL,
  sourcePercent,
  currentMgL = 0,
  sourceDensityGPerMl = 1,
}: AmmoniaDoseInput): AmmoniaDosePlan {
  assertRange("Tank volume (L)", tankVolumeL, 0, 1e7, true);
  assertRange("Target ammonia (mg/L)", targetMgL, 0, 50, false);
  assertRange("Current ammonia (mg/L)", currentMgL, 0, 50, false);
  assertRange("Solution strength (%)", sourcePercent, 0, 100, true);
  assertRange("Solution density (g/mL)", sourceDensityGPerMl, 0.5, 2, false);

  const mgNH3 = Math.max(0, targetMgL - currentMgL) * tankVolumeL;
  const mgPerMl = sourceDensityGPerMl * 1000 * (sourcePercent / 100);
  const mL = mgNH3 / mgPerMl;
  return { mgNH3, mL, drops: mL / ML_PER_DROP };
}
