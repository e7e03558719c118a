import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { evaluateCycle } from "@/lib/cycling/evaluate-cycle";
import type { AmmoniaDose, WaterTest } from "@/lib/cycling/readings";
import { at, DAY, reading, T0, zero } from "./cycle-fixtures";

// Invented readings skewed towards zero so that ready verdicts turn up often.
const level = fc.option(fc.constantFrom(0, 0, 0, 0.25, 0.5, 1, 2, 5), { nil: null, freq: 6 });
const nitrate = fc.option(fc.constantFrom(0, 5, 10, 20), { nil: null, freq: 6 });

function readingsArb(prefix: string, fromDay: number, toDay: number, voided: fc.Arbitrary<boolean>) {
  return fc
    .array(
      fc.record({
        minute: fc.integer({ min: fromDay * 1440, max: toDay * 1440 }),
        ammoniaMgL: level,
        nitriteMgL: level,
        nitrateMgL: nitrate,
        voided,
      }),
      { maxLength: 40 },
    )
    .map((rows) =>
      rows.map(
        ({ minute, ...values }, i): WaterTest => ({
          id: `${prefix}${i}`,
          takenAt: new Date(T0 + minute * 60_000),
          pH: 7.5,
          tempC: 25,
          ...values,
        }),
      ),
    );
}

function dosesArb(prefix: string, voided: fc.Arbitrary<boolean>) {
  return fc
    .array(fc.record({ minute: fc.integer({ min: 0, max: 30 * 1440 }), voided }), { maxLength: 4 })
    .map((rows) =>
      rows.map(({ minute, voided: v }, i): AmmoniaDose => ({
        id: `${prefix}${i}`,
        dosedAt: new Date(T0 + minute * 60_000),
        targetMgL: 2,
        voided: v,
      })),
    );
}

const nowArb = fc.integer({ min: 0, max: 32 * 24 }).map((h) => new Date(T0 + h * 3_600_000));
const mostlyKept = fc.constantFrom(false, false, false, true);

function shuffled<T>(items: T[]): fc.Arbitrary<T[]> {
  return fc.shuffledSubarray(items, { minLength: items.length, maxLength: items.length });
}

describe("evaluateCycle properties", () => {
  it("a non-zero ammonia or nitrite test after the zeros makes the tank not ready", () => {
    const spoiler = fc.oneof(
      fc.record({ ammoniaMgL: fc.constantFrom(0.25, 0.5, 1, 2), nitriteMgL: level }),
      fc.record({ ammoniaMgL: level, nitriteMgL: fc.constantFrom(0.25, 0.5, 1, 2) }),
    );
    fc.assert(
      fc.property(readingsArb("e", 0, 20, mostlyKept), spoiler, fc.integer({ min: 1, max: 60 }), (earlier, bad, minutes) => {
        const start = reading(at(0), { ammoniaMgL: 2, nitriteMgL: 0, nitrateMgL: 0 });
        const base = [start, ...earlier, zero(at(21), 10), zero(at(22), 10)];
        const now = at(22, 2);
        expect(evaluateCycle(base, { now }).ready).toBe(true);

        const newest = reading(new Date(at(22).getTime() + minutes * 60_000), bad);
        const after = evaluateCycle([...base, newest], { now });
        expect(after.ready).toBe(false);
        expect(after.reasons[0]).toMatch(/^Ammonia and nitrite must both read zero/);
      }),
    );
  });

  it("the order of the input never changes the result", () => {
    const input = fc
      .tuple(readingsArb("r", 0, 30, mostlyKept), dosesArb("d", mostlyKept))
      .chain(([rs, ds]) => fc.tuple(fc.constant(rs), fc.constant(ds), shuffled(rs), shuffled(ds)));
    fc.assert(
      fc.property(input, nowArb, ([rs, ds, rs2, ds2], now) => {
        expect(evaluateCycle(rs2, { now, doses: ds2 })).toEqual(evaluateCycle(rs, { now, doses: ds }));
      }),
    );
  });

  it("voided readings and doses never change the result", () => {
    const input = fc
      .tuple(
        readingsArb("r", 0, 30, fc.constant(false)),
        readingsArb("v", 0, 32, fc.constant(true)),
        dosesArb("d", fc.constant(false)),
        dosesArb("vd", fc.constant(true)),
      )
      .chain(([rs, vs, ds, vds]) =>
        fc.tuple(fc.constant(rs), fc.constant(ds), shuffled([...rs, ...vs]), shuffled([...ds, ...vds])),
      );
    fc.assert(
      fc.property(input, nowArb, ([rs, ds, withVoided, dosesWithVoided], now) => {
        expect(evaluateCycle(withVoided, { now, doses: dosesWithVoided })).toEqual(
          evaluateCycle(rs, { now, doses: ds }),
        );
      }),
    );
  });

  it("a ready verdict always rests on fresh zeros a day apart", () => {
    // Mostly zeros, judged soon after the last test, so that many runs come out ready.
    const zeroHeavy = fc.constantFrom(0, 0, 0, 0, 0, 0, 0.25, 1);
    const input = fc.tuple(
      fc.array(
        fc.record({ minute: fc.integer({ min: 0, max: 10 * 1440 }), a: zeroHeavy, n: zeroHeavy, no3: nitrate }),
        { minLength: 1, maxLength: 12 },
      ),
      fc.integer({ min: 0, max: 72 * 60 }),
    );
    let readyRuns = 0;
    fc.assert(
      fc.property(input, ([rows, lag]) => {
        const rs = rows.map(({ minute, a, n, no3 }, i): WaterTest => ({
          id: `z${i}`,
          takenAt: new Date(T0 + minute * 60_000),
          ammoniaMgL: a,
          nitriteMgL: n,
          nitrateMgL: no3,
          pH: 7.5,
          tempC: 25,
        }));
        const newest = Math.max(...rs.map((r) => r.takenAt.getTime()));
        const now = new Date(newest + lag * 60_000);
        const result = evaluateCycle(rs, { now });
        if (!result.ready) return;
        readyRuns++;
        expect(result.phase).toBe("cycled");
        expect(result.reasons).toEqual([]);
        const pair = result.lastZeroPair;
        expect(pair?.hoursApart).toBeGreaterThanOrEqual(24);
        expect(pair?.later.takenAt.getTime()).toBe(newest);
        expect(now.getTime() - newest).toBeLessThanOrEqual(2 * DAY);
      }),
      { numRuns: 500 },
    );
    expect(readyRuns).toBeGreaterThan(0);
  });
});
