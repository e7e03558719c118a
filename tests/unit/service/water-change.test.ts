import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  afterOneChange,
  DEFAULT_NITRATE_LIMIT_MGL,
  litresToChange,
  longestIntervalDays,
  sawtoothPoints,
  smallestChangeFraction,
  steadyStateNitrate,
  wholeDaysWithin,
  wholePercentAtLeast,
  type WaterChangeRoutine,
} from "@/lib/service/water-change";

// Source for every expected value here: the steady state of repeated dilution, derived in
// lib/service/water-change.ts (b = R·T/f + N_tap, a = R·T·(1 − f)/f + N_tap; a geometric series,
// derived here, not taken from a published table). Worked by hand in the comments.

const routine = (o: Partial<WaterChangeRoutine> = {}): WaterChangeRoutine => ({ risePerDayMgL: 1, changeFraction: 0.25, intervalDays: 7, tapNitrateMgL: 0, ...o });

/** Day by day: nitrate rises R a day; every T days a fraction f is replaced with tap water. */
function simulate(r: WaterChangeRoutine, cycles: number, startMgL = 0) {
  let level = startMgL;
  let before = level;
  let after = level;
  for (let c = 0; c < cycles; c++) {
    for (let d = 0; d < r.intervalDays; d++) level += r.risePerDayMgL;
    before = level;
    level = (1 - r.changeFraction) * level + r.changeFraction * r.tapNitrateMgL;
    after = level;
  }
  return { before, after };
}

describe("steadyStateNitrate: the closed form", () => {
  it("1 mg/L a day, 25 % weekly, nitrate-free tap: 28 before and 21 after each change", () => {
    // R·T = 7; 7 / 0.25 = 28; 7 × 0.75 / 0.25 = 21
    expect(steadyStateNitrate(routine())).toEqual({ beforeChangeMgL: 28, afterChangeMgL: 21 });
  });

  it("tap water's own nitrate adds to both levels", () => {
    // 28 + 5 and 21 + 5
    expect(steadyStateNitrate(routine({ tapNitrateMgL: 5 }))).toEqual({ beforeChangeMgL: 33, afterChangeMgL: 26 });
  });

  it("2 mg/L a day, 50 % every 10 days, tap at 10 mg/L: 50 before, 30 after", () => {
    // R·T = 20; 20 / 0.5 + 10 = 50; 20 × 0.5 / 0.5 + 10 = 30
    expect(steadyStateNitrate({ risePerDayMgL: 2, changeFraction: 0.5, intervalDays: 10, tapNitrateMgL: 10 })).toEqual({ beforeChangeMgL: 50, afterChangeMgL: 30 });
  });

  it("changing all the water each time drops the tank to the tap's level, and it rises R·T from there", () => {
    expect(steadyStateNitrate({ risePerDayMgL: 3, changeFraction: 1, intervalDays: 4, tapNitrateMgL: 2 })).toEqual({ beforeChangeMgL: 14, afterChangeMgL: 2 });
  });

  it("with no rise the tank settles at the tap water's level", () => {
    expect(steadyStateNitrate(routine({ risePerDayMgL: 0, tapNitrateMgL: 7 }))).toEqual({ beforeChangeMgL: 7, afterChangeMgL: 7 });
  });

  it("the drop at each change is exactly the rise over one interval", () => {
    const s = steadyStateNitrate({ risePerDayMgL: 1.3, changeFraction: 0.2, intervalDays: 14, tapNitrateMgL: 3 });
    expect(s.beforeChangeMgL - s.afterChangeMgL).toBeCloseTo(1.3 * 14, 9);
  });
});

describe("steadyStateNitrate: against a day-by-day simulation", () => {
  it("the simulated tank converges to the closed form after many cycles", () => {
    const r = routine({ risePerDayMgL: 1.5, changeFraction: 0.3, tapNitrateMgL: 4 });
    const sim = simulate(r, 200);
    const closed = steadyStateNitrate(r);
    expect(sim.before).toBeCloseTo(closed.beforeChangeMgL, 9);
    expect(sim.after).toBeCloseTo(closed.afterChangeMgL, 9);
  });

  it("a tank starting above the steady state falls to it", () => {
    const r = routine();
    const sim = simulate(r, 200, 120);
    expect(sim.before).toBeCloseTo(28, 9);
    expect(sim.after).toBeCloseTo(21, 9);
  });

  it("the gap to the steady state shrinks by (1 − f) every cycle", () => {
    // From 0 with R·T = 7, f = 0.25: after one cycle 5.25, the steady 21 leaves a gap of 15.75 = 21 × 0.75
    const r = routine();
    expect(simulate(r, 1).after).toBe(5.25);
    expect(21 - simulate(r, 2).after).toBeCloseTo(21 * 0.75 ** 2, 9);
  });

  it("property: any valid routine, simulated long enough, reaches the closed form", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 5, noNaN: true }),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        fc.integer({ min: 1, max: 30 }),
        fc.double({ min: 0, max: 50, noNaN: true }),
        (rise, f, t, tap) => {
          const r = { risePerDayMgL: rise, changeFraction: f, intervalDays: t, tapNitrateMgL: tap };
          // (1 − 0.05)^1000 is below 1e-22: the start has long been forgotten.
          const sim = simulate(r, 1000);
          const closed = steadyStateNitrate(r);
          const scale = Math.max(1, closed.beforeChangeMgL);
          expect(Math.abs(sim.before - closed.beforeChangeMgL) / scale).toBeLessThan(1e-9);
          expect(Math.abs(sim.after - closed.afterChangeMgL) / scale).toBeLessThan(1e-9);
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe("steadyStateNitrate: properties", () => {
  const valid = fc.record({
    risePerDayMgL: fc.double({ min: 0, max: 10, noNaN: true }),
    changeFraction: fc.double({ min: 0.01, max: 1, noNaN: true }),
    intervalDays: fc.double({ min: 0.5, max: 60, noNaN: true }),
    tapNitrateMgL: fc.double({ min: 0, max: 50, noNaN: true }),
  });

  it("before ≥ after ≥ the tap's level, and a change of the before level gives the after level", () => {
    fc.assert(
      fc.property(valid, (r) => {
        const s = steadyStateNitrate(r);
        expect(s.beforeChangeMgL).toBeGreaterThanOrEqual(s.afterChangeMgL);
        expect(s.afterChangeMgL).toBeGreaterThanOrEqual(r.tapNitrateMgL - 1e-12);
        expect(afterOneChange(s.beforeChangeMgL, r.changeFraction, r.tapNitrateMgL)).toBeCloseTo(s.afterChangeMgL, 6);
      }),
    );
  });

  it("a bigger change never leaves more nitrate before the next change", () => {
    fc.assert(
      fc.property(valid, fc.double({ min: 0.01, max: 1, noNaN: true }), (r, g) => {
        const small = Math.min(r.changeFraction, g);
        const big = Math.max(r.changeFraction, g);
        expect(steadyStateNitrate({ ...r, changeFraction: big }).beforeChangeMgL).toBeLessThanOrEqual(steadyStateNitrate({ ...r, changeFraction: small }).beforeChangeMgL + 1e-9);
      }),
    );
  });

  it("the longest interval lands exactly on the limit, and the smallest fraction too", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 5, noNaN: true }),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 20, noNaN: true }),
        fc.double({ min: 21, max: 100, noNaN: true }),
        (rise, f, tap, limit) => {
          const t = longestIntervalDays({ risePerDayMgL: rise, changeFraction: f, tapNitrateMgL: tap, limitMgL: limit })!;
          expect(steadyStateNitrate({ risePerDayMgL: rise, changeFraction: f, intervalDays: t, tapNitrateMgL: tap }).beforeChangeMgL).toBeCloseTo(limit, 6);
          const g = smallestChangeFraction({ risePerDayMgL: rise, intervalDays: t, tapNitrateMgL: tap, limitMgL: limit })!;
          expect(g).toBeCloseTo(f, 9);
        },
      ),
    );
  });
});

describe("steadyStateNitrate: bad input is refused with a clear message", () => {
  it.each([
    [{ changeFraction: 0 }, "The fraction changed must be more than 0 and at most 1 (all the water); got 0."],
    [{ changeFraction: -0.1 }, "The fraction changed must be more than 0 and at most 1 (all the water); got -0.1."],
    [{ changeFraction: 1.01 }, "The fraction changed must be more than 0 and at most 1 (all the water); got 1.01."],
    [{ changeFraction: Number.NaN }, "The fraction changed must be a number, not NaN."],
    [{ intervalDays: 0 }, "The days between changes must be more than 0 (got 0)."],
    [{ intervalDays: -3 }, "The days between changes must be more than 0 (got -3)."],
    [{ intervalDays: Number.POSITIVE_INFINITY }, "The days between changes must be a number, not Infinity."],
    [{ risePerDayMgL: -0.5 }, "The nitrate rise per day cannot be negative (got -0.5 mg/L a day)."],
    [{ risePerDayMgL: Number.NaN }, "The nitrate rise per day must be a number, not NaN."],
    [{ tapNitrateMgL: -1 }, "The tap water's nitrate cannot be negative (got -1 mg/L)."],
    [{ tapNitrateMgL: Number.NaN }, "The tap water's nitrate must be a number, not NaN."],
  ])("%j", (bad, message) => {
    expect(() => steadyStateNitrate(routine(bad))).toThrow(new RangeError(message));
  });

  it("the edges that are allowed: a whole change, no rise, nitrate-free tap", () => {
    expect(() => steadyStateNitrate(routine({ changeFraction: 1, risePerDayMgL: 0, tapNitrateMgL: 0 }))).not.toThrow();
    expect(steadyStateNitrate(routine({ intervalDays: 0.5 })).beforeChangeMgL).toBe(2);
  });
});

describe("afterOneChange", () => {
  it("keeps 1 − f of the tank and adds f of tap water", () => {
    // 0.75 × 40 + 0.25 × 8 = 32
    expect(afterOneChange(40, 0.25, 8)).toBe(32);
    expect(afterOneChange(40, 1, 8)).toBe(8);
  });
  it("refuses a fraction out of range and negative tap nitrate", () => {
    expect(() => afterOneChange(40, 0, 0)).toThrow(RangeError);
    expect(() => afterOneChange(40, 0.5, -1)).toThrow("The tap water's nitrate cannot be negative (got -1 mg/L).");
  });
});

describe("longestIntervalDays", () => {
  it("1 mg/L a day, 25 % changes, limit 40, nitrate-free tap: every 10 days", () => {
    // T = f·(L − N_tap)/R = 0.25 × 40 / 1 = 10
    expect(longestIntervalDays({ risePerDayMgL: 1, changeFraction: 0.25, tapNitrateMgL: 0, limitMgL: 40 })).toBe(10);
  });
  it("tap nitrate eats into the headroom", () => {
    // 0.5 × (40 − 10) / 1.5 = 10
    expect(longestIntervalDays({ risePerDayMgL: 1.5, changeFraction: 0.5, tapNitrateMgL: 10, limitMgL: 40 })).toBe(10);
  });
  it("no rise: any interval keeps the tank under the limit", () => {
    expect(longestIntervalDays({ risePerDayMgL: 0, changeFraction: 0.25, tapNitrateMgL: 5, limitMgL: 40 })).toBe(Number.POSITIVE_INFINITY);
    // Even with the tap exactly at the limit (0 headroom: 0/0 would be NaN without the rule)
    expect(longestIntervalDays({ risePerDayMgL: 0, changeFraction: 0.25, tapNitrateMgL: 40, limitMgL: 40 })).toBe(Number.POSITIVE_INFINITY);
  });
  it("tap water exactly at the limit: only no time at all would do, so 0 days", () => {
    expect(longestIntervalDays({ risePerDayMgL: 1, changeFraction: 0.25, tapNitrateMgL: 40, limitMgL: 40 })).toBe(0);
  });
  it("tap water over the limit: no interval helps", () => {
    expect(longestIntervalDays({ risePerDayMgL: 1, changeFraction: 0.25, tapNitrateMgL: 45, limitMgL: 40 })).toBeNull();
    expect(longestIntervalDays({ risePerDayMgL: 0, changeFraction: 0.25, tapNitrateMgL: 45, limitMgL: 40 })).toBeNull();
  });
  it("refuses a limit of zero or below", () => {
    expect(() => longestIntervalDays({ risePerDayMgL: 1, changeFraction: 0.25, tapNitrateMgL: 0, limitMgL: 0 })).toThrow(new RangeError("The nitrate limit must be more than 0 mg/L (got 0)."));
    expect(() => longestIntervalDays({ risePerDayMgL: 1, changeFraction: 0.25, tapNitrateMgL: 0, limitMgL: Number.NaN })).toThrow(new RangeError("The nitrate limit must be a number, not NaN."));
  });
  it("checks the rise, the fraction and the tap", () => {
    expect(() => longestIntervalDays({ risePerDayMgL: -1, changeFraction: 0.25, tapNitrateMgL: 0, limitMgL: 40 })).toThrow("cannot be negative");
    expect(() => longestIntervalDays({ risePerDayMgL: 1, changeFraction: 2, tapNitrateMgL: 0, limitMgL: 40 })).toThrow("at most 1");
    expect(() => longestIntervalDays({ risePerDayMgL: 1, changeFraction: 0.5, tapNitrateMgL: -2, limitMgL: 40 })).toThrow("tap water");
  });
});

describe("smallestChangeFraction", () => {
  it("1 mg/L a day, weekly, limit 40, nitrate-free tap: 17.5 %", () => {
    // f = R·T/(L − N_tap) = 7 / 40 = 0.175
    expect(smallestChangeFraction({ risePerDayMgL: 1, intervalDays: 7, tapNitrateMgL: 0, limitMgL: 40 })).toBe(0.175);
  });
  it("exactly all the water is still possible", () => {
    // 4 × 10 / (50 − 10) = 1
    expect(smallestChangeFraction({ risePerDayMgL: 4, intervalDays: 10, tapNitrateMgL: 10, limitMgL: 50 })).toBe(1);
  });
  it("more than all the water would be needed: null", () => {
    expect(smallestChangeFraction({ risePerDayMgL: 5, intervalDays: 10, tapNitrateMgL: 0, limitMgL: 40 })).toBeNull();
  });
  it("no rise: no change is needed (0), unless the tap is over the limit", () => {
    expect(smallestChangeFraction({ risePerDayMgL: 0, intervalDays: 7, tapNitrateMgL: 40, limitMgL: 40 })).toBe(0);
    expect(smallestChangeFraction({ risePerDayMgL: 0, intervalDays: 7, tapNitrateMgL: 41, limitMgL: 40 })).toBeNull();
  });
  it("tap at or over the limit with a rise: no fraction helps", () => {
    expect(smallestChangeFraction({ risePerDayMgL: 1, intervalDays: 7, tapNitrateMgL: 40, limitMgL: 40 })).toBeNull();
    expect(smallestChangeFraction({ risePerDayMgL: 1, intervalDays: 7, tapNitrateMgL: 60, limitMgL: 40 })).toBeNull();
  });
  it("checks its inputs", () => {
    expect(() => smallestChangeFraction({ risePerDayMgL: 1, intervalDays: 0, tapNitrateMgL: 0, limitMgL: 40 })).toThrow("The days between changes must be more than 0 (got 0).");
    expect(() => smallestChangeFraction({ risePerDayMgL: 1, intervalDays: 7, tapNitrateMgL: 0, limitMgL: -1 })).toThrow("The nitrate limit must be more than 0 mg/L (got -1).");
  });
});

describe("litresToChange", () => {
  it("25 % of 480 L is 120 L", () => {
    expect(litresToChange(25, 480)).toBe(120);
    expect(litresToChange(100, 480)).toBe(480);
  });
  it.each([
    [0, 480, "The change must be more than 0 % and at most 100 % (got 0 %)."],
    [101, 480, "The change must be more than 0 % and at most 100 % (got 101 %)."],
    [25, 0, "The tank's water volume must be more than 0 L (got 0)."],
    [Number.NaN, 480, "The change percentage must be a number, not NaN."],
    [25, Number.NaN, "The tank's water volume must be a number, not NaN."],
  ])("refuses %s %% of %s L", (p, v, message) => {
    expect(() => litresToChange(p, v)).toThrow(new RangeError(message));
  });
});

describe("sawtoothPoints", () => {
  it("starts just after a change and drops at every interval", () => {
    expect(sawtoothPoints(routine(), 2)).toEqual([
      { day: 0, nitrateMgL: 21 },
      { day: 7, nitrateMgL: 28 },
      { day: 7, nitrateMgL: 21 },
      { day: 14, nitrateMgL: 28 },
      { day: 14, nitrateMgL: 21 },
    ]);
  });
  it("refuses fewer than one cycle or a fractional count", () => {
    expect(() => sawtoothPoints(routine(), 0)).toThrow(new RangeError("The number of cycles to draw must be a whole number of at least 1 (got 0)."));
    expect(() => sawtoothPoints(routine(), 1.5)).toThrow(RangeError);
    expect(sawtoothPoints(routine(), 1)).toHaveLength(3);
  });
});

describe("whole days and whole percentages for the plan", () => {
  it("rounds days down, so the plan stays under the limit", () => {
    expect(wholeDaysWithin(10)).toBe(10);
    expect(wholeDaysWithin(9.99)).toBe(9);
    expect(wholeDaysWithin(0.1 * 70)).toBe(7);
    expect(wholeDaysWithin(6.999999999999)).toBe(7);
  });
  it("rounds percentages up, so the plan stays under the limit", () => {
    expect(wholePercentAtLeast(0.175)).toBe(18);
    expect(wholePercentAtLeast(0.2)).toBe(20);
    expect(wholePercentAtLeast(0.07)).toBe(7);
    expect(wholePercentAtLeast(0.2000001)).toBe(21);
  });
});

describe("the planner's default limit", () => {
  it("starts at 40 mg/L nitrate (common practice for many freshwater community fish, not a standard)", () => {
    expect(DEFAULT_NITRATE_LIMIT_MGL).toBe(40);
  });
});
