/**
 * Density of aquarium water. Water mass dominates an installed tank's weight,
 * so we use published equations rather than a flat 1 kg/L: at 25 °C fresh water
 * is 0.3 % lighter than 1000 kg/m³ and reef water about 2.3 % heavier.
 */

/**
 * Reef salinity assumed when none is given: 35 psu, which at 25 °C gives a
 * specific gravity of about 1.026 (common practice for reef aquariums).
 */
export const DEFAULT_REEF_SALINITY_PSU = 35;

/**
 * Density of air-free fresh water at one atmosphere, kg/m³, for 0–40 °C (ITS-90).
 *
 * Source: Tanaka, Girard, Davis, Peuto & Bignell (2001), "Recommended table for
 * the density of water between 0 °C and 40 °C based on recent experimental
 * reports", Metrologia 38:301–309, equation (1) (the CIPM formula):
 *   ρ = a5 · [1 − (t + a1)² (t + a2) / (a3 (t + a4))]
 * Tap water's dissolved solids add well under 0.1 kg/m³, below what matters here.
 */
export function freshWaterDensity(tempC: number): number {
  const a1 = -3.983035; // °C
  const a2 = 301.797; // °C
  const a3 = 522528.9; // °C²
  const a4 = 69.34881; // °C
  const a5 = 999.97495; // kg/m³
  const t = tempC;
  return a5 * (1 - ((t + a1) ** 2 * (t + a2)) / (a3 * (t + a4)));
}

/**
 * ITS-90 to IPTS-68 temperature, because EOS-80 was fitted on the 1968 scale.
 * Source: Saunders (1990), "The International Temperature Scale of 1990, ITS-90",
 * WOCE Newsletter 10: t68 = 1.00024 · t90 over the oceanographic range.
 */
function its90ToIpts68(t90: number): number {
  return 1.00024 * t90;
}

/**
 * Density of seawater at one atmosphere, kg/m³, from the one-atmosphere
 * International Equation of State of Seawater (EOS-80).
 *
 * Source: Millero & Poisson (1981), "International one-atmosphere equation of
 * state of seawater", Deep-Sea Research 28A:625–629, adopted in UNESCO (1981),
 * Technical Papers in Marine Science 36 (tenth report of the Joint Panel on
 * Oceanographic Tables and Standards), and restated in Fofonoff & Millard (1983),
 * UNESCO Technical Papers in Marine Science 44, eqs. (13)–(14):
 *   ρ(S,t,0) = ρw + A·S + B·S^1.5 + C·S²
 * where ρw is EOS-80's standard mean ocean water (pure water) polynomial.
 * Valid for 0–42 psu and −2–40 °C. Input temperature is ITS-90 (what a modern
 * thermometer reads); it is converted to IPTS-68 for the polynomial.
 */
export function seawaterDensity(tempC: number, salinityPsu: number = DEFAULT_REEF_SALINITY_PSU): number {
  const t = its90ToIpts68(tempC);
  const s = salinityPsu;
  const rhoW =
    999.842594 +
    6.793952e-2 * t -
    9.09529e-3 * t ** 2 +
    1.001685e-4 * t ** 3 -
    1.120083e-6 * t ** 4 +
    6.536332e-9 * t ** 5;
  const a = 8.24493e-1 - 4.0899e-3 * t + 7.6438e-5 * t ** 2 - 8.2467e-7 * t ** 3 + 5.3875e-9 * t ** 4;
  const b = -5.72466e-3 + 1.0227e-4 * t - 1.6546e-6 * t ** 2;
  const c = 4.8314e-4;
  return rhoW + a * s + b * s ** 1.5 + c * s ** 2;
}

/**
 * Density for the design's water kind, kg/m³: fresh uses Tanaka et al. (2001),
 * salt uses EOS-80 (Millero & Poisson 1981) at the given or default reef salinity.
 */
export function waterDensity(water: "fresh" | "salt", tempC: number, salinityPsu?: number): number {
  return water === "fresh" ? freshWaterDensity(tempC) : seawaterDensity(tempC, salinityPsu ?? DEFAULT_REEF_SALINITY_PSU);
}

/**
 * Specific gravity as a hobby hydrometer or refractometer reports it: density
 * relative to pure water at the same temperature (common practice convention;
 * some instruments reference 4 °C or 15.6 °C instead).
 */
export function specificGravity(tempC: number, salinityPsu: number = DEFAULT_REEF_SALINITY_PSU): number {
  return seawaterDensity(tempC, salinityPsu) / freshWaterDensity(tempC);
}
