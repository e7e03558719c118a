// Rules of the cycle verdict pinned one by one: which reading counts as the latest, when a single
// zero is reported, how a dose is judged, and which figures come back with no current time.
import { describe, expect, it } from "vitest";
import { evaluateCycle } from "@/lib/cycling/evaluate-cycle";
import { at, dose, HOUR, reading, zero } from "./cycle-fixtures";

describe("evaluateCycle: the zero run's reason, sentence by sentence", () => {
  it("one zero as the oldest reading, followed by a nitrate-only test, is one zero so far", () => {
    const readings = [zero(at(0)), reading(at(1), { nitrateMgL: 10 })];
    const result = evaluateCycle(readings, { now: at(1, 1), doses: [dose(at(0, -1))] });
    // The zero an hour after the dose also clears it.
    expect(result.reasons).toEqual(["Two zero readings a day apart are needed; there is only one so far."]);
  });

  it("ammonia on the oldest reading, followed by a nitrate-only test, is named in the reason", () => {
    const readings = [reading(at(0), { ammoniaMgL: 2, nitriteMgL: 0 }), reading(at(1), { nitrateMgL: 5 })];
    const result = evaluateCycle(readings, { now: at(1, 1), rules: { requireNitrate: false } });
    expect(result.reasons).toEqual(["Ammonia and nitrite must both read zero; the latest test shows ammonia at 2 mg/L."]);
  });

  it("with three zeros needed, two zeros an hour apart are 'only one far enough apart'", () => {
    const readings = [reading(at(0), { ammoniaMgL: 2, nitriteMgL: 1 }), zero(at(5)), zero(at(5, 1))];
    const result = evaluateCycle(readings, { now: at(5, 2), rules: { zeroReadingsNeeded: 3 } });
    expect(result.reasons).toEqual(["Three zero readings a day apart are needed; only one is far enough apart so far."]);
  });

  it("reports no zero pair when the run has no zero at all", () => {
    const readings = [reading(at(0), { ammoniaMgL: 2, nitriteMgL: 1 }), reading(at(1), { ammoniaMgL: 1, nitriteMgL: 2 })];
    const result = evaluateCycle(readings, { now: at(1, 1) });
    expect(result.lastZeroPair).toBeUndefined();
    expect(result.phase).toBe("ammonia-falling");
  });
});

describe("evaluateCycle: the age of the latest ammonia-and-nitrite test", () => {
  it("counts from the oldest reading when it is the only one that tested both", () => {
    const readings = [zero(at(0)), reading(at(5), { nitrateMgL: 10 })];
    const result = evaluateCycle(readings, { now: at(5), doses: [dose(at(0, -1))] });
    expect(result.reasons).toContain("The latest ammonia and nitrite test is 5 days old; take a new one.");
  });

  it("a newer test of nitrite alone doesn't make the ammonia-and-nitrite test fresh", () => {
    const readings = [
      reading(at(0), { ammoniaMgL: 2, nitriteMgL: 0 }),
      zero(at(1)),
      zero(at(2)),
      reading(at(4, 23), { nitriteMgL: 0 }),
    ];
    const result = evaluateCycle(readings, { now: at(5) });
    expect(result.reasons).toEqual(["The latest ammonia and nitrite test is 3 days old; take a new one."]);
  });

  it("asks for no newer test when nothing has tested both yet: the run's reason already does", () => {
    const readings = [reading(at(0), { nitrateMgL: 5 }), reading(at(1), { nitrateMgL: 5 })];
    const result = evaluateCycle(readings, { now: at(9), doses: [dose(at(0, -1))] });
    expect(result.reasons).toEqual([
      "Ammonia and nitrite haven't both been tested yet.",
      "Ammonia was dosed 9 days ago and wasn't tested within 24 hours of it.",
    ]);
  });

  it("a reading exactly at the clock-drift allowance (five minutes ahead of now) counts as the latest", () => {
    const ahead = reading(new Date(at(2).getTime() + 5 * 60_000), { ammoniaMgL: 1, nitriteMgL: 1 });
    const readings = [reading(at(0), { ammoniaMgL: 2, nitriteMgL: 0, nitrateMgL: 5 }), ahead];
    expect(evaluateCycle(readings, { now: at(2) }).latest).toBe(ahead);
    const beyond = reading(new Date(at(2).getTime() + 5 * 60_000 + 1), { ammoniaMgL: 1, nitriteMgL: 1 });
    expect(evaluateCycle([readings[0], beyond], { now: at(2) }).latest).toBe(readings[0]);
  });
});

describe("evaluateCycle: a dose and the tests after it", () => {
  it("a single zero pair after the dose, as the first reading, clears the dose", () => {
    const result = evaluateCycle([zero(at(0, 12))], { now: at(1), doses: [dose(at(0))] });
    expect(result.reasons).toEqual(["Two zero readings a day apart are needed; there is only one so far."]);
  });

  it("a test of nitrite alone after the dose counts as tested", () => {
    const readings = [...[zero(at(0, -30)), zero(at(0, -2))], reading(at(0, 3), { nitriteMgL: 1 })];
    const result = evaluateCycle(readings, { now: at(2), doses: [dose(at(0))] });
    expect(result.reasons).toContain("Ammonia was dosed 2 days ago and didn't read zero within 24 hours.");
  });

  it("the latest of several doses counts, in any order", () => {
    const readings = [zero(at(0)), zero(at(1))];
    const result = evaluateCycle(readings, { now: at(3), doses: [dose(at(2)), dose(at(2, 20)), dose(at(2, 10))] });
    // The newest test is exactly 48 hours old: still fresh. The dose at 04:00 on day 3 (08:00 + 20 h) is 4 hours old.
    expect(result.reasons).toEqual([
      "Ammonia was dosed 4 hours ago; ammonia and nitrite need to read zero within 24 hours of the dose.",
    ]);
  });
});

describe("evaluateCycle: figures without a current time", () => {
  it("counts days up to a dose logged after the newest reading", () => {
    const readings = [reading(at(0), { ammoniaMgL: 2, nitriteMgL: 0 }), reading(at(1), { ammoniaMgL: 2, nitriteMgL: 0 })];
    const result = evaluateCycle(readings, { doses: [dose(at(5))] });
    expect(result.daysSinceStart).toBe(5);
  });

  it("counts days from the first reading when no start is given", () => {
    const readings = [reading(at(2), { ammoniaMgL: 2, nitriteMgL: 0 }), reading(at(6), { ammoniaMgL: 1, nitriteMgL: 0 })];
    expect(evaluateCycle(readings).daysSinceStart).toBe(4);
    expect(evaluateCycle(readings, { now: at(9) }).daysSinceStart).toBe(7);
  });

  it("has no day count with a start but no readings, doses or current time", () => {
    const result = evaluateCycle([], { cycleStartedAt: at(0) });
    expect(result.daysSinceStart).toBeNull();
    expect(result.latest).toBeUndefined();
  });

  it("keeps the hours of a zero pair exact", () => {
    const readings = [reading(at(0), { ammoniaMgL: 2, nitriteMgL: 0 }), zero(at(1)), zero(at(2, 6))];
    expect(evaluateCycle(readings, { now: at(2, 7) }).lastZeroPair?.hoursApart).toBe(30);
    expect(HOUR).toBe(3_600_000);
  });
});
