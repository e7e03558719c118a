// The edges of the cycle gate where a tank could be called ready for fish too early.
import { describe, expect, it } from "vitest";
import { DEFAULT_CYCLE_RULES } from "@/lib/cycling/cycle-rules";
import { evaluateCycle } from "@/lib/cycling/evaluate-cycle";
import { at, dose, HOUR, reading, zero } from "./cycle-fixtures";

// Ammonia and nitrite seen, nitrate proven: only the zeros each test adds are missing.
function startedCycle() {
  return [
    reading(at(0), { ammoniaMgL: 2, nitriteMgL: 0, nitrateMgL: 0 }),
    reading(at(10), { ammoniaMgL: 0, nitriteMgL: 2, nitrateMgL: 10 }),
  ];
}

const READY_PAIR = () => [...startedCycle(), zero(at(20)), zero(at(21))];

describe("evaluateCycle: what counts as a zero pair", () => {
  it("a test that read ammonia only (nitrite not tested) is not a zero reading", () => {
    const readings = [...startedCycle(), zero(at(20)), reading(at(21), { ammoniaMgL: 0, nitrateMgL: 20 })];
    const result = evaluateCycle(readings, { now: at(21, 1) });
    expect(result.ready).toBe(false);
    expect(result.reasons).toEqual(["Two zero readings a day apart are needed; there is only one so far."]);
    expect(result.lastZeroPair).toBeUndefined();
  });

  it("a test that read nitrite only (ammonia not tested) is not a zero reading", () => {
    const readings = [...startedCycle(), zero(at(20)), reading(at(21), { nitriteMgL: 0, nitrateMgL: 20 })];
    expect(evaluateCycle(readings, { now: at(21, 1) }).ready).toBe(false);
  });

  it("says both haven't been tested when no test read both, instead of quoting a reading", () => {
    const readings = [reading(at(0), { ammoniaMgL: 0 }), reading(at(1), { nitriteMgL: 0 })];
    const result = evaluateCycle(readings, { now: at(1, 1), doses: [dose(at(0, 1))] });
    expect(result.reasons[0]).toBe("Ammonia and nitrite haven't both been tested yet.");
  });

  it("quotes only the analyte that is above zero in the newest test", () => {
    const readings = [...startedCycle(), reading(at(20), { ammoniaMgL: 0, nitriteMgL: 0.5 })];
    expect(evaluateCycle(readings, { now: at(20, 1) }).reasons[0]).toBe(
      "Ammonia and nitrite must both read zero; the latest test shows nitrite at 0.5 mg/L.",
    );
    const ammoniaOnly = [...startedCycle(), reading(at(20), { ammoniaMgL: 0.25, nitriteMgL: null })];
    expect(evaluateCycle(ammoniaOnly, { now: at(20, 1) }).reasons[0]).toBe(
      "Ammonia and nitrite must both read zero; the latest test shows ammonia at 0.25 mg/L.",
    );
  });

  it("an ammonia-only zero between two zero pairs neither counts nor breaks the run", () => {
    const readings = [...startedCycle(), zero(at(20)), reading(at(20, 12), { ammoniaMgL: 0 }), zero(at(21))];
    const result = evaluateCycle(readings, { now: at(21, 1) });
    expect(result.ready).toBe(true);
    expect(result.lastZeroPair?.hoursApart).toBe(24);
  });

  it("zeros exactly the minimum spacing apart count; a minute less does not", () => {
    const exact = [...startedCycle(), zero(at(20)), zero(at(21))];
    expect(evaluateCycle(exact, { now: at(21, 1) }).ready).toBe(true);
    const short = [...startedCycle(), zero(at(20, 1 / 60)), zero(at(21))];
    expect(evaluateCycle(short, { now: at(21, 1) }).reasons).toEqual([
      "Two zero readings a day apart are needed; the last one was 24 hours after the first.",
    ]);
  });

  it("stops counting once enough zeros are found, so the pair reported is the newest that passed", () => {
    const readings = [...startedCycle(), zero(at(19)), zero(at(20)), zero(at(21))];
    const result = evaluateCycle(readings, { now: at(21, 1) });
    expect(result.lastZeroPair?.earlier).toBe(readings[3]);
    expect(result.lastZeroPair?.later).toBe(readings[4]);
  });
});

describe("evaluateCycle: freshness", () => {
  it("is judged from the newest test that read both ammonia and nitrite, not from a newer nitrate-only test", () => {
    // Zeros on days 20 and 21; only nitrate was tested on day 25, four days after the last ammonia/nitrite test.
    const readings = [...READY_PAIR(), reading(at(25), { nitrateMgL: 20 })];
    const result = evaluateCycle(readings, { now: at(25, 1) });
    expect(result.ready).toBe(false);
    expect(result.reasons).toEqual(["The latest ammonia and nitrite test is 4 days old; take a new one."]);
  });

  it("is not refreshed by a newer test that read ammonia only", () => {
    const readings = [...READY_PAIR(), reading(at(25), { ammoniaMgL: 0 })];
    expect(evaluateCycle(readings, { now: at(25, 1) }).reasons).toEqual([
      "The latest ammonia and nitrite test is 4 days old; take a new one.",
    ]);
  });
});

describe("evaluateCycle: doses and cycleStartedAt", () => {
  it("keeps doses logged after cycleStartedAt: an hour after dosing is not ready", () => {
    const result = evaluateCycle(READY_PAIR(), { now: at(21, 2), cycleStartedAt: at(0), doses: [dose(at(21, 1))] });
    expect(result.ready).toBe(false);
    expect(result.reasons).toEqual([
      "Ammonia was dosed an hour ago; ammonia and nitrite need to read zero within 24 hours of the dose.",
    ]);
  });

  it("keeps a dose logged at the very moment the cycle started", () => {
    const readings = [zero(at(0), 5), zero(at(1), 10)];
    const result = evaluateCycle(readings, { now: at(0, 2), cycleStartedAt: at(0), doses: [dose(at(0))] });
    expect(result.phase).not.toBe("not-started");
  });

  it("a zero exactly at the dose deadline clears the dose", () => {
    const deadlineZero = zero(new Date(at(21, 1).getTime() + DEFAULT_CYCLE_RULES.clearWithinHoursOfDose * HOUR));
    const result = evaluateCycle([...READY_PAIR(), deadlineZero], { now: at(22, 2), doses: [dose(at(21, 1))] });
    expect(result.reasons).toEqual([]);
    expect(result.ready).toBe(true);
  });

  it("a zero a minute after the dose deadline does not clear it", () => {
    const late = zero(at(22, 1 + 1 / 60));
    const result = evaluateCycle([...READY_PAIR(), late], { now: at(22, 2), doses: [dose(at(21, 1))] });
    expect(result.ready).toBe(false);
    expect(result.reasons).toEqual(["Ammonia was dosed 25 hours ago and wasn't tested within 24 hours of it."]);
  });

  it("at the deadline itself with no zero, the dose has failed rather than still waiting", () => {
    const result = evaluateCycle(READY_PAIR(), { now: at(22, 1), doses: [dose(at(21, 1))] });
    expect(result.reasons).toEqual(["Ammonia was dosed 24 hours ago and wasn't tested within 24 hours of it."]);
  });

  it("a test after the dose that read only ammonia still counts as tested", () => {
    const readings = [...READY_PAIR(), reading(at(22), { ammoniaMgL: 0 })];
    const result = evaluateCycle(readings, { now: at(23), doses: [dose(at(21, 1))] });
    expect(result.reasons).toEqual(["Ammonia was dosed 47 hours ago and didn't read zero within 24 hours."]);
  });

  it("a test after the dose that read only nitrate doesn't count as tested", () => {
    const readings = [...READY_PAIR(), reading(at(22), { nitrateMgL: 20 })];
    const result = evaluateCycle(readings, { now: at(23), doses: [dose(at(21, 1))] });
    expect(result.reasons).toEqual(["Ammonia was dosed 47 hours ago and wasn't tested within 24 hours of it."]);
  });

  it("judges the latest dose even when doses are listed newest first", () => {
    const readings = [...READY_PAIR(), zero(at(22))];
    const result = evaluateCycle(readings, { now: at(22, 3), doses: [dose(at(22, 2)), dose(at(21, 1))] });
    expect(result.reasons).toEqual([
      "Ammonia was dosed an hour ago; ammonia and nitrite need to read zero within 24 hours of the dose.",
    ]);
  });

  it("without `now`, times the dose against the newer of the dose and the newest test", () => {
    const result = evaluateCycle(READY_PAIR(), { doses: [dose(at(21, 1))] });
    expect(result.reasons).toContain(
      "Ammonia was dosed just now; ammonia and nitrite need to read zero within 24 hours of the dose.",
    );
    const nitrateLater = [...READY_PAIR(), reading(at(21, 13), { nitrateMgL: 20 })];
    const dosedEarlier = evaluateCycle(nitrateLater, { doses: [dose(at(21, 1))] });
    expect(dosedEarlier.reasons).toContain(
      "Ammonia was dosed 12 hours ago; ammonia and nitrite need to read zero within 24 hours of the dose.",
    );
  });
});

describe("evaluateCycle: invalid times throw the documented RangeError", () => {
  it("an invalid `now`", () => {
    expect(() => evaluateCycle(READY_PAIR(), { now: new Date(Number.NaN) })).toThrow(
      new RangeError("The current time is not a valid date."),
    );
  });

  it("an invalid cycle start", () => {
    expect(() => evaluateCycle(READY_PAIR(), { cycleStartedAt: new Date("not a date") })).toThrow(
      new RangeError("The cycle start is not a valid date."),
    );
  });

  it("an invalid dose time, but not a voided one", () => {
    const bad = { id: "d-bad", dosedAt: new Date(Number.NaN), targetMgL: 2 };
    expect(() => evaluateCycle(READY_PAIR(), { now: at(21, 1), doses: [bad] })).toThrow(
      new RangeError("Dose d-bad has no valid time."),
    );
    expect(evaluateCycle(READY_PAIR(), { now: at(21, 1), doses: [{ ...bad, voided: true }] }).ready).toBe(true);
  });
});

describe("evaluateCycle: phase and day count", () => {
  it("with no tests but a dose logged, the cycle has started (ammonia falling)", () => {
    const result = evaluateCycle([], { now: at(2), doses: [dose(at(0))] });
    expect(result.phase).toBe("ammonia-falling");
    expect(result.daysSinceStart).toBeNull();
  });

  it("counts whole days from cycleStartedAt, never below zero", () => {
    expect(evaluateCycle([zero(at(3))], { now: at(5, 23), cycleStartedAt: at(2) }).daysSinceStart).toBe(3);
    expect(evaluateCycle([], { now: at(1), cycleStartedAt: at(2) }).daysSinceStart).toBe(0);
  });

  it("counts days to the newest test when `now` isn't given", () => {
    expect(evaluateCycle([zero(at(0)), zero(at(4, 5))]).daysSinceStart).toBe(4);
  });

  it("calls it ammonia-falling while the newest ammonia is above zero, even if a later test read nitrite only", () => {
    const readings = [
      reading(at(0), { ammoniaMgL: 2, nitriteMgL: 0 }),
      reading(at(1), { ammoniaMgL: 1, nitriteMgL: 0.5 }),
      reading(at(2), { nitriteMgL: 1 }),
    ];
    expect(evaluateCycle(readings, { now: at(2, 1) }).phase).toBe("ammonia-falling");
  });

  it("calls it nitrite-falling once the newest ammonia reads zero, even if nitrite was never tested", () => {
    const readings = [reading(at(0), { ammoniaMgL: 2 }), reading(at(1), { ammoniaMgL: 0 })];
    expect(evaluateCycle(readings, { now: at(1, 1) }).phase).toBe("nitrite-falling");
  });

  it("with ammonia never tested, lets nitrite decide; with neither tested, ammonia is assumed present", () => {
    expect(evaluateCycle([reading(at(0), { nitriteMgL: 1 })], { now: at(0, 1) }).phase).toBe("nitrite-falling");
    const nitrateOnly = [reading(at(1), { nitrateMgL: 5 })];
    expect(evaluateCycle(nitrateOnly, { now: at(1, 1), doses: [dose(at(0))] }).phase).toBe("ammonia-falling");
  });

  it("sees nitrate in any test, even after ammonia was first seen", () => {
    const readings = [reading(at(0), { ammoniaMgL: 2, nitriteMgL: 0, nitrateMgL: 0 }), zero(at(20), 0), zero(at(21), 5)];
    expect(evaluateCycle(readings, { now: at(21, 1) }).ready).toBe(true);
  });
});
