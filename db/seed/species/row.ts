import type { Diet, SwimLevel, Temperament, WaterKind } from "../../../lib/stocking/species";

/**
 * One catalogue row, compact for the seed files:
 * [common name, scientific name, °C min, °C max, pH min, pH max, adult length cm, temperament,
 *  territorial, smallest group, swimming level, diet, coral-safe, invertebrate-safe,
 *  minimum tank length cm or null, notes in our own words].
 */
export type SpeciesRow = [
  string, string, number, number, number, number, number,
  "p" | "s" | "a", boolean, number, "t" | "m" | "b" | "a", "h" | "o" | "c" | "p",
  boolean | null, boolean | null, number | null, string,
];

const TEMPERAMENT: Record<SpeciesRow[7], Temperament> = { p: "peaceful", s: "semi-aggressive", a: "aggressive" };
const LEVEL: Record<SpeciesRow[10], SwimLevel> = { t: "top", m: "middle", b: "bottom", a: "all" };
const DIET: Record<SpeciesRow[11], Diet> = { h: "herbivore", o: "omnivore", c: "carnivore", p: "planktivore" };

/** A seed row as a catalogue record (SI units), with where its values came from. */
export function speciesRecord(water: WaterKind, source: string, r: SpeciesRow) {
  const [commonName, scientificName, tMin, tMax, pMin, pMax, cm, temp, territorial, shoalMin, level, diet, coralSafe, invertSafe, minTankCm, notes] = r;
  return {
    commonName,
    scientificName,
    water,
    tempMinC: tMin,
    tempMaxC: tMax,
    phMin: pMin,
    phMax: pMax,
    adultLengthMm: Math.round(cm * 10),
    temperament: TEMPERAMENT[temp],
    territorial,
    shoalMin,
    level: LEVEL[level],
    diet: DIET[diet],
    coralSafe: water === "salt" ? coralSafe : null,
    invertSafe: water === "salt" ? invertSafe : null,
    minTankLengthMm: minTankCm == null ? null : minTankCm * 10,
    notes,
    source,
  };
}
