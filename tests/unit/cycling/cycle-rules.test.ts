import { describe, expect, it } from "vitest";
import { DEFAULT_CYCLE_RULES, resolveCycleRules, validateCycleRules } from "@/lib/cycling/cycle-rules";

describe("validateCycleRules", () => {
  it("accepts the defaults and an empty override", () => {
    expect(validateCycleRules(DEFAULT_CYCLE_RULES)).toEqual([]);
    expect(validateCycleRules({})).toEqual([]);
  });

  it("flags values that would switch a rule off or make no sense", () => {
    const problems = validateCycleRules({
      zeroReadingsNeeded: 0,
      minHoursBetweenZeros: -1,
      maxAgeHoursOfLatest: 0,
      clearWithinHoursOfDose: 1000,
      stallDays: 2.5,
      stallChangeMgL: 0,
      requireNitrate: "yes",
    });
    expect(problems.map((p) => p.field)).toEqual([
      "zeroReadingsNeeded",
      "minHoursBetweenZeros",
      "maxAgeHoursOfLatest",
      "clearWithinHoursOfDose",
      "stallDays",
      "stallChangeMgL",
      "requireNitrate",
    ]);
    expect(problems[0].message).toBe("Zero readings needed must be a whole number from 1 to 7.");
  });

  it("rejects values of the wrong type from parsed JSON", () => {
    expect(validateCycleRules({ stallDays: "10" }).map((p) => p.field)).toEqual(["stallDays"]);
  });
});

describe("resolveCycleRules", () => {
  it("overlays overrides on the defaults, keeping defaults for undefined", () => {
    expect(resolveCycleRules({ stallDays: 14, requireNitrate: undefined })).toEqual({
      ...DEFAULT_CYCLE_RULES,
      stallDays: 14,
    });
  });

  it("throws RangeError naming the problem", () => {
    expect(() => resolveCycleRules({ zeroReadingsNeeded: 0 })).toThrow(/Zero readings needed/);
  });

  it("keeps the defaults frozen", () => {
    expect(Object.isFrozen(DEFAULT_CYCLE_RULES)).toBe(true);
  });
});

describe("the house defaults, value by value", () => {
  it("two zeros 24 h apart, the latest at most 48 h old, nitrate seen, a dose cleared in 24 h, a stall after 10 days without a 0.25 mg/L change", () => {
    // Common practice for fishless cycling (our reading of it); 0.25 mg/L is the smallest non-zero
    // step on typical kits (common practice, from memory). See lib/cycling/cycle-rules.ts.
    expect({ ...DEFAULT_CYCLE_RULES }).toEqual({
      zeroReadingsNeeded: 2,
      minHoursBetweenZeros: 24,
      maxAgeHoursOfLatest: 48,
      requireNitrate: true,
      clearWithinHoursOfDose: 24,
      stallDays: 10,
      stallChangeMgL: 0.25,
    });
  });
});

describe("validateCycleRules: numbers only, finite, within bounds", () => {
  it("a number written as text is refused even where the rule allows fractions", () => {
    expect(validateCycleRules({ stallChangeMgL: "0.5" })).toEqual([{ field: "stallChangeMgL", message: "Smallest change that counts as progress (mg/L) must be a number from 0.01 to 5." }]);
  });
  it("NaN and infinity are refused", () => {
    expect(validateCycleRules({ stallChangeMgL: Number.NaN, maxAgeHoursOfLatest: Number.POSITIVE_INFINITY }).map((p) => p.field)).toEqual(["maxAgeHoursOfLatest", "stallChangeMgL"]);
  });
});
