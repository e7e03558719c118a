/**
 * The test kits a company uses, as it describes them: a name of its own choosing, the compound the
 * kit tests, the basis its readings are printed on, and the steps offered as quick picks.
 *
 * Readings are stored on one basis whatever the kit: ammonia as total ammonia (NH3 + NH4+, the
 * figure most kits print), nitrite as NO2-, nitrate as NO3-. A kit printed "as N" (nitrogen only) is
 * converted on the way in.
 */
import type { Analyte } from "./readings";

/** How a kit prints its result: as the compound itself, or as the nitrogen in it ("as N"). */
export type KitBasis = "compound" | "nitrogen";

export interface TestKit {
  name: string;
  analyte: Analyte;
  basis: KitBasis;
  /** The kit's own steps, in its own basis, ascending from 0. */
  steps: readonly number[];
}

export const ANALYTES: readonly Analyte[] = ["ammonia", "nitrite", "nitrate"];

export const ANALYTE_NAMES: Record<Analyte, string> = { ammonia: "Ammonia", nitrite: "Nitrite", nitrate: "Nitrate" };

/**
 * Our neutral quick-pick steps, evenly spaced round values that copy no kit's colour card. They are
 * what a project is offered until the company describes its own kits.
 */
export const NEUTRAL_KIT_STEPS: Readonly<Record<Analyte, readonly number[]>> = Object.freeze({
  ammonia: [0, 0.5, 1, 1.5, 2, 2.5, 3, 3.5, 4],
  nitrite: [0, 0.5, 1, 1.5, 2, 2.5, 3],
  nitrate: [0, 10, 20, 30, 40, 50, 60, 70, 80],
});

/** The kit each analyte falls back to when the company has described none. */
export const NEUTRAL_TEST_KITS: Readonly<Record<Analyte, TestKit>> = Object.freeze({
  ammonia: { name: "Tankwright steps", analyte: "ammonia", basis: "compound", steps: NEUTRAL_KIT_STEPS.ammonia },
  nitrite: { name: "Tankwright steps", analyte: "nitrite", basis: "compound", steps: NEUTRAL_KIT_STEPS.nitrite },
  nitrate: { name: "Tankwright steps", analyte: "nitrate", basis: "compound", steps: NEUTRAL_KIT_STEPS.nitrate },
});

/**
 * mg of the compound per mg of its nitrogen: molar mass of the compound / 14.007 (IUPAC standard
 * atomic weights: N 14.007, H 1.008, O 15.999). Ammonia uses NH3 (17.031), nitrite NO2- (46.005),
 * nitrate NO3- (62.004).
 */
export const COMPOUND_PER_N: Readonly<Record<Analyte, number>> = Object.freeze({
  ammonia: 17.031 / 14.007,
  nitrite: 46.005 / 14.007,
  nitrate: 62.004 / 14.007,
});

/** The unit a kit's steps are read in, in words. */
export function basisUnit(analyte: Analyte, basis: KitBasis): string {
  if (basis === "nitrogen") return analyte === "ammonia" ? "mg/L as N (NH3-N + NH4-N)" : analyte === "nitrite" ? "mg/L as N (NO2-N)" : "mg/L as N (NO3-N)";
  return analyte === "ammonia" ? "mg/L total ammonia (NH3 + NH4+)" : analyte === "nitrite" ? "mg/L nitrite (NO2-)" : "mg/L nitrate (NO3-)";
}

/** A value read on a kit, converted to the basis readings are stored on (rounded to 0.001 mg/L). */
export function toStoredMgL(value: number, analyte: Analyte, basis: KitBasis): number {
  const v = basis === "nitrogen" ? value * COMPOUND_PER_N[analyte] : value;
  return Math.round(v * 1000) / 1000;
}

/** Limits on a kit's description, so the picks stay a row of buttons and the steps stay believable. */
export const KIT_LIMITS = { nameMax: 60, stepsMin: 2, stepsMax: 12, stepMaxMgL: 500 } as const;

/** One thing wrong with a kit's description, addressed to its field. */
export interface KitProblem {
  field: "name" | "steps";
  message: string;
}

/** Checks a kit as the lead typed it. Steps must start at 0 and rise, with no repeats. */
export function validateKit(kit: { name: string; steps: readonly number[] }): KitProblem[] {
  const problems: KitProblem[] = [];
  const name = kit.name.trim();
  if (!name) problems.push({ field: "name", message: "Give the kit a name your team will recognise." });
  else if (name.length > KIT_LIMITS.nameMax) problems.push({ field: "name", message: `Keep the name under ${KIT_LIMITS.nameMax} characters.` });
  const s = kit.steps;
  if (s.length < KIT_LIMITS.stepsMin || s.length > KIT_LIMITS.stepsMax) {
    problems.push({ field: "steps", message: `List between ${KIT_LIMITS.stepsMin} and ${KIT_LIMITS.stepsMax} steps, separated by commas.` });
  } else if (s.some((v) => !Number.isFinite(v) || v < 0 || v > KIT_LIMITS.stepMaxMgL)) {
    problems.push({ field: "steps", message: `Each step must be a number from 0 to ${KIT_LIMITS.stepMaxMgL}.` });
  } else if (s[0] !== 0) {
    problems.push({ field: "steps", message: "Start the steps at 0, the kit's lowest reading." });
  } else if (s.slice(1).some((v, i) => v <= s[i])) {
    problems.push({ field: "steps", message: "List the steps from lowest to highest, each once." });
  }
  return problems;
}

/** Reads "0, 0.5, 1" (commas or spaces; a decimal comma is not allowed here) into numbers; NaN marks a bad entry. */
export function parseSteps(text: string): number[] {
  return text
    // Stryker disable next-line Regex: splitting on single separators leaves empty strings, which the filter below drops all the same
    .split(/[\s,;]+/)
    .filter(Boolean)
    .map((t) => (/^\d+(\.\d+)?$/.test(t) ? Number(t) : Number.NaN));
}
