/**
 * A species as the stocking checks read it, in stored SI units (°C, mm). The catalogue's rows map
 * onto this one to one; the checks never see anything else about a fish.
 */
export const WATER_KINDS = ["fresh", "brackish", "salt"] as const;
export type WaterKind = (typeof WATER_KINDS)[number];

export const TEMPERAMENTS = ["peaceful", "semi-aggressive", "aggressive"] as const;
export type Temperament = (typeof TEMPERAMENTS)[number];

export const SWIM_LEVELS = ["top", "middle", "bottom", "all"] as const;
export type SwimLevel = (typeof SWIM_LEVELS)[number];

export const DIETS = ["herbivore", "omnivore", "carnivore", "planktivore"] as const;
export type Diet = (typeof DIETS)[number];

export type Range = { min: number; max: number };

export type Species = {
  id: string;
  commonName: string;
  scientificName: string;
  water: WaterKind;
  tempC: Range;
  pH: Range;
  adultLengthMm: number;
  temperament: Temperament;
  /** Holds and defends a patch of the tank (a rock, a cave, a stretch of glass). */
  territorial: boolean;
  /** 1 for fish kept alone or in pairs; the smallest comfortable group otherwise. */
  shoalMin: number;
  level: SwimLevel;
  /** Salt water only; null where it doesn't apply. */
  coralSafe: boolean | null;
  invertSafe: boolean | null;
  diet: Diet;
  /** The species' own floor on tank length, mm, when it needs more than the general rule gives. */
  minTankLengthMm: number | null;
};

export const WATER_LABELS: Record<WaterKind, string> = { fresh: "fresh water", brackish: "brackish water", salt: "salt water" };

/**
 * The tank's water kind from its design. The design records fresh or salt with a salinity; below
 * 25 psu we treat salt water as brackish (common practice: brackish set-ups run at roughly a third
 * to two thirds of sea strength, sea water being about 35 psu).
 */
export const BRACKISH_BELOW_PSU = 25;

export function tankWaterKind(water: "fresh" | "salt", salinityPsu?: number | null): WaterKind {
  if (water === "fresh") return "fresh";
  return salinityPsu != null && salinityPsu < BRACKISH_BELOW_PSU ? "brackish" : "salt";
}
