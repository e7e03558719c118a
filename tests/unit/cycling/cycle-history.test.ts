import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { DEFAULT_CYCLE_RULES } from "@/lib/cycling/cycle-rules";
import {
  firstValueSince,
  isStalled,
  isZeroPair,
  latestValue,
  prepareHistory,
  showsAmmoniaOrNitrite,
} from "@/lib/cycling/cycle-history";
import type { WaterTest } from "@/lib/cycling/readings";
import { at, reading, T0 } from "./cycle-fixtures";

const plain = (id: string, t: number): WaterTest => ({
  id,
  takenAt: new Date(t),
  ammoniaMgL: 0,
  nitriteMgL: 0,
  nitrateMgL: null,
  pH: null,
  tempC: null,
});

function expectTimeThenIdOrder(h: ReturnType<typeof prepareHistory>) {
  for (let i = 1; i < h.readings.length; i++) {
    const [a, b] = [h.readings[i - 1], h.readings[i]];
    expect(h.times[i]).toBe(b.takenAt.getTime());
    expect(a.takenAt.getTime() < b.takenAt.getTime() || (a.takenAt.getTime() === b.takenAt.getTime() && a.id < b.id)).toBe(true);
  }
}

describe("prepareHistory", () => {
  it("sorts any input by time, ties by id, keeping every reading", () => {
    const rows = fc.array(fc.tuple(fc.integer({ min: 0, max: 50 }), fc.integer({ min: 0, max: 10_000 })), {
      maxLength: 60,
    });
    fc.assert(
      fc.property(rows, (pairs) => {
        // Few distinct minutes, so ties are common.
        const input = pairs.map(([minute, tag], i) => plain(`${tag}-${i}`, T0 + minute * 60_000));
        const h = prepareHistory(input);
        expect(h.readings).toHaveLength(input.length);
        expect(new Set(h.readings)).toEqual(new Set(input));
        expectTimeThenIdOrder(h);
      }),
    );
  });

  it("orders same-time readings by id whatever the input order", () => {
    const same = [plain("c", T0), plain("a", T0), plain("b", T0), plain("z", T0 - 1)];
    expect(prepareHistory(same).readings.map((r) => r.id)).toEqual(["z", "a", "b", "c"]);
  });

  it("still sorts correctly when times are too far apart to pack", () => {
    const input = [plain("late", 8e15), plain("early", -8e15), plain("mid", 0)];
    expect(prepareHistory(input).readings.map((r) => r.id)).toEqual(["early", "mid", "late"]);
  });

  it("drops voided readings and those before the start", () => {
    const kept = reading(at(5), { ammoniaMgL: 1 });
    const input = [reading(at(1), { ammoniaMgL: 1 }), reading(at(6), { voided: true }), kept];
    expect(prepareHistory(input, at(2).getTime()).readings).toEqual([kept]);
  });
});

describe("isStalled: the stall rule", () => {
  const rules = DEFAULT_CYCLE_RULES;
  const step = DEFAULT_CYCLE_RULES.stallChangeMgL;
  const stalled = (readings: WaterTest[], ref: Date) =>
    isStalled(prepareHistory(readings), ref.getTime(), rules.stallDays, rules.stallChangeMgL);
  // One test a day from day 0 to `days`, nitrite held at 2 mg/L, ammonia at `ammonia`.
  const flat = (days: number, ammonia = 0) =>
    Array.from({ length: days + 1 }, (_, d) => reading(at(d), { ammoniaMgL: ammonia, nitriteMgL: 2 }));

  it("flat ammonia and nitrite across the whole window is a stall", () => {
    expect(stalled(flat(12), at(12, 1))).toBe(true);
  });

  it("a move of exactly the smallest change that counts is progress, not a stall", () => {
    const readings = flat(12);
    readings[6] = reading(at(6), { ammoniaMgL: 0, nitriteMgL: 2 - step });
    expect(stalled(readings, at(12, 1))).toBe(false);
  });

  it("a move just under the smallest change that counts is still a stall", () => {
    const readings = flat(12);
    readings[6] = reading(at(6), { ammoniaMgL: 0, nitriteMgL: 2 - step / 2 });
    expect(stalled(readings, at(12, 1))).toBe(true);
  });

  it("falling ammonia prevents a stall even when nitrite holds still", () => {
    const readings = flat(12, 2);
    readings[12] = reading(at(12), { ammoniaMgL: 2 - step, nitriteMgL: 2 });
    expect(stalled(readings, at(12, 1))).toBe(false);
  });

  it("ammonia moving in a test that skipped nitrite still counts as change", () => {
    const readings = flat(12, 1);
    readings[8] = reading(at(8), { ammoniaMgL: 1 + step });
    expect(stalled(readings, at(12, 1))).toBe(false);
  });

  it("needs a test at or before the window's start: exactly at the start counts", () => {
    // Window of 10 days back from day 12 08:00 starts at day 2 08:00.
    const fromWindowStart = flat(12).slice(2);
    expect(stalled(fromWindowStart, at(12))).toBe(true);
    const fromAMinuteLater = flat(12).slice(2);
    fromAMinuteLater[0] = reading(at(2, 1 / 60), { ammoniaMgL: 0, nitriteMgL: 2 });
    expect(stalled(fromAMinuteLater, at(12))).toBe(false);
  });

  it("ignores a change that lies wholly before the baseline test", () => {
    const readings = flat(12);
    readings[0] = reading(at(0), { ammoniaMgL: 4, nitriteMgL: 0 });
    expect(stalled(readings, at(12))).toBe(true);
  });

  it("needs at least one test inside the window", () => {
    // Flat tests on days 0 to 2, then nothing: the window back from day 13 holds no test.
    expect(stalled(flat(2), at(13))).toBe(false);
  });

  it("a newest reading of zero ammonia and zero nitrite is not a stall (it awaits confirmation)", () => {
    const zeros = Array.from({ length: 13 }, (_, d) => reading(at(d), { ammoniaMgL: 0, nitriteMgL: 0 }));
    expect(stalled(zeros, at(12, 1))).toBe(false);
    // A tiny trace below the step, then zero/zero: not a stall either.
    const traces = zeros.map((r, d) => (d < 12 ? { ...r, nitriteMgL: step / 5 } : r));
    expect(stalled(traces, at(12, 1))).toBe(false);
  });

  it("skips tests that read neither ammonia nor nitrite", () => {
    const readings = [...flat(12), reading(at(12, 1), { nitrateMgL: 40 })];
    expect(stalled(readings, at(12, 2))).toBe(true);
  });
});

describe("latestValue and firstValueSince", () => {
  const h = () =>
    prepareHistory([
      reading(at(0), { ammoniaMgL: 2 }),
      reading(at(1), { ammoniaMgL: 1, nitriteMgL: 0.5 }),
      reading(at(2), { nitriteMgL: 1 }),
    ]);

  it("finds the newest tested value of each analyte, skipping tests that didn't read it", () => {
    expect(latestValue(h(), "ammonia")).toEqual({ value: 1, time: at(1).getTime() });
    expect(latestValue(h(), "nitrite")).toEqual({ value: 1, time: at(2).getTime() });
    expect(latestValue(h(), "nitrate")).toBeUndefined();
  });

  it("finds the oldest tested value at or after a time", () => {
    expect(firstValueSince(h(), "ammonia", at(0).getTime())).toEqual({ value: 2, time: at(0).getTime() });
    expect(firstValueSince(h(), "ammonia", at(0, 1).getTime())).toEqual({ value: 1, time: at(1).getTime() });
    expect(firstValueSince(h(), "nitrite", at(2).getTime())).toEqual({ value: 1, time: at(2).getTime() });
    expect(firstValueSince(h(), "nitrite", at(2, 1).getTime())).toBeUndefined();
  });
});

describe("showsAmmoniaOrNitrite and isZeroPair", () => {
  it("a zero pair needs both ammonia and nitrite tested and at zero", () => {
    expect(isZeroPair(reading(at(0), { ammoniaMgL: 0, nitriteMgL: 0 }))).toBe(true);
    expect(isZeroPair(reading(at(0), { ammoniaMgL: 0 }))).toBe(false);
    expect(isZeroPair(reading(at(0), { nitriteMgL: 0 }))).toBe(false);
    expect(isZeroPair(reading(at(0), { ammoniaMgL: 0, nitriteMgL: 0.25 }))).toBe(false);
  });

  it("either analyte above zero shows", () => {
    expect(showsAmmoniaOrNitrite(reading(at(0), { ammoniaMgL: 0.25 }))).toBe(true);
    expect(showsAmmoniaOrNitrite(reading(at(0), { nitriteMgL: 0.25 }))).toBe(true);
    expect(showsAmmoniaOrNitrite(reading(at(0), { ammoniaMgL: 0, nitriteMgL: 0, nitrateMgL: 5 }))).toBe(false);
  });
});

describe("prepareHistory: bad input and order", () => {
  it("throws RangeError for a negative, infinite or non-numeric value in any analyte", () => {
    for (const key of ["ammoniaMgL", "nitriteMgL", "nitrateMgL"] as const) {
      expect(() => prepareHistory([reading(at(0), { [key]: -0.25 })])).toThrow(RangeError);
      expect(() => prepareHistory([reading(at(0), { [key]: Infinity })])).toThrow(RangeError);
      expect(() => prepareHistory([reading(at(0), { [key]: Number.NaN })])).toThrow(RangeError);
    }
    expect(() => prepareHistory([reading(at(0), { nitrateMgL: -1 })])).toThrow(
      /has an impossible nitrateMgL value \(-1\)/,
    );
  });

  it("throws for an invalid time even on a reading before the start", () => {
    expect(() => prepareHistory([reading(new Date(Number.NaN))], at(5).getTime())).toThrow(/has no valid time/);
  });

  it("keeps a reading taken exactly at the start", () => {
    const first = reading(at(2));
    expect(prepareHistory([reading(at(1)), first], at(2).getTime()).readings).toEqual([first]);
  });

  it("orders readings that arrive in time order but with tied times out of id order", () => {
    const input = [plain("b", T0), plain("a", T0), plain("c", T0 + 1)];
    const h = prepareHistory(input);
    expect(h.readings.map((r) => r.id)).toEqual(["a", "b", "c"]);
    expect(h.times).toEqual([T0, T0, T0 + 1]);
  });

  it("returns input already in order as it is, times included", () => {
    const input = [plain("a", T0), plain("b", T0), plain("c", T0 + 5)];
    const h = prepareHistory(input);
    expect(h.readings).toEqual(input);
    expect(h.times).toEqual([T0, T0, T0 + 5]);
  });

  it("sorts unordered input of every size, with times kept beside their readings", () => {
    for (const n of [2, 3, 5, 8, 9]) {
      const input = Array.from({ length: n }, (_, i) => plain(`id${i}`, T0 + (n - i) * 1000));
      const h = prepareHistory(input);
      expect(h.readings.map((r) => r.id)).toEqual(input.map((r) => r.id).reverse());
      expect(h.times).toEqual(input.map((r) => r.takenAt.getTime()).reverse());
    }
  });
});

describe("prepareHistory: the packed sort and its fallback", () => {
  it("keeps times beside their readings in the comparator sort", () => {
    const input = [plain("late", 8e15), plain("early", -8e15), plain("mid", 0)];
    expect(prepareHistory(input).times).toEqual([-8e15, 0, 8e15]);
  });

  it("falls back to the comparator sort when the largest time isn't the last one given", () => {
    // Packed, 4e15 × 4 slots + 1 is past 2^53 and can't be unpacked exactly.
    const input = [plain("early", 0), plain("late", 4e15), plain("mid", 1)];
    const h = prepareHistory(input);
    expect(h.readings.map((r) => r.id)).toEqual(["early", "mid", "late"]);
    expect(h.times).toEqual([0, 1, 4e15]);
  });

  it("falls back exactly at the edge of exact packing: a span of 2^51 ms with four slots", () => {
    const base = 1_000_000;
    const input = [plain("second", base + 1), plain("last", base + 2 ** 51), plain("first", base)];
    expect(prepareHistory(input).readings.map((r) => r.id)).toEqual(["first", "second", "last"]);
  });

  it("packs offsets from the earliest time, so 3,000 reversed readings come out in order", () => {
    const input = Array.from({ length: 3000 }, (_, i) => plain(`id${String(i).padStart(4, "0")}`, T0 + (3000 - i) * 60_000));
    const h = prepareHistory(input);
    expect(h.readings[0].id).toBe("id2999");
    expect(h.readings[2999].id).toBe("id0000");
    expectTimeThenIdOrder(h);
  });

  it("orders 200 same-time readings by id from a scrambled input", () => {
    const ids = Array.from({ length: 200 }, (_, i) => `id${String((i * 73) % 200).padStart(3, "0")}`);
    const input = ids.map((id) => plain(id, T0));
    expect(prepareHistory(input).readings.map((r) => r.id)).toEqual([...ids].sort());
  });

  it("keeps a reading exactly at the upper bound and drops one a millisecond past it", () => {
    const input = [plain("on", T0), plain("past", T0 + 1), plain("before", T0 - 1)];
    expect(prepareHistory(input, undefined, T0).readings.map((r) => r.id)).toEqual(["before", "on"]);
  });

  it("treats a value left out altogether as not tested, not as impossible", () => {
    const loose = { ...plain("a", T0), nitrateMgL: undefined } as unknown as WaterTest;
    expect(prepareHistory([loose]).readings).toEqual([loose]);
  });
});

describe("firstValueSince and isStalled: tests that skipped an analyte", () => {
  it("firstValueSince skips the oldest test in the window when it didn't read the analyte", () => {
    const h = prepareHistory([
      reading(at(0), { ammoniaMgL: 2 }),
      reading(at(1), { nitriteMgL: 0.5 }),
      reading(at(2), { ammoniaMgL: 1 }),
    ]);
    expect(firstValueSince(h, "ammonia", at(1).getTime())).toEqual({ value: 1, time: at(2).getTime() });
  });

  const stalled = (readings: WaterTest[], ref: Date) =>
    isStalled(prepareHistory(readings), ref.getTime(), DEFAULT_CYCLE_RULES.stallDays, DEFAULT_CYCLE_RULES.stallChangeMgL);

  it("nitrite held at 2 mg/L for twelve days in tests that skipped ammonia is a stall", () => {
    const readings = Array.from({ length: 13 }, (_, d) => reading(at(d), { nitriteMgL: 2 }));
    expect(stalled(readings, at(12, 1))).toBe(true);
  });

  it("ammonia held at 1 mg/L, tested every other day, with nitrite held daily, is a stall", () => {
    const readings = Array.from({ length: 13 }, (_, d) => reading(at(d), { ammoniaMgL: d % 2 === 0 ? 1 : null, nitriteMgL: 2 }));
    expect(stalled(readings, at(12, 1))).toBe(true);
  });

  it("nitrite held at 1 mg/L, tested every other day, with ammonia held daily, is a stall", () => {
    const readings = Array.from({ length: 13 }, (_, d) => reading(at(d), { ammoniaMgL: 1, nitriteMgL: d % 2 === 0 ? 1 : null }));
    expect(stalled(readings, at(12, 1))).toBe(true);
  });

  it("a trace of ammonia on the newest test over ten days of zero/zero is still a stall", () => {
    const readings = Array.from({ length: 13 }, (_, d) => reading(at(d), { ammoniaMgL: d === 12 ? 0.1 : 0, nitriteMgL: 0 }));
    expect(stalled(readings, at(12, 1))).toBe(true);
  });
});
