import { describe, expect, it } from "vitest";
import { bpToPercent, minorToMajor, percentToBp, quantityToMilli } from "@/lib/money/inputs";
import { groupLines } from "@/lib/money/quote-view";

describe("money form inputs", () => {
  it("reads a percentage as whole basis points, with up to two decimals", () => {
    expect(percentToBp("12.5")).toBe(1250);
    expect(percentToBp(" 20 ")).toBe(2000);
    expect(percentToBp("0.01")).toBe(1);
    expect(percentToBp("7.125")).toBeNull();
    expect(percentToBp("-5")).toBeNull();
    expect(percentToBp("")).toBeNull();
  });
  it("shows basis points as the percentage typed", () => {
    expect(bpToPercent(1250)).toBe("12.5");
    expect(bpToPercent(2000)).toBe("20");
    expect(bpToPercent(1)).toBe("0.01");
  });
  it("reads a quantity as thousandths, with up to three decimals", () => {
    expect(quantityToMilli("2.345")).toBe(2345);
    expect(quantityToMilli("3")).toBe(3000);
    expect(quantityToMilli("0.5")).toBe(500);
    expect(quantityToMilli("1.2345")).toBeNull();
    expect(quantityToMilli("two")).toBeNull();
  });
  it("writes minor units as a plain major amount with its decimals", () => {
    expect(minorToMajor(123450)).toBe("1234.50");
    expect(minorToMajor(5)).toBe("0.05");
    expect(minorToMajor(0)).toBe("0.00");
    expect(minorToMajor(1234, 3)).toBe("1.234");
    expect(minorToMajor(1234, 0)).toBe("1234");
  });
});

describe("groupLines", () => {
  it("puts lines under their groups in the quote's group order, keeping each group's line order, and skips empty groups", () => {
    const lines = [
      { group: "labour" as const, n: 1 },
      { group: "tank_glass" as const, n: 2 },
      { group: "labour" as const, n: 3 },
      { group: "lighting" as const, n: 4 },
    ];
    expect(groupLines(lines)).toEqual([
      { group: "tank_glass", label: "Tank and glass", lines: [{ group: "tank_glass", n: 2 }] },
      { group: "lighting", label: "Lighting", lines: [{ group: "lighting", n: 4 }] },
      {
        group: "labour",
        label: "Labour",
        lines: [
          { group: "labour", n: 1 },
          { group: "labour", n: 3 },
        ],
      },
    ]);
    expect(groupLines([])).toEqual([]);
  });
});
