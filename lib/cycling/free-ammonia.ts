/**
 * Un-ionized ("free") ammonia, the share of total ammonia that harms fish.
 *
 * Source for every formula here: Emerson, Russo, Lund & Thurston (1975),
 * "Aqueous ammonia equilibrium calculations: effect of pH and temperature",
 * J. Fish. Res. Board Can. 32: 2379–2383 (freshwater; salinity ignored).
 */

/** Exact SI offset. The paper's printed table appears to use 273.2; the difference is under 0.5 % of the fraction. */
const KELVIN_OFFSET = 273.15;

/** Temperatures the calculator accepts, in °C: the span a tank can hold (the paper's fit covers 0–50 °C). */
export const AMMONIA_TEMP_RANGE_C = { min: 0, max: 40 } as const;

/** mg of NH3 per mg of N: molar masses 17.031 / 14.007 (IUPAC standard atomic weights: N 14.007, H 1.008). */
export const NH3_PER_N = 17.031 / 14.007;

function assertPH(pH: number): void {
  if (!Number.isFinite(pH) || pH < 0 || pH > 14) {
    throw new RangeError(`pH must be between 0 and 14 (got ${pH}).`);
  }
}

function assertTemp(tempC: number): void {
  if (!Number.isFinite(tempC) || tempC < AMMONIA_TEMP_RANGE_C.min || tempC > AMMONIA_TEMP_RANGE_C.max) {
    throw new RangeError(
      `Temperature must be between ${AMMONIA_TEMP_RANGE_C.min} and ${AMMONIA_TEMP_RANGE_C.max} °C (got ${tempC}).`,
    );
  }
}

/**
 * pKa of the ammonium ion at a temperature in °C.
 * Emerson et al. (1975): pKa = 0.09018 + 2729.92 / T, T in kelvin.
 */
export function ammoniaPKa(tempC: number): number {
  assertTemp(tempC);
  return 0.09018 + 2729.92 / (tempC + KELVIN_OFFSET);
}

/**
 * Fraction (0..1) of total ammonia present as un-ionized NH3.
 * Emerson et al. (1975): f = 1 / (10^(pKa − pH) + 1).
 * Throws RangeError for pH outside 0–14 or temperature outside 0–40 °C.
 */
export function unionizedAmmoniaFraction(pH: number, tempC: number): number {
  assertPH(pH);
  return 1 / (10 ** (ammoniaPKa(tempC) - pH) + 1);
}

/**
 * Free (un-ionized) ammonia from a total-ammonia reading.
 *
 * Input is total ammonia, NH3 + NH4+ ("TAN"), which is what hobby and trade
 * kits report. The answer is in the same basis as the input: a kit reading
 * "as NH3" gives mg/L NH3; a reading "as N" (NH3-N) gives mg/L NH3-N, and
 * multiplying by NH3_PER_N turns that into mg/L NH3. The fraction is the same
 * either way because it is a ratio of moles.
 */
export function freeAmmoniaMgL(totalAmmoniaMgL: number, pH: number, tempC: number): number {
  if (!Number.isFinite(totalAmmoniaMgL) || totalAmmoniaMgL < 0) {
    throw new RangeError(`Total ammonia must be 0 or more (got ${totalAmmoniaMgL}).`);
  }
  return totalAmmoniaMgL * unionizedAmmoniaFraction(pH, tempC);
}
