import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { AmountError, MAX_AMOUNT_MINOR, MAX_QUANTITY_MILLI, divRoundHalfAway, formatMoney, lineAmounts, parseMajor, quoteTotals, splitByWeights } from "@/lib/money/amounts";

// Worked examples: every figure below is worked by hand from the rule "per line, half away from zero".
describe("lineAmounts: per line, half away from zero", () => {
  it("2.5 m² of glass at 135.00 with 20 % tax", () => {
    // 2.5 × 13500 = 33750 minor; tax 33750 × 0.20 = 6750.
    expect(lineAmounts({ quantityMilli: 2500, unitPriceMinor: 13500, discountBp: 0, taxBp: 2000 })).toEqual({ netMinor: 33750, taxMinor: 6750, totalMinor: 40500 });
  });

  it("rounds an exact half away from zero, once for the net and once for the tax", () => {
    // 1.005 × 100 = 100.5 → 101; 101 × 12.5 % = 12.625 → 13.
    expect(lineAmounts({ quantityMilli: 1005, unitPriceMinor: 100, discountBp: 0, taxBp: 1250 })).toEqual({ netMinor: 101, taxMinor: 13, totalMinor: 114 });
    // 5 × 10 % = 0.5 → 1.
    expect(lineAmounts({ quantityMilli: 1000, unitPriceMinor: 5, discountBp: 0, taxBp: 1000 }).taxMinor).toBe(1);
    // 1.004 × 100 = 100.4 → 100 (below the half goes down).
    expect(lineAmounts({ quantityMilli: 1004, unitPriceMinor: 100, discountBp: 0, taxBp: 0 }).netMinor).toBe(100);
  });

  it("takes the discount before tax", () => {
    // 3 × 1999 = 5997; less 10 % = 5397.3 → 5397; tax 20 % = 1079.4 → 1079.
    expect(lineAmounts({ quantityMilli: 3000, unitPriceMinor: 1999, discountBp: 1000, taxBp: 2000 })).toEqual({ netMinor: 5397, taxMinor: 1079, totalMinor: 6476 });
  });

  it("has exact rounding for negative numbers too (half away from zero)", () => {
    expect(divRoundHalfAway(BigInt(-5), BigInt(2))).toBe(BigInt(-3));
    expect(divRoundHalfAway(BigInt(5), BigInt(2))).toBe(BigInt(3));
    expect(divRoundHalfAway(BigInt(-4), BigInt(3))).toBe(BigInt(-1));
  });

  it("refuses negative prices or quantities, rates over 100 % and amounts too large to bill", () => {
    const ok = { quantityMilli: 1000, unitPriceMinor: 100, discountBp: 0, taxBp: 2000 };
    expect(() => lineAmounts({ ...ok, unitPriceMinor: -1 })).toThrow(AmountError);
    expect(() => lineAmounts({ ...ok, quantityMilli: -1000 })).toThrow(AmountError);
    expect(() => lineAmounts({ ...ok, taxBp: 10_001 })).toThrow(/between 0 % and 100 %/);
    expect(() => lineAmounts({ ...ok, discountBp: 12_000 })).toThrow(AmountError);
    expect(() => lineAmounts({ ...ok, quantityMilli: 0.5 })).toThrow(AmountError);
    expect(() => lineAmounts({ ...ok, quantityMilli: MAX_QUANTITY_MILLI, unitPriceMinor: 10_000_000_000 })).toThrow(/too large/);
    // 1000 lines each just under the limit overflow the quote's total.
    const big = { quantityMilli: 1000, unitPriceMinor: 9_000_000_000, discountBp: 0, taxBp: 0 };
    expect(() => quoteTotals(Array.from({ length: 200 }, () => big))).toThrow(/too large/);
  });
});

const line = fc.record({
  quantityMilli: fc.integer({ min: 0, max: 1_000_000 }),
  unitPriceMinor: fc.integer({ min: 0, max: 5_000_000 }),
  discountBp: fc.integer({ min: 0, max: 10_000 }),
  taxBp: fc.integer({ min: 0, max: 10_000 }),
});

describe("quoteTotals", () => {
  it("a worked quote: the totals are the sums of the rounded lines", () => {
    const t = quoteTotals([
      { quantityMilli: 2500, unitPriceMinor: 13500, discountBp: 0, taxBp: 2000 },
      { quantityMilli: 1005, unitPriceMinor: 100, discountBp: 0, taxBp: 1250 },
      { quantityMilli: 3000, unitPriceMinor: 1999, discountBp: 1000, taxBp: 2000 },
    ]);
    expect(t).toMatchObject({ netMinor: 33750 + 101 + 5397, taxMinor: 6750 + 13 + 1079, totalMinor: 40500 + 114 + 6476 });
  });

  it("property: the lines always add up to the total, and each total is net plus tax", () => {
    fc.assert(
      fc.property(fc.array(line, { maxLength: 30 }), (lines) => {
        const t = quoteTotals(lines);
        expect(t.lines.reduce((s, l) => s + l.totalMinor, 0)).toBe(t.totalMinor);
        expect(t.netMinor + t.taxMinor).toBe(t.totalMinor);
        for (const l of t.lines) {
          expect(Number.isSafeInteger(l.totalMinor)).toBe(true);
          expect(l.taxMinor).toBeLessThanOrEqual(l.netMinor);
        }
      }),
    );
  });
});

describe("splitByWeights (largest remainder)", () => {
  it("a worked split: 1,000.01 at 50/30/20 gives the odd minor unit to the largest remainder", () => {
    // 100001 × 0.5 = 50000.5, × 0.3 = 30000.3, × 0.2 = 20000.2: floors leave 1, which goes to the .5.
    expect(splitByWeights(100_001, [5000, 3000, 2000])).toEqual([50_001, 30_000, 20_000]);
    // 100 in thirds: 33.33 each, the leftover 1 to the first on a tie.
    expect(splitByWeights(100, [1, 1, 1])).toEqual([34, 33, 33]);
    expect(splitByWeights(0, [5000, 5000])).toEqual([0, 0]);
  });

  it("property: never loses or creates a minor unit, and each part is within one of its exact share", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: MAX_AMOUNT_MINOR }), fc.array(fc.integer({ min: 0, max: 10_000 }), { minLength: 1, maxLength: 6 }), (total, weights) => {
        fc.pre(weights.some((w) => w > 0));
        const parts = splitByWeights(total, weights);
        expect(parts.reduce((s, p) => s + p, 0)).toBe(total);
        const sum = weights.reduce((s, w) => s + w, 0);
        parts.forEach((p, i) => {
          expect(p).toBeGreaterThanOrEqual(0);
          expect(Math.abs(p - (total * weights[i]) / sum)).toBeLessThan(1.000001);
        });
      }),
    );
  });

  it("refuses negative or fractional amounts and all-zero weights", () => {
    expect(() => splitByWeights(-1, [1])).toThrow(AmountError);
    expect(() => splitByWeights(1.5, [1])).toThrow(AmountError);
    expect(() => splitByWeights(10, [0, 0])).toThrow(AmountError);
  });
});

describe("money text", () => {
  it("parses plain amounts only and formats with the currency", () => {
    expect(parseMajor("12.5")).toBe(1250);
    expect(parseMajor("0.07")).toBe(7);
    expect(parseMajor("1000")).toBe(100_000);
    expect(parseMajor("-3")).toBeNull();
    expect(parseMajor("1.234")).toBeNull();
    expect(parseMajor("1e5")).toBeNull();
    expect(formatMoney(123_456_789, "GBP")).toBe("1,234,567.89 GBP");
    expect(formatMoney(5, "EUR")).toBe("0.05 EUR");
  });
});
