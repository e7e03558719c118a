/**
 * The rules a tank must pass before fish go in. A company can tighten or
 * loosen them, so they live as data with their own sanity checks.
 */

/** Rules for calling a tank cycled. All times are in hours unless the name says days. */
export interface CycleRules {
  /** Zero ammonia-and-nitrite readings needed in a row, ending with the newest. */
  zeroReadingsNeeded: number;
  /** Minimum spacing between the zero readings that count towards `zeroReadingsNeeded`. */
  minHoursBetweenZeros: number;
  /** The newest ammonia-and-nitrite test may be at most this old. */
  maxAgeHoursOfLatest: number;
  /** Nitrate above zero must have been seen since the cycle began: proof nitrification happened. */
  requireNitrate: boolean;
  /** After the last logged ammonia dose, both must read zero within this many hours. */
  clearWithinHoursOfDose: number;
  /** Days without a meaningful change in ammonia and nitrite before a cycle counts as stalled. */
  stallDays: number;
  /** Smallest change in ammonia or nitrite (mg/L) that counts as progress. */
  stallChangeMgL: number;
}

/**
 * House defaults. Two zeros a day apart, 48 h freshness and a 24 h dose
 * clearance are our reading of common practice for fishless cycling; ten
 * days without change as a stall is common practice; 0.25 mg/L is the
 * smallest non-zero step on typical kits (common practice, from memory).
 */
export const DEFAULT_CYCLE_RULES: Readonly<CycleRules> = Object.freeze({
  zeroReadingsNeeded: 2,
  minHoursBetweenZeros: 24,
  maxAgeHoursOfLatest: 48,
  requireNitrate: true,
  clearWithinHoursOfDose: 24,
  stallDays: 10,
  stallChangeMgL: 0.25,
});

/** One unacceptable rule value, addressed to the setting that holds it. */
export interface RuleProblem {
  field: keyof CycleRules;
  message: string;
}

type NumericRule = Exclude<keyof CycleRules, "requireNitrate">;

// Bounds keep a company from switching a safety rule off by accident
// (e.g. 0 zero readings) while leaving room for stricter house rules.
const NUMERIC_BOUNDS: Readonly<Record<NumericRule, { min: number; max: number; integer: boolean; label: string }>> = {
  zeroReadingsNeeded: { min: 1, max: 7, integer: true, label: "Zero readings needed" },
  minHoursBetweenZeros: { min: 0, max: 168, integer: false, label: "Hours between zero readings" },
  maxAgeHoursOfLatest: { min: 1, max: 336, integer: false, label: "Maximum age of the latest test (hours)" },
  clearWithinHoursOfDose: { min: 1, max: 168, integer: false, label: "Hours for a dose to clear" },
  stallDays: { min: 2, max: 60, integer: true, label: "Days without change before a stall" },
  stallChangeMgL: { min: 0.01, max: 5, integer: false, label: "Smallest change that counts as progress (mg/L)" },
};

/**
 * Checks a partial set of rules (e.g. a company's saved overrides, possibly
 * parsed from JSON). Unset or undefined fields are fine: defaults fill them.
 * Unknown keys are ignored. Returns an empty list when all values are sane.
 */
export function validateCycleRules(partial: Partial<Record<keyof CycleRules, unknown>>): RuleProblem[] {
  const problems: RuleProblem[] = [];
  for (const field of Object.keys(NUMERIC_BOUNDS) as NumericRule[]) {
    const value = partial[field];
    if (value === undefined) continue;
    const { min, max, integer, label } = NUMERIC_BOUNDS[field];
    const ok =
      // NaN fails both comparisons and an infinity fails one, so the bounds also keep out non-finite numbers.
      typeof value === "number" && value >= min && value <= max &&
      (!integer || Number.isInteger(value));
    if (!ok) {
      problems.push({ field, message: `${label} must be ${integer ? "a whole number" : "a number"} from ${min} to ${max}.` });
    }
  }
  if (partial.requireNitrate !== undefined && typeof partial.requireNitrate !== "boolean") {
    problems.push({ field: "requireNitrate", message: "Require nitrate must be yes or no." });
  }
  return problems;
}

/**
 * Defaults overlaid with the given overrides; undefined overrides keep the
 * default. Throws RangeError listing every problem if any value is unsafe.
 */
export function resolveCycleRules(partial: Partial<CycleRules> = {}): CycleRules {
  const problems = validateCycleRules(partial);
  if (problems.length > 0) {
    throw new RangeError(`Invalid cycle rules: ${problems.map((p) => p.message).join(" ")}`);
  }
  const rules: CycleRules = { ...DEFAULT_CYCLE_RULES };
  for (const key of Object.keys(DEFAULT_CYCLE_RULES) as (keyof CycleRules)[]) {
    const value = partial[key];
    if (value !== undefined) (rules as unknown as Record<string, unknown>)[key] = value;
  }
  return rules;
}
