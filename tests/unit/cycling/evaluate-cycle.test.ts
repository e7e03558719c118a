import { describe, expect, it } from "vitest";
import { DEFAULT_CYCLE_RULES } from "@/lib/cycling/cycle-rules";
import { evaluateCycle, PHASE_LABELS, type CyclePhase } from "@/lib/cycling/evaluate-cycle";
import { at, dose, reading, wholeCycle, zero } from "./cycle-fixtures";

// A cycle whose ammonia and nitrite were seen, ending before the zeros each test adds.
function startedCycle() {
  return [
    reading(at(0), { ammoniaMgL: 2, nitriteMgL: 0, nitrateMgL: 0 }),
    reading(at(10), { ammoniaMgL: 0, nitriteMgL: 2, nitrateMgL: 10 }),
  ];
}

describe("evaluateCycle: a whole cycle, day by day", () => {
  const readings = wholeCycle();

  it("moves through the phases in order and is ready only on the last day", () => {
    const phases: CyclePhase[] = [];
    readings.forEach((_, day) => {
      const result = evaluateCycle(readings.slice(0, day + 1), { now: at(day, 1) });
      phases.push(result.phase);
      expect(result.ready).toBe(day === 34);
      expect(result.reasons.length === 0).toBe(result.ready);
      expect(result.daysSinceStart).toBe(day);
    });
    // Day 0 is the tap-water check; ammonia shows from day 1 until day 13.
    expect(phases[0]).toBe("not-started");
    expect(phases.slice(1, 14).every((p) => p === "ammonia-falling")).toBe(true);
    expect(phases.slice(14, 34).every((p) => p === "nitrite-falling")).toBe(true);
    expect(phases[34]).toBe("cycled");
  });

  it("on day 33 (one zero so far) says a second zero is needed", () => {
    const result = evaluateCycle(readings.slice(0, 34), { now: at(33, 1) });
    expect(result.reasons).toEqual(["Two zero readings a day apart are needed; there is only one so far."]);
  });

  it("reports the pair it used once ready", () => {
    const result = evaluateCycle(readings, { now: at(34, 1) });
    expect(result.lastZeroPair?.earlier).toBe(readings[33]);
    expect(result.lastZeroPair?.later).toBe(readings[34]);
    expect(result.lastZeroPair?.hoursApart).toBe(24);
    expect(result.latest).toBe(readings[34]);
    expect(result.rules).toEqual(DEFAULT_CYCLE_RULES);
  });

  it("labels every phase in plain words", () => {
    expect(PHASE_LABELS["ammonia-falling"]).toBe("ammonia falling, nitrite rising");
    expect(PHASE_LABELS["nitrite-falling"]).toBe("nitrite falling");
  });
});

describe("evaluateCycle: not ready yet", () => {
  it("with no readings at all", () => {
    const result = evaluateCycle([], { now: at(0) });
    expect(result).toMatchObject({ ready: false, phase: "not-started", daysSinceStart: null });
    expect(result.reasons).toEqual(["No water tests have been recorded yet."]);
  });

  it("with tap-water zeros and no ammonia ever seen, even when nitrate isn't required", () => {
    const result = evaluateCycle([zero(at(0), 5), zero(at(1), 5)], {
      now: at(1, 1),
      rules: { requireNitrate: false },
    });
    expect(result.ready).toBe(false);
    expect(result.phase).toBe("not-started");
    expect(result.reasons).toEqual(["No ammonia or nitrite has shown up yet: the cycle hasn't started."]);
  });

  it("with a single zero reading", () => {
    const result = evaluateCycle([...startedCycle(), zero(at(20))], { now: at(20, 1) });
    expect(result.ready).toBe(false);
    expect(result.reasons).toEqual(["Two zero readings a day apart are needed; there is only one so far."]);
    expect(result.lastZeroPair).toBeUndefined();
  });

  it("when the zeros are only 6 hours apart", () => {
    const result = evaluateCycle([...startedCycle(), zero(at(20)), zero(at(20, 6))], { now: at(20, 7) });
    expect(result.ready).toBe(false);
    expect(result.reasons).toEqual([
      "Two zero readings a day apart are needed; the last one was 6 hours after the first.",
    ]);
    expect(result.lastZeroPair?.hoursApart).toBe(6);
  });

  it("when the newest test shows ammonia or nitrite", () => {
    const result = evaluateCycle(
      [...startedCycle(), zero(at(20)), zero(at(21)), reading(at(22), { ammoniaMgL: 0.5, nitriteMgL: 1 })],
      { now: at(22, 1) },
    );
    expect(result.ready).toBe(false);
    expect(result.phase).toBe("ammonia-falling");
    expect(result.reasons).toEqual([
      "Ammonia and nitrite must both read zero; the latest test shows ammonia at 0.5 mg/L and nitrite at 1 mg/L.",
    ]);
  });

  it("when the latest test is older than 48 hours", () => {
    const readings = [...startedCycle(), zero(at(20)), zero(at(21))];
    const stale = evaluateCycle(readings, { now: at(24) });
    expect(stale.ready).toBe(false);
    expect(stale.reasons).toEqual(["The latest ammonia and nitrite test is 3 days old; take a new one."]);
    // Exactly 48 hours is still fresh; a minute more is not.
    expect(evaluateCycle(readings, { now: at(23) }).ready).toBe(true);
    expect(evaluateCycle(readings, { now: at(23, 1 / 60) }).ready).toBe(false);
  });

  it("when no time is given, since freshness can't be judged", () => {
    const result = evaluateCycle([...startedCycle(), zero(at(20)), zero(at(21))]);
    expect(result.ready).toBe(false);
    expect(result.reasons).toEqual([
      "The current time wasn't given, so the age of the latest test can't be checked.",
    ]);
  });

  it("when no nitrate has been seen", () => {
    const readings = [
      reading(at(0), { ammoniaMgL: 2, nitriteMgL: 0, nitrateMgL: 0 }),
      zero(at(20), 0),
      zero(at(21), 0),
    ];
    const result = evaluateCycle(readings, { now: at(21, 1) });
    expect(result.ready).toBe(false);
    expect(result.reasons).toEqual(["No nitrate has been seen yet: nitrification isn't proven."]);
    expect(evaluateCycle(readings, { now: at(21, 1), rules: { requireNitrate: false } }).ready).toBe(true);
  });

  it("lists every unmet rule at once", () => {
    const result = evaluateCycle([reading(at(0), { ammoniaMgL: 1, nitriteMgL: 0 }), zero(at(1), 0)], {
      now: at(5),
    });
    expect(result.reasons).toEqual([
      "Two zero readings a day apart are needed; there is only one so far.",
      "The latest ammonia and nitrite test is 4 days old; take a new one.",
      "No nitrate has been seen yet: nitrification isn't proven.",
    ]);
  });
});

describe("evaluateCycle: fishless doses", () => {
  // Staff test at 08:00, then dose at 09:00; the next morning's test is 23 h after the dose.
  const base = () => [...startedCycle(), zero(at(20)), zero(at(21))];

  it("is ready when the last dose cleared within 24 hours", () => {
    const readings = [...base(), zero(at(22))];
    const result = evaluateCycle(readings, { now: at(22, 1), doses: [dose(at(21, 1))] });
    expect(result.reasons).toEqual([]);
    expect(result.ready).toBe(true);
  });

  it("is not ready when nothing was tested after the dose", () => {
    const result = evaluateCycle(base(), { now: at(22, 2), doses: [dose(at(21, 1))] });
    expect(result.ready).toBe(false);
    expect(result.reasons).toEqual(["Ammonia was dosed 25 hours ago and wasn't tested within 24 hours of it."]);
  });

  it("is not ready when the dose still showed after 24 hours", () => {
    const readings = [...base(), reading(at(22), { ammoniaMgL: 0.25, nitriteMgL: 0 }), zero(at(23))];
    const result = evaluateCycle(readings, { now: at(23, 1), doses: [dose(at(21, 1))] });
    expect(result.ready).toBe(false);
    expect(result.reasons).toContain("Ammonia was dosed 2 days ago and didn't read zero within 24 hours.");
  });

  it("waits while the dose is still inside its 24 hours", () => {
    const result = evaluateCycle(base(), { now: at(21, 2), doses: [dose(at(21, 1))] });
    expect(result.ready).toBe(false);
    expect(result.reasons).toEqual([
      "Ammonia was dosed an hour ago; ammonia and nitrite need to read zero within 24 hours of the dose.",
    ]);
  });

  it("doesn't count a test logged at the very time of the dose", () => {
    const result = evaluateCycle(base(), { now: at(21, 2), doses: [dose(at(21))] });
    expect(result.ready).toBe(false);
    expect(result.reasons[0]).toMatch(/^Ammonia was dosed 2 hours ago/);
  });

  it("judges only the last dose, and ignores voided ones", () => {
    const readings = [...base(), zero(at(22))];
    const doses = [dose(at(5, 1)), dose(at(21, 1)), dose(at(22, 1), 2, true)];
    expect(evaluateCycle(readings, { now: at(22, 2), doses }).ready).toBe(true);
  });

  it("counts a dose as the start of a cycle that never showed ammonia (seeded media)", () => {
    const readings = [zero(at(0), 5), zero(at(1), 10)];
    const result = evaluateCycle(readings, { now: at(1, 1), doses: [dose(at(0, 1))] });
    expect(result.ready).toBe(true);
  });
});

describe("evaluateCycle: voided readings, order and custom rules", () => {
  it("doesn't count a voided zero", () => {
    const readings = [...startedCycle(), zero(at(20)), zero(at(21), 20, { voided: true })];
    const result = evaluateCycle(readings, { now: at(21, 1) });
    expect(result.ready).toBe(false);
    expect(result.reasons[0]).toMatch(/only one so far/);
  });

  it("doesn't let a voided non-zero reading break the zeros around it", () => {
    const readings = [
      ...startedCycle(),
      zero(at(20)),
      reading(at(20, 12), { ammoniaMgL: 1, nitriteMgL: 1, voided: true }),
      zero(at(21)),
    ];
    expect(evaluateCycle(readings, { now: at(21, 1) }).ready).toBe(true);
  });

  it("ignores readings that tested neither ammonia nor nitrite", () => {
    const readings = [...startedCycle(), zero(at(20)), reading(at(20, 12), { nitrateMgL: 20 }), zero(at(21))];
    expect(evaluateCycle(readings, { now: at(21, 1) }).ready).toBe(true);
  });

  it("gives the same answer for unsorted input", () => {
    const sorted = wholeCycle();
    const shuffled = [...sorted].reverse();
    [shuffled[3], shuffled[20]] = [shuffled[20], shuffled[3]];
    expect(evaluateCycle(shuffled, { now: at(34, 1) })).toEqual(evaluateCycle(sorted, { now: at(34, 1) }));
    expect(evaluateCycle(shuffled, { now: at(34, 1) }).ready).toBe(true);
  });

  it("never counts a reading dated in the future as the latest", () => {
    // A typo nine hours ahead of now: the reading at day 30 is still the latest, and it is 25 hours old.
    const readings = [reading(at(5), { ammoniaMgL: 2 }), zero(at(29)), zero(at(30)), reading(at(31, 10), { ammoniaMgL: 4, nitriteMgL: 1 })];
    const result = evaluateCycle(readings, { now: at(31, 1) });
    expect(result.latest?.takenAt).toEqual(at(30));
    expect(result.ready).toBe(true);
    // Inside the five-minute clock-drift allowance a reading still counts.
    const drift = [...readings.slice(0, 3), zero(at(31, 1 + 4 / 60))];
    expect(evaluateCycle(drift, { now: at(31, 1) }).latest?.takenAt).toEqual(at(31, 1 + 4 / 60));
  });

  it("ignores readings and doses from before cycleStartedAt", () => {
    // A tank restarted on day 39: the earlier cycle's ammonia, nitrate and dose no longer count.
    const readings = [reading(at(0), { ammoniaMgL: 4, nitriteMgL: 2, nitrateMgL: 40 }), zero(at(40), 0), zero(at(41), 0)];
    const result = evaluateCycle(readings, { now: at(41, 1), cycleStartedAt: at(39), doses: [dose(at(0, 1))] });
    expect(result.phase).toBe("not-started");
    expect(result.daysSinceStart).toBe(2);
  });

  it("applies custom rules: three zeros 12 hours apart", () => {
    const rules = { zeroReadingsNeeded: 3, minHoursBetweenZeros: 12 };
    const two = [...startedCycle(), zero(at(20)), zero(at(20, 12))];
    const twoResult = evaluateCycle(two, { now: at(20, 13), rules });
    expect(twoResult.reasons).toEqual(["Three zero readings 12 hours apart are needed; there are only two so far."]);
    const crowded = [...two, zero(at(20, 18))];
    expect(evaluateCycle(crowded, { now: at(20, 19), rules }).reasons).toEqual([
      "Three zero readings 12 hours apart are needed; only two are far enough apart so far.",
    ]);
    const three = [...two, zero(at(21))];
    const threeResult = evaluateCycle(three, { now: at(21, 1), rules });
    expect(threeResult.ready).toBe(true);
    expect(threeResult.lastZeroPair?.hoursApart).toBe(24);
  });

  it("throws RangeError for unsafe rules", () => {
    expect(() => evaluateCycle([], { rules: { zeroReadingsNeeded: 0 } })).toThrow(RangeError);
  });

  it("throws RangeError for impossible values rather than skipping them", () => {
    expect(() => evaluateCycle([reading(at(0), { ammoniaMgL: -1 })])).toThrow(RangeError);
    expect(() => evaluateCycle([reading(new Date(Number.NaN), { ammoniaMgL: 1 })])).toThrow(RangeError);
  });
});

describe("evaluateCycle: stalls", () => {
  const flatNitrite = (days: number) =>
    Array.from({ length: days + 1 }, (_, d) => reading(at(d), { ammoniaMgL: 0, nitriteMgL: 5, nitrateMgL: 20 }));

  it("calls a cycle stalled when nitrite hasn't moved for ten days", () => {
    const result = evaluateCycle(flatNitrite(12), { now: at(12, 1) });
    expect(result.phase).toBe("stalled");
    expect(result.ready).toBe(false);
  });

  it("doesn't call it stalled with under ten days of history", () => {
    expect(evaluateCycle(flatNitrite(8), { now: at(8, 1) }).phase).toBe("nitrite-falling");
  });

  it("doesn't call it stalled when nitrite moved by a kit step within the window", () => {
    const readings = flatNitrite(12);
    readings[6] = reading(at(6), { ammoniaMgL: 0, nitriteMgL: 2, nitrateMgL: 20 });
    expect(evaluateCycle(readings, { now: at(12, 1) }).phase).toBe("nitrite-falling");
  });

  it("honours a custom stall length", () => {
    expect(evaluateCycle(flatNitrite(8), { now: at(8, 1), rules: { stallDays: 7 } }).phase).toBe("stalled");
  });
});
