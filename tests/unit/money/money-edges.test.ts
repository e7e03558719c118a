import { describe, expect, it } from "vitest";
import {
  AmountError,
  BASIS_POINTS,
  MAX_AMOUNT_MINOR,
  MAX_QUANTITY_MILLI,
  MAX_UNIT_PRICE_MINOR,
  divRoundHalfAway,
  formatMoney,
  formatQuantity,
  formatRate,
  lineAmounts,
  parseMajor,
  quoteTotals,
  splitByWeights,
} from "@/lib/money/amounts";
import { checkShares, instalmentAmount, instalmentsDueOnMove, isPeriod, monthPeriod, splitSchedule } from "@/lib/money/schedule";
import { PRICE_BASIS_LABELS, QUOTE_GROUP_LABELS, designQuantities, draftLinesFromDesign, type PriceItem } from "@/lib/money/quote-lines";
import { demoDesign } from "../tank/fixtures";

// Every figure here is worked by hand from the rules in lib/money (no outside source: these are our own rules).
const ok = { quantityMilli: 1000, unitPriceMinor: 100, discountBp: 0, taxBp: 2000 };

describe("a line's limits, each at its edge", () => {
  it("the limits, value by value (house rules: far above any install, far below 2⁵³)", () => {
    expect(MAX_AMOUNT_MINOR).toBe(1_000_000_000_000);
    expect(MAX_UNIT_PRICE_MINOR).toBe(10_000_000_000);
    expect(MAX_QUANTITY_MILLI).toBe(1_000_000_000);
    // A basis point is one hundredth of a per cent, by definition.
    expect(BASIS_POINTS).toBe(10_000);
    expect(MAX_AMOUNT_MINOR).toBeLessThan(Number.MAX_SAFE_INTEGER);
  });
  it("divides only by a positive number", () => {
    expect(() => divRoundHalfAway(BigInt(7), BigInt(0))).toThrow("divisor must be positive");
    expect(() => divRoundHalfAway(BigInt(7), BigInt(-2))).toThrow("divisor must be positive");
    expect(divRoundHalfAway(BigInt(0), BigInt(3))).toBe(BigInt(0));
    expect(divRoundHalfAway(BigInt(7), BigInt(1))).toBe(BigInt(7));
  });
  it("says which figure is wrong, in words", () => {
    expect(() => lineAmounts({ ...ok, taxBp: 20.5 })).toThrow("Quantities, prices and rates must be whole numbers of their units.");
    expect(() => lineAmounts({ ...ok, unitPriceMinor: -1 })).toThrow("Quantities and prices can't be negative.");
    expect(() => lineAmounts({ ...ok, quantityMilli: -1 })).toThrow("Quantities and prices can't be negative.");
    expect(() => lineAmounts({ ...ok, discountBp: -1 })).toThrow("A discount is between 0 % and 100 %.");
    expect(() => lineAmounts({ ...ok, discountBp: 10_001 })).toThrow("A discount is between 0 % and 100 %.");
    expect(() => lineAmounts({ ...ok, taxBp: -1 })).toThrow("A tax rate is between 0 % and 100 %.");
    expect(() => lineAmounts({ ...ok, taxBp: 10_001 })).toThrow("A tax rate is between 0 % and 100 %.");
  });
  it("bills a free line, a full discount and a 100 % rate", () => {
    expect(lineAmounts({ ...ok, unitPriceMinor: 0 })).toEqual({ netMinor: 0, taxMinor: 0, totalMinor: 0 });
    expect(lineAmounts({ ...ok, quantityMilli: 0 })).toEqual({ netMinor: 0, taxMinor: 0, totalMinor: 0 });
    expect(lineAmounts({ ...ok, discountBp: 10_000 })).toEqual({ netMinor: 0, taxMinor: 0, totalMinor: 0 });
    expect(lineAmounts({ ...ok, taxBp: 10_000 })).toEqual({ netMinor: 100, taxMinor: 100, totalMinor: 200 });
  });
  it("takes the largest quantity and unit price, and refuses one more", () => {
    expect(lineAmounts({ ...ok, quantityMilli: MAX_QUANTITY_MILLI, taxBp: 0 }).netMinor).toBe(100_000_000);
    expect(() => lineAmounts({ ...ok, quantityMilli: MAX_QUANTITY_MILLI + 1 })).toThrow("That quantity is too large.");
    expect(lineAmounts({ ...ok, unitPriceMinor: MAX_UNIT_PRICE_MINOR, taxBp: 0 }).netMinor).toBe(MAX_UNIT_PRICE_MINOR);
    expect(() => lineAmounts({ ...ok, unitPriceMinor: MAX_UNIT_PRICE_MINOR + 1 })).toThrow("That unit price is too large.");
  });
  it("bills a line of exactly the largest amount, and refuses one whose tax takes it over", () => {
    // 1,000,000 units × 1,000,000 minor = 10¹² minor, the limit itself.
    const atLimit = { quantityMilli: MAX_QUANTITY_MILLI, unitPriceMinor: 1_000_000, discountBp: 0, taxBp: 0 };
    expect(lineAmounts(atLimit).totalMinor).toBe(MAX_AMOUNT_MINOR);
    // 0.01 % tax adds 10⁸ minor: over the limit, though the net alone is not.
    expect(() => lineAmounts({ ...atLimit, taxBp: 1 })).toThrow("That line's amount is too large to bill.");
  });
  it("bills a quote of exactly the largest total, and refuses one whose tax takes it over", () => {
    const half = { quantityMilli: 500_000_000, unitPriceMinor: 1_000_000, discountBp: 0, taxBp: 0 };
    expect(quoteTotals([half, half]).totalMinor).toBe(MAX_AMOUNT_MINOR);
    // Two lines of 6·10¹¹ net and 20 % tax: 1.44·10¹² in all, over the limit.
    const taxed = { quantityMilli: 600_000_000, unitPriceMinor: 1_000_000, discountBp: 0, taxBp: 2000 };
    expect(() => quoteTotals([taxed, taxed])).toThrow("The quote's total is too large to bill.");
  });
});

describe("splitByWeights: who gets the minor units left over", () => {
  it("gives them to the largest remainders, wherever those parts stand", () => {
    // 2 × 1/6, 2 × 3/6, 2 × 2/6: floors 0, 1, 0; remainders 2, 0, 4 (in sixths): the third part gets the unit.
    expect(splitByWeights(2, [1, 3, 2])).toEqual([0, 1, 1]);
    // 1 × 1/4 and 1 × 3/4: the second part's remainder is larger.
    expect(splitByWeights(1, [1, 3])).toEqual([0, 1]);
    // 10 × 1/3 and 10 × 2/3: floors 3 and 6, remainders 1 and 2: the second part gets it.
    expect(splitByWeights(10, [1, 2])).toEqual([3, 7]);
  });
  it("breaks a tie in favour of the earlier part", () => {
    expect(splitByWeights(1, [1, 1, 1])).toEqual([1, 0, 0]);
    expect(splitByWeights(2, [1, 1, 1])).toEqual([1, 1, 0]);
    // 5 at 3/3/4: exact 1.5, 1.5, 2; the one unit left goes to the first of the tied halves.
    expect(splitByWeights(5, [3, 3, 4])).toEqual([2, 1, 2]);
  });
  it("refuses what can't be split, saying why", () => {
    expect(() => splitByWeights(-1, [1])).toThrow("Only a whole, non-negative amount can be split.");
    expect(() => splitByWeights(1.5, [1])).toThrow("Only a whole, non-negative amount can be split.");
    expect(() => splitByWeights(10, [])).toThrow("Split weights must be whole and non-negative.");
    expect(() => splitByWeights(10, [2, -1])).toThrow("Split weights must be whole and non-negative.");
    expect(() => splitByWeights(10, [1.5, 1])).toThrow("Split weights must be whole and non-negative.");
    expect(() => splitByWeights(10, [0, 0])).toThrow("At least one part of a split must be above zero.");
    expect(() => splitByWeights(10, [0, 0])).toThrow(AmountError);
  });
});

describe("money text", () => {
  it("reads an amount typed with spaces around it", () => {
    expect(parseMajor(" 12.50 ")).toBe(1250);
  });
  it("writes a negative amount with a minus, zero without one, and no decimals where the currency has none", () => {
    expect(formatMoney(-150, "EUR")).toBe("−1.50 EUR");
    expect(formatMoney(0, "EUR")).toBe("0.00 EUR");
    expect(formatMoney(123456, "JPY", 0)).toBe("123,456 JPY");
  });
  it("writes rates and quantities without trailing zeros", () => {
    expect(formatRate(1250)).toBe("12.5 %");
    expect(formatRate(2000)).toBe("20 %");
    expect(formatRate(1)).toBe("0.01 %");
    expect(formatQuantity(2345)).toBe("2.345");
    expect(formatQuantity(3000)).toBe("3");
    expect(formatQuantity(500)).toBe("0.5");
  });
});

describe("the payment schedule's rules", () => {
  const shares = { depositBp: 3000, progressBp: 5000 };
  it("checks each share on its own", () => {
    const whole = "Shares are whole basis points, not negative.";
    expect(checkShares({ depositBp: -1, progressBp: 0 })).toBe(whole);
    expect(checkShares({ depositBp: 0, progressBp: -1 })).toBe(whole);
    expect(checkShares({ depositBp: 10.5, progressBp: 0 })).toBe(whole);
    expect(checkShares({ depositBp: 0, progressBp: 0 })).toBeNull();
    expect(checkShares({ depositBp: 5000, progressBp: 5000 })).toBeNull();
    expect(checkShares({ depositBp: 5000, progressBp: 5001 })).toBe("The deposit and the install-day payment together can't be more than 100 %.");
  });
  it("splits nothing into nothing", () => {
    expect(splitSchedule(0, shares)).toEqual({ deposit: 0, progress: 0, balance: 0 });
  });
  it("bills each instalment its share, never more than is left, and the balance as whatever is left", () => {
    // 100.00 at 30 % / 50 %: 30.00, 50.00 and 20.00.
    expect(instalmentAmount("deposit", 10_000, shares, 0)).toBe(3000);
    expect(instalmentAmount("progress", 10_000, shares, 3000)).toBe(5000);
    expect(instalmentAmount("progress", 10_000, shares, 8000)).toBe(2000);
    expect(instalmentAmount("balance", 10_000, shares, 8000)).toBe(2000);
    // The balance is what is left, even when the shares would say otherwise.
    expect(instalmentAmount("balance", 10_000, shares, 3000)).toBe(7000);
    expect(instalmentAmount("balance", 10_000, shares, 11_000)).toBe(0);
    expect(instalmentAmount("deposit", 10_000, shares, 12_000)).toBe(0);
  });
  it("makes each instalment due once, only moving forward past its stage", () => {
    expect(instalmentsDueOnMove("site_survey", "aquascape")).toEqual(["progress"]);
    expect(instalmentsDueOnMove("aquascape", "cycling")).toEqual([]);
    expect(instalmentsDueOnMove("site_survey", "stand_load_check")).toEqual([]);
    expect(instalmentsDueOnMove("first_stocking", "in_service")).toEqual(["balance"]);
    expect(instalmentsDueOnMove("site_survey", "in_service")).toEqual(["progress", "balance"]);
    expect(instalmentsDueOnMove("in_service", "in_service")).toEqual([]);
    expect(instalmentsDueOnMove("in_service", "cycling")).toEqual([]);
  });
  it("names a month as YYYY-MM, and knows one when it sees it", () => {
    expect(monthPeriod(new Date("2026-12-02T10:00:00Z"))).toBe("2026-12");
    expect(isPeriod("2026-05")).toBe(true);
    expect(isPeriod("2026-12")).toBe(true);
    expect(isPeriod("2026-00")).toBe(false);
    expect(isPeriod("2026-13")).toBe(false);
    expect(isPeriod("x2026-05")).toBe(false);
    expect(isPeriod("2026-05x")).toBe(false);
  });
});

describe("drafting quote lines at the edges", () => {
  const item = (o: Partial<PriceItem>): PriceItem => ({ id: "i", group: "labour", label: "x", unit: "each", unitPriceMinor: 100, taxBp: 2000, basis: "manual", panelThicknessMm: null, ...o });
  it("has no panel area without a panel thickness", () => {
    expect(designQuantities({ ...demoDesign(), panelThicknessMm: 0 }).glassAreaM2).toBe(0);
  });
  it("prices glass of any thickness, water by the litre, and leaves out substrate and rock the design hasn't got", () => {
    const d = { ...demoDesign(), rockMassKg: 0, substrate: { type: "sand" as const, depthMm: 0 } };
    const lines = draftLinesFromDesign(
      [
        item({ group: "tank_glass", basis: "glass_area_m2", label: "any glass" }),
        item({ group: "filtration_equipment", basis: "net_volume_l", label: "salt mix" }),
        item({ group: "aquascape_materials", basis: "substrate_kg", label: "sand" }),
        item({ group: "aquascape_materials", basis: "rock_kg", label: "rock" }),
      ],
      d,
    );
    expect(lines.map((l) => l.description)).toEqual(["any glass", "salt mix"]);
    expect(lines[0].quantityMilli).toBe(4330);
    expect(lines[1].quantityMilli).toBe(Math.round(designQuantities(d).netVolumeL) * 1000);
    expect(lines[1]).toMatchObject({ unitPriceMinor: 100, taxBp: 2000, discountBp: 0, priceItemId: "i", unit: "each" });
  });
  it("prices substrate and rock each by its own mass, and water only from a design", () => {
    // Substrate by its mass rounded up to the kilogram, rock likewise (the demo design has 40 kg of rock).
    const q = designQuantities(demoDesign());
    expect(Math.ceil(q.substrateKg)).not.toBe(40);
    const lines = draftLinesFromDesign(
      [
        item({ group: "aquascape_materials", basis: "substrate_kg", label: "sand" }),
        item({ group: "aquascape_materials", basis: "rock_kg", label: "rock" }),
        item({ group: "filtration_equipment", basis: "net_volume_l", label: "salt mix" }),
      ],
      demoDesign(),
    );
    expect(lines.map((l) => [l.description, l.quantityMilli])).toEqual([
      ["salt mix", Math.round(q.netVolumeL) * 1000],
      ["sand", Math.ceil(q.substrateKg) * 1000],
      ["rock", 40_000],
    ]);
    expect(draftLinesFromDesign([item({ basis: "net_volume_l" }), item({ basis: "rock_kg" }), item({ basis: "substrate_kg" }), item({ basis: "glass_area_m2" })], null)).toEqual([]);
  });
  it("names every group and every price basis", () => {
    expect(QUOTE_GROUP_LABELS).toEqual({
      tank_glass: "Tank and glass",
      stand_cabinet: "Stand and cabinet",
      filtration_equipment: "Filtration and equipment",
      lighting: "Lighting",
      aquascape_materials: "Aquascape materials",
      livestock: "Livestock",
      labour: "Labour",
    });
    expect(PRICE_BASIS_LABELS).toEqual({
      glass_area_m2: "panel area from the design (m²)",
      substrate_kg: "substrate mass from the design (kg)",
      rock_kg: "rock mass from the design (kg)",
      net_volume_l: "water volume from the design (L)",
      per_quote: "one on every quote",
      manual: "added by hand",
    });
  });
});
