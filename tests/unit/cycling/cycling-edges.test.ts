// Boundaries of the cycling module's smaller rules: rule bounds, reading checks, warnings, wording, trends.
import { describe, expect, it } from "vitest";
import { DEFAULT_CYCLE_RULES, resolveCycleRules, validateCycleRules } from "@/lib/cycling/cycle-rules";
import { ammoniaPKa } from "@/lib/cycling/free-ammonia";
import { validateReading, type ReadingInput } from "@/lib/cycling/readings";
import { describeCycleForClient, describeTrend } from "@/lib/cycling/summary";
import { readingWarnings, stallWarning, WARNING_THRESHOLDS } from "@/lib/cycling/warnings";
import { capitalise, countWord, formatAgo, formatDuration, formatRuleHours, formatRuleSpan } from "@/lib/cycling/wording";
import { at, reading } from "./cycle-fixtures";

describe("validateCycleRules: bounds are inclusive and each message names its setting", () => {
  const cases: [field: string, min: number, max: number, message: string][] = [
    ["zeroReadingsNeeded", 1, 7, "Zero readings needed must be a whole number from 1 to 7."],
    ["minHoursBetweenZeros", 0, 168, "Hours between zero readings must be a number from 0 to 168."],
    ["maxAgeHoursOfLatest", 1, 336, "Maximum age of the latest test (hours) must be a number from 1 to 336."],
    ["clearWithinHoursOfDose", 1, 168, "Hours for a dose to clear must be a number from 1 to 168."],
    ["stallDays", 2, 60, "Days without change before a stall must be a whole number from 2 to 60."],
    ["stallChangeMgL", 0.01, 5, "Smallest change that counts as progress (mg/L) must be a number from 0.01 to 5."],
  ];
  it.each(cases)("%s accepts %s and %s, refuses just outside, NaN and infinity", (field, min, max, message) => {
    expect(validateCycleRules({ [field]: min })).toEqual([]);
    expect(validateCycleRules({ [field]: max })).toEqual([]);
    const below = min === 0 ? -0.001 : min - (Number.isInteger(min) ? 1 : 0.001);
    expect(validateCycleRules({ [field]: below })).toEqual([{ field, message }]);
    expect(validateCycleRules({ [field]: max + 0.001 })).toHaveLength(1);
    expect(validateCycleRules({ [field]: Number.NaN })).toHaveLength(1);
    expect(validateCycleRules({ [field]: Infinity })).toHaveLength(1);
  });

  it("requireNitrate must be true or false", () => {
    expect(validateCycleRules({ requireNitrate: false })).toEqual([]);
    expect(validateCycleRules({ requireNitrate: 1 })).toEqual([
      { field: "requireNitrate", message: "Require nitrate must be yes or no." },
    ]);
  });

  it("resolveCycleRules lists every problem in one RangeError", () => {
    expect(() => resolveCycleRules({ zeroReadingsNeeded: 0, stallDays: 1 })).toThrow(
      new RangeError(
        "Invalid cycle rules: Zero readings needed must be a whole number from 1 to 7. Days without change before a stall must be a whole number from 2 to 60.",
      ),
    );
    expect(resolveCycleRules({ requireNitrate: false }).requireNitrate).toBe(false);
    expect(resolveCycleRules()).toEqual(DEFAULT_CYCLE_RULES);
  });
});

describe("validateReading: edges", () => {
  const now = new Date("2025-03-10T12:00:00Z");
  const input = (values: Partial<ReadingInput>): ReadingInput => ({
    takenAt: new Date("2025-03-10T11:00:00Z"),
    ammoniaMgL: null,
    nitriteMgL: null,
    nitrateMgL: null,
    pH: null,
    tempC: null,
    ...values,
  });

  it("accepts the ends of the pH and temperature ranges", () => {
    expect(validateReading(input({ pH: 0, tempC: 0 }), now)).toEqual([]);
    expect(validateReading(input({ pH: 14, tempC: 40 }), now)).toEqual([]);
  });

  it("says what is wrong with pH, temperature and a non-number", () => {
    expect(validateReading(input({ pH: 15, tempC: 45, ammoniaMgL: Infinity }), now)).toEqual([
      { field: "ammoniaMgL", message: "Ammonia must be a number." },
      { field: "pH", message: "pH must be a number between 0 and 14." },
      { field: "tempC", message: "Temperature must be between 0 and 40 °C." },
    ]);
    expect(validateReading(input({ tempC: Number.NaN }), now)).toEqual([
      { field: "tempC", message: "Temperature must be between 0 and 40 °C." },
    ]);
    expect(validateReading(input({ khDkh: 31 }), now)[0].message).toBe(
      "KH above 30 dKH isn't a believable test result; check the units and the decimal point.",
    );
  });

  it("allows exactly five minutes ahead and refuses a millisecond more; a time that isn't a Date is invalid", () => {
    expect(validateReading(input({ takenAt: new Date(now.getTime() + 300_000) }), now)).toEqual([]);
    expect(validateReading(input({ takenAt: new Date(now.getTime() + 300_001) }), now)).toHaveLength(1);
    const notADate = input({ takenAt: "2025-03-10T11:00:00Z" as unknown as Date });
    expect(validateReading(notADate, now)).toEqual([{ field: "takenAt", message: "The test time isn't a valid date." }]);
  });
});

describe("readingWarnings: edges", () => {
  const base = { ammoniaMgL: 0, nitriteMgL: 0, pH: 7.6, tempC: 25, khDkh: 6 };
  const fish = { fishPresent: true };

  it("free ammonia exactly at the danger and caution thresholds takes that level", () => {
    // With pH = pKa half the total is free (Emerson et al. 1975), so total = 2 × threshold gives it exactly.
    const pKa25 = ammoniaPKa(25);
    const atDanger = readingWarnings({ ...base, ammoniaMgL: 2 * WARNING_THRESHOLDS.freeAmmoniaDangerMgL, pH: pKa25 }, fish);
    expect(atDanger.map((w) => w.level)).toEqual(["danger"]);
    expect(atDanger[0].message).toMatch(/^With fish in the water, free ammonia is about 0\.05 mg\/L NH3 at pH 9\.246\d+ and 25 °C: harmful to fish\./);
    const atCaution = readingWarnings({ ...base, ammoniaMgL: 2 * WARNING_THRESHOLDS.freeAmmoniaCautionMgL, pH: pKa25 }, fish);
    expect(atCaution.map((w) => w.level)).toEqual(["caution"]);
    expect(atCaution[0].message).toMatch(/enough to stress fish over days\. Retest tomorrow and add no more fish\.$/);
  });

  it("works out the toxic share only with pH and temperature both in range", () => {
    const unknown = (values: object) => readingWarnings({ ...base, ammoniaMgL: 1, ...values }, fish)[0]?.code;
    expect(unknown({ pH: null })).toBe("ammonia-share-unknown");
    expect(unknown({ pH: 15 })).toBe("ammonia-share-unknown");
    expect(unknown({ pH: -1 })).toBe("ammonia-share-unknown");
    expect(unknown({ tempC: 41 })).toBe("ammonia-share-unknown");
    expect(unknown({ tempC: -1 })).toBe("ammonia-share-unknown");
    expect(unknown({ pH: 8, tempC: 40 })).toBe("free-ammonia");
    expect(unknown({ pH: 14, tempC: 0 })).toBe("free-ammonia");
    expect(readingWarnings({ ...base, ammoniaMgL: 0, pH: null }, fish)).toEqual([]);
  });

  it("nitrite, pH and KH warnings read in full; negative pH or KH gives no warning", () => {
    expect(readingWarnings({ ...base, nitriteMgL: 1 }, fish)).toEqual([
      {
        level: "danger",
        code: "nitrite",
        message: "Nitrite is 1 mg/L with fish in the water: harmful to fish. A water change is the usual first step.",
      },
    ]);
    expect(readingWarnings({ ...base, pH: 6 }, { fishPresent: false })).toEqual([
      {
        level: "caution",
        code: "low-ph",
        message: "pH is 6: the bacteria slow down a lot below about 6.5, so the cycle may stall.",
      },
    ]);
    expect(readingWarnings({ ...base, pH: 0 }, { fishPresent: false })).toHaveLength(1);
    expect(readingWarnings({ ...base, pH: -1, khDkh: -1 }, { fishPresent: false })).toEqual([]);
    expect(readingWarnings({ ...base, khDkh: 0 }, { fishPresent: false })).toHaveLength(1);
  });

  it("the stall warning uses the window and step it is given", () => {
    const flat = Array.from({ length: 8 }, (_, d) => reading(at(d), { ammoniaMgL: 0, nitriteMgL: 2 }));
    expect(stallWarning(flat, at(7, 1))).toBeNull();
    expect(stallWarning(flat, at(7, 1), 7)?.message).toBe(
      "Ammonia and nitrite haven't changed in 7 days: the cycle may have stalled. Check pH, KH and temperature.",
    );
  });
});

describe("wording: edges", () => {
  it("durations at each unit's edge", () => {
    expect(formatDuration(0)).toBe("1 minute");
    expect(formatDuration(1 / 60)).toBe("1 minute");
    expect(formatDuration(2 / 60)).toBe("2 minutes");
    expect(formatDuration(59 / 60)).toBe("59 minutes");
    expect(formatDuration(59.6 / 60)).toBe("an hour");
    expect(formatDuration(1.6)).toBe("2 hours");
    expect(formatDuration(47.4)).toBe("47 hours");
    expect(formatDuration(71.9)).toBe("2 days");
  });

  it("ages, spans and limits", () => {
    expect(formatAgo(1 / 60)).toBe("1 minute ago");
    expect(formatAgo(0.9 / 60)).toBe("just now");
    expect(formatRuleSpan(1)).toBe("an hour");
    expect(formatRuleSpan(0)).toBe("0 hours");
    expect(formatRuleSpan(36)).toBe("36 hours");
    expect(formatRuleSpan(72)).toBe("3 days");
    expect(formatRuleHours(1)).toBe("1 hour");
    expect(formatRuleHours(24)).toBe("24 hours");
  });

  it("counts as words from zero to ten only, whole numbers only", () => {
    expect(countWord(0)).toBe("zero");
    expect(countWord(10)).toBe("ten");
    expect(countWord(11)).toBe("11");
    expect(countWord(-1)).toBe("-1");
    expect(countWord(2.5)).toBe("2.5");
    expect(capitalise("two zero readings")).toBe("Two zero readings");
    expect(capitalise("")).toBe("");
  });
});

describe("describeTrend and client text: edges", () => {
  const series = (values: number[]) => values.map((v, d) => reading(at(d), { nitriteMgL: v }));

  it("a change of exactly the smallest kit step counts as rising or falling", () => {
    expect(describeTrend(series([1, 1.25]), "nitrite")).toBe("rising");
    expect(describeTrend(series([1, 0.75]), "nitrite")).toBe("falling");
    expect(describeTrend(series([1, 1.125]), "nitrite")).toBe("steady");
    expect(describeTrend(series([1, 1.125]), "nitrite", { minChangeMgL: 0.125 })).toBe("rising");
  });

  it("looks back only the given number of days from the newest test, including its edge", () => {
    const readings = series([0, 2, 2, 2]);
    expect(describeTrend(readings, "nitrite", { days: 2 })).toBe("steady");
    expect(describeTrend(readings, "nitrite", { days: 3 })).toBe("rising");
    expect(describeTrend(readings, "nitrite")).toBe("rising");
  });

  it("two tests at the same moment are not a trend", () => {
    expect(describeTrend([reading(at(1), { nitriteMgL: 1 }), reading(at(1), { nitriteMgL: 2 })], "nitrite")).toBe("unknown");
  });

  it("with only voided tests, says no tests have been recorded", () => {
    const voided = [reading(at(0), { ammoniaMgL: 0, voided: true })];
    expect(describeCycleForClient({ phase: "not-started", rules: DEFAULT_CYCLE_RULES }, voided)).toBe(
      "No water tests have been recorded yet; progress will show here once testing starts.",
    );
  });

  it("first stage with nitrite present but no trend yet, and second stage with nitrite still present", () => {
    const one = [reading(at(0), { ammoniaMgL: 2, nitriteMgL: 0.5 })];
    expect(describeCycleForClient({ phase: "ammonia-falling", rules: DEFAULT_CYCLE_RULES }, one)).toBe(
      "Ammonia is present and nitrite is present: the first bacteria are still establishing. About two to four more weeks is common.",
    );
    const second = [reading(at(0), { ammoniaMgL: 0, nitriteMgL: 1 })];
    expect(describeCycleForClient({ phase: "nitrite-falling", rules: DEFAULT_CYCLE_RULES }, second)).toBe(
      "Ammonia has cleared and nitrite is still present: the second group of bacteria is catching up. About one to two more weeks is common.",
    );
    expect(describeCycleForClient({ phase: "nitrite-falling", rules: DEFAULT_CYCLE_RULES }, [])).toBe(
      "Ammonia and nitrite now read zero; we're confirming with further tests before any fish go in.",
    );
  });
});
