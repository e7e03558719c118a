import { NEUTRAL_KIT_STEPS } from "./test-kits";

/**
 * Water tests and ammonia doses as staff enter them during a tank's cycle,
 * plus the plausibility checks run before a reading is saved.
 */

/**
 * One water test. Analyte values are mg/L as the kit reports them (ammonia
 * is total ammonia, NH3 + NH4+). `null` means "not tested".
 *
 * "Below detection" is stored as 0, with no separate flag: every rule here
 * only asks whether the kit read zero, and the lowest colour on a card and
 * "below detection" lead to the same decision. A flag would add a state that
 * nothing acts on and that staff would fill in inconsistently.
 */
export interface WaterTest {
  id: string;
  takenAt: Date;
  ammoniaMgL: number | null;
  nitriteMgL: number | null;
  nitrateMgL: number | null;
  pH: number | null;
  tempC: number | null;
  khDkh?: number | null;
  /** Salt water only: practical salinity in ppt (roughly g/kg). */
  salinityPpt?: number | null;
  /** Entered in error; kept for the record but ignored by every calculation. */
  voided?: boolean;
}

/** Ammonia added to a tank during a fishless cycle, raising it to `targetMgL` (total ammonia). */
export interface AmmoniaDose {
  id: string;
  dosedAt: Date;
  targetMgL: number;
  /** Logged in error; ignored by every calculation. */
  voided?: boolean;
}

/** The three nitrogen compounds tracked through a cycle. */
export type Analyte = "ammonia" | "nitrite" | "nitrate";

/**
 * Quick-pick steps (mg/L) offered when the company has described no kit of its own: our neutral,
 * evenly spaced defaults (NEUTRAL_KIT_STEPS in ./test-kits). Nothing snaps or rejects values that
 * fall between steps.
 */
export const kitSteps: Readonly<Record<Analyte, readonly number[]>> = NEUTRAL_KIT_STEPS;

/** A reading as entered, before it has an id. */
export type ReadingInput = Omit<WaterTest, "id" | "voided">;

/** One thing wrong with an entered reading, addressed to the form field that holds it. */
export interface FieldProblem {
  field: keyof ReadingInput;
  message: string;
}

/**
 * Limits beyond which a value is almost surely a typo or a unit mix-up
 * (e.g. µg/L, or ppm of nitrate-N read as nitrate). Chosen by us as
 * generous plausibility bounds, not from a published source.
 */
export const READING_LIMITS = {
  ammoniaMaxMgL: 50,
  nitriteMaxMgL: 50,
  nitrateMaxMgL: 500,
  pHMin: 0,
  pHMax: 14,
  tempMinC: 0,
  tempMaxC: 40,
  khMaxDkh: 30,
  /** Natural seawater is about 35 ppt (UNESCO practical salinity scale); 45 leaves room for a brackish-to-hypersaline mistake check, chosen by us. */
  salinityMaxPpt: 45,
  futureToleranceMinutes: 5,
} as const;

type AmountField = "ammoniaMgL" | "nitriteMgL" | "nitrateMgL" | "khDkh";

const AMOUNTS: readonly { field: AmountField; name: string; max: number; unit: string }[] = [
  { field: "ammoniaMgL", name: "Ammonia", max: READING_LIMITS.ammoniaMaxMgL, unit: "mg/L" },
  { field: "nitriteMgL", name: "Nitrite", max: READING_LIMITS.nitriteMaxMgL, unit: "mg/L" },
  { field: "nitrateMgL", name: "Nitrate", max: READING_LIMITS.nitrateMaxMgL, unit: "mg/L" },
  { field: "khDkh", name: "KH", max: READING_LIMITS.khMaxDkh, unit: "dKH" },
];

function isNumber(value: unknown): value is number {
  return Number.isFinite(value);
}

/**
 * Checks an entered reading for impossible or implausible values and for a
 * time in the future (more than 5 minutes past `now`, allowing for clock
 * drift between devices). Returns an empty list when the reading is fine.
 */
export function validateReading(input: ReadingInput, now: Date): FieldProblem[] {
  const problems: FieldProblem[] = [];
  const taken = input.takenAt instanceof Date ? input.takenAt.getTime() : Number.NaN;
  if (Number.isNaN(taken)) {
    problems.push({ field: "takenAt", message: "The test time isn't a valid date." });
  } else if (taken > now.getTime() + READING_LIMITS.futureToleranceMinutes * 60_000) {
    problems.push({ field: "takenAt", message: "The test time is in the future; check the date and time." });
  }

  for (const { field, name, max, unit } of AMOUNTS) {
    const value = input[field];
    if (value == null) continue;
    if (!isNumber(value)) {
      problems.push({ field, message: `${name} must be a number.` });
    } else if (value < 0) {
      problems.push({ field, message: `${name} can't be below zero.` });
    } else if (value > max) {
      problems.push({
        field,
        message: `${name} above ${max} ${unit} isn't a believable test result; check the units and the decimal point.`,
      });
    }
  }

  if (input.pH != null && (!isNumber(input.pH) || input.pH < READING_LIMITS.pHMin || input.pH > READING_LIMITS.pHMax)) {
    problems.push({ field: "pH", message: "pH must be a number between 0 and 14." });
  }
  if (
    input.tempC != null &&
    (!isNumber(input.tempC) || input.tempC < READING_LIMITS.tempMinC || input.tempC > READING_LIMITS.tempMaxC)
  ) {
    problems.push({ field: "tempC", message: "Temperature must be between 0 and 40 °C." });
  }
  if (
    input.salinityPpt != null &&
    (!isNumber(input.salinityPpt) || input.salinityPpt < 0 || input.salinityPpt > READING_LIMITS.salinityMaxPpt)
  ) {
    problems.push({ field: "salinityPpt", message: `Salinity must be between 0 and ${READING_LIMITS.salinityMaxPpt} ppt (sea water is about 35).` });
  }
  return problems;
}
