import { describe, expect, it } from "vitest";
import { bedFootprintFromDesign, looksLikeDesign } from "@/lib/install/install-calcs";
import { leakCheckRefusal, leakTestPassed, MIN_HOURS_BEFORE_DAY_CHECK, type LeakRow } from "@/lib/install/leak-rules";

const HOUR = 3_600_000;
const t0 = new Date("2026-03-02T09:00:00Z");
const at = (h: number) => new Date(t0.getTime() + h * HOUR);

describe("leak rules: edges", () => {
  const fill: LeakRow = { kind: "filled", passed: true, at: at(0) };

  it("the check at fill needs only a fill", () => {
    expect(leakCheckRefusal("at fill", [fill], at(0))).toBeNull();
  });

  it("says how long ago the fill was and how long to wait, in full", () => {
    expect(leakCheckRefusal("after 24 hours", [fill], at(12.25))).toBe(
      `The tank was filled 12.3 hours ago. The day-after check needs at least ${MIN_HOURS_BEFORE_DAY_CHECK} hours, so a slow seep has time to show: come back in 7.8 hours.`,
    );
  });

  it("times the day-after check from the latest fill, whatever order the rows come in", () => {
    const rows: LeakRow[] = [{ kind: "filled", passed: true, at: at(22) }, fill, { kind: "at fill", passed: true, at: at(40) }];
    expect(leakCheckRefusal("after 24 hours", rows, at(41))).toBe(
      "The tank was filled 19.0 hours ago. The day-after check needs at least 20 hours, so a slow seep has time to show: come back in 1 hour.",
    );
    expect(leakCheckRefusal("after 24 hours", rows, at(42))).toBeNull();
  });

  it("reads the latest day-after check whatever order the rows come in", () => {
    const rows: LeakRow[] = [
      { kind: "after 24 hours", passed: true, at: at(48) },
      fill,
      { kind: "after 24 hours", passed: false, at: at(24) },
      { kind: "at fill", passed: false, at: at(60) },
    ];
    expect(leakTestPassed(rows)).toBe(true);
    expect(leakTestPassed([rows[2], fill, rows[0], { kind: "after 24 hours", passed: false, at: at(72) }])).toBe(false);
  });
});

describe("bed footprint and design shape: edges", () => {
  it("a cylinder's round floor as a square of equal area: side = D·√π / 2 on the inside diameter", () => {
    // Inside diameter 924 − 2 × 12 = 900 mm; side = 900 × 1.7724539 / 2 = 797.604 mm.
    expect(bedFootprintFromDesign({ shape: "cylinder", diameterMm: 924, panelThicknessMm: 12 })).toEqual({
      lengthMm: (900 * Math.sqrt(Math.PI)) / 2,
      widthMm: (900 * Math.sqrt(Math.PI)) / 2,
      note: "Round floor: shown as the square of the same area.",
    });
    expect(bedFootprintFromDesign({ shape: "cylinder" })).toBeNull();
    expect(bedFootprintFromDesign({ shape: "cylinder", diameterMm: 900 })?.lengthMm).toBeCloseTo(797.604, 3);
  });

  it("a bow front adds half the bow to the depth, and says so", () => {
    expect(bedFootprintFromDesign({ shape: "bowfront", lengthMm: 1200, widthMm: 600, panelThicknessMm: 10, bowDepthMm: 100 })).toEqual({
      lengthMm: 1180,
      widthMm: 630,
      note: "Bow front: depth includes half the bow, a close estimate.",
    });
    expect(bedFootprintFromDesign({ shape: "rectangular", lengthMm: 1200, widthMm: 600, bowDepthMm: 100 })).toEqual({
      lengthMm: 1200,
      widthMm: 600,
      note: null,
    });
  });

  it("ignores sizes that aren't positive numbers", () => {
    expect(bedFootprintFromDesign({ shape: "rectangular", lengthMm: 1200, widthMm: 0 })).toBeNull();
    expect(bedFootprintFromDesign({ shape: "rectangular", lengthMm: "1200", widthMm: 600 })).toBeNull();
    expect(bedFootprintFromDesign({ shape: "rectangular", lengthMm: 1200, widthMm: 600, panelThicknessMm: -5 })?.lengthMm).toBe(1200);
    expect(bedFootprintFromDesign({ shape: "rectangular", lengthMm: Infinity, widthMm: 600 })).toBeNull();
  });

  it("looksLikeDesign needs a shape, a height, a substrate and a stand", () => {
    const ok = { shape: "rectangular", heightMm: 600, substrate: {}, stand: {} };
    expect(looksLikeDesign(ok)).toBe(true);
    expect(looksLikeDesign(null)).toBe(false);
    expect(looksLikeDesign({ ...ok, shape: 1 })).toBe(false);
    expect(looksLikeDesign({ ...ok, heightMm: "600" })).toBe(false);
    expect(looksLikeDesign({ ...ok, substrate: "sand" })).toBe(false);
    expect(looksLikeDesign({ ...ok, stand: undefined })).toBe(false);
  });
});
