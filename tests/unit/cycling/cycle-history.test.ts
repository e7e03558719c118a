import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { prepareHistory } from "@/lib/cycling/cycle-history";
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
