import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkPlan } from "@/lib/stocking/check-plan";
import { overlap } from "@/lib/stocking/ranges";
import { DIETS, SWIM_LEVELS, TEMPERAMENTS, WATER_KINDS, type Species } from "@/lib/stocking/species";
import type { PlanLine, TankFacts } from "@/lib/stocking/checks";

const range = (lo: number, hi: number) => fc.tuple(fc.integer({ min: lo, max: hi }), fc.integer({ min: lo, max: hi })).map(([a, b]) => ({ min: Math.min(a, b), max: Math.max(a, b) }));

const speciesArb = (id: string): fc.Arbitrary<Species> =>
  fc.record({
    id: fc.constant(id),
    commonName: fc.constant(`Species ${id}`),
    scientificName: fc.constant("Testus exemplaris"),
    water: fc.constantFrom(...WATER_KINDS),
    tempC: range(10, 32),
    pH: range(50, 85).map((r) => ({ min: r.min / 10, max: r.max / 10 })),
    adultLengthMm: fc.integer({ min: 10, max: 900 }),
    temperament: fc.constantFrom(...TEMPERAMENTS),
    territorial: fc.boolean(),
    shoalMin: fc.integer({ min: 1, max: 10 }),
    level: fc.constantFrom(...SWIM_LEVELS),
    coralSafe: fc.option(fc.boolean(), { nil: null }),
    invertSafe: fc.option(fc.boolean(), { nil: null }),
    diet: fc.constantFrom(...DIETS),
    minTankLengthMm: fc.option(fc.integer({ min: 300, max: 3000 }), { nil: null }),
  });

const tankArb: fc.Arbitrary<TankFacts> = fc.record({
  water: fc.option(fc.constantFrom(...WATER_KINDS), { nil: null }),
  lengthMm: fc.option(fc.integer({ min: 300, max: 4000 }), { nil: null }),
  netVolumeL: fc.option(fc.integer({ min: 20, max: 5000 }), { nil: null }),
  tempC: fc.option(fc.integer({ min: 15, max: 30 }), { nil: null }),
  pH: fc.option(fc.integer({ min: 60, max: 84 }).map((n) => n / 10), { nil: null }),
  reef: fc.boolean(),
});

const planArb = fc.integer({ min: 0, max: 6 }).chain((n) =>
  fc.tuple(...Array.from({ length: n }, (_, i) => fc.tuple(speciesArb(`s${i}`), fc.integer({ min: 1, max: 20 }), fc.integer({ min: 1, max: 4 })))).map((rows) =>
    rows.map(([species, count, batch]): PlanLine => ({ species, count, batch })),
  ),
);

describe("stocking checks, whatever the plan", () => {
  it("adding a species never removes an existing warning", () => {
    fc.assert(
      fc.property(planArb, tankArb, speciesArb("new"), fc.integer({ min: 1, max: 20 }), fc.integer({ min: 1, max: 5 }), (plan, tank, added, count, batch) => {
        const before = new Set(checkPlan(plan, tank).map((w) => w.key));
        const after = new Set(checkPlan([...plan, { species: added, count, batch }], tank).map((w) => w.key));
        for (const key of before) expect(after.has(key)).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  it("overlapping ranges are symmetric", () => {
    fc.assert(
      fc.property(range(-50, 50), range(-50, 50), (a, b) => {
        expect(overlap(a, b)).toEqual(overlap(b, a));
      }),
    );
  });

  it("a pair's range warning doesn't depend on the order the species were planned in", () => {
    fc.assert(
      fc.property(speciesArb("a"), speciesArb("b"), tankArb, (a, b, tank) => {
        const keys = (lines: PlanLine[]) =>
          checkPlan(lines, tank)
            .filter((w) => w.rule === "temperature" || w.rule === "ph" || w.rule === "temperament")
            .map((w) => w.key)
            .sort();
        expect(keys([{ species: a, count: 1, batch: 1 }, { species: b, count: 1, batch: 1 }])).toEqual(keys([{ species: b, count: 1, batch: 1 }, { species: a, count: 1, batch: 1 }]));
      }),
    );
  });
});
