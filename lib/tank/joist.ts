/**
 * The statics of a tank on a suspended timber floor: what the most loaded joist carries from the
 * tank, against what the same joist carries under the code's uniform live load.
 */

import type { StandFootprint } from "./design";

export interface JoistInput {
  totalWeightKN: number;
  spanMm: number;
  spacingMm: number;
  /** From the nearest bearing support to the near edge of the stand, mm. */
  distanceFromSupportMm: number;
  /** Uniform live load of the code for the room, kPa (kN/m²). */
  liveLoadKPa: number;
  /** "perpendicular": the stand's long side runs across the joists. */
  direction: "perpendicular" | "parallel";
  stand: { lengthMm: number; widthMm: number; footprint: StandFootprint };
}

export interface JoistEffects {
  direction: "perpendicular" | "parallel";
  /** Joists under the stand, counted on the safe side: floor(width across the joists / spacing), at least 1. */
  joistsUnder: number;
  /** Share of the tank's weight on the most loaded joist. */
  loadShare: number;
  /** The tank's load on the most loaded joist, kN. */
  loadKN: number;
  /** Where that load acts along the joist, from the nearest support, mm: the stand's centre. */
  positionMm: number;
  spanMm: number;
  momentKNm: number;
  shearKN: number;
  /** Under the code's live load: w = q·s, M = w·L²/8, V = w·L/2. */
  allowMomentKNm: number;
  allowShearKN: number;
  momentShare: number;
  shearShare: number;
  /** The larger of the two shares. */
  share: number;
  /** The stand reaches past the span: no figures can be trusted. */
  beyondSpan: boolean;
}

/**
 * Share of the tank's weight on the most loaded joist, on the safe side.
 * A solid base shares its load over the joists under it: at least floor(W/s) of them lie under a
 * width W across joists at spacing s, wherever it stands. Legs put their load only on the joists
 * under them: across the joists, the front and back leg at one end line up on one joist (2 of n
 * legs); along the joists, a whole row (half the legs) sits on one joist, and all of them when the
 * stand is narrower than the spacing.
 */
export function mostLoadedJoistShare(
  stand: JoistInput["stand"],
  spacingMm: number,
  direction: JoistInput["direction"],
): { joistsUnder: number; loadShare: number } {
  const long = Math.max(stand.lengthMm, stand.widthMm);
  const short = Math.min(stand.lengthMm, stand.widthMm);
  const across = direction === "perpendicular" ? long : short;
  const joistsUnder = Math.max(1, Math.floor(across / spacingMm));
  let loadShare = 1 / joistsUnder;
  const fp = stand.footprint;
  if (fp.kind === "legs") {
    const n = fp.count;
    loadShare = direction === "perpendicular" ? Math.min(1, 2 / n) : short < spacingMm ? 1 : Math.ceil(n / 2) / n;
  }
  return { joistsUnder, loadShare };
}

/**
 * Moment and end shear in the most loaded joist, treated as a simply supported beam of span L with
 * the tank's share P as one load at the stand's centre, x from the nearest support:
 *   M = P·x·(L − x)/L (under the load), V = P·max(x, L − x)/L (the larger end reaction)
 * (AISC Steel Construction Manual, Table 3-23, case 7, "simple beam, concentrated load at any
 * point"; the same as Roark's Formulas for Stress and Strain, Table 8.1, case 1e; case numbers from memory). Putting the
 * load at its centre is on the safe side for the moment: the moment at any section is a concave
 * function of where a load stands (its influence line is a triangle), so the resultant at the
 * centroid gives at least the moment of the load spread out; the end reactions are the same.
 *
 * The allowance is what the code's uniform live load q puts into the same joist: w = q·s,
 * M = w·L²/8, V = w·L/2 (same handbook, case 1, "simple beam, uniformly distributed load").
 * The tank replaces people and furniture where it stands; live load on the rest of the span isn't
 * added, and near a support the shear figure is conservative (timber design codes let loads very
 * close to a support be left out of the shear check).
 */
export function joistLoadEffects(input: JoistInput): JoistEffects {
  const L = input.spanMm / 1000;
  const s = input.spacingMm / 1000;
  const long = Math.max(input.stand.lengthMm, input.stand.widthMm);
  const short = Math.min(input.stand.lengthMm, input.stand.widthMm);
  const along = (input.direction === "perpendicular" ? short : long) / 1000;
  const { joistsUnder, loadShare } = mostLoadedJoistShare(input.stand, input.spacingMm, input.direction);
  const P = input.totalWeightKN * loadShare;
  const a = input.distanceFromSupportMm / 1000;
  const beyondSpan = a + along > L;
  const x = Math.min(a + along / 2, L);
  const momentKNm = (P * x * (L - x)) / L;
  const shearKN = (P * Math.max(x, L - x)) / L;
  const w = input.liveLoadKPa * s;
  const allowMomentKNm = (w * L * L) / 8;
  const allowShearKN = (w * L) / 2;
  const momentShare = momentKNm / allowMomentKNm;
  const shearShare = shearKN / allowShearKN;
  return {
    direction: input.direction,
    joistsUnder,
    loadShare,
    loadKN: P,
    positionMm: x * 1000,
    spanMm: input.spanMm,
    momentKNm,
    shearKN,
    allowMomentKNm,
    allowShearKN,
    momentShare,
    shearShare,
    share: Math.max(momentShare, shearShare),
    beyondSpan,
  };
}
