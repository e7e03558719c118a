import { describe, expect, it } from "vitest";
import { leakCheckRefusal, leakTestPassed, type LeakRow } from "@/lib/install/leak-rules";
import { bedFootprintFromDesign } from "@/lib/install/install-calcs";
import { fillPlan, hoseFlowFromBucket, substrateQuantity } from "@/lib/tank/materials";
import { gallonsToLitres, kgToPounds, litresToGallons } from "@/lib/tank/units";

const HOUR = 3_600_000;
const t0 = new Date("2026-03-02T09:00:00Z");
const at = (h: number) => new Date(t0.getTime() + h * HOUR);

describe("leakCheckRefusal", () => {
  it("asks for the fill before any check", () => {
    expect(leakCheckRefusal("at fill", [], at(0))).toMatch(/Record the fill first/);
    expect(leakCheckRefusal("after 24 hours", [], at(30))).toMatch(/Record the fill first/);
    expect(leakCheckRefusal("filled", [], at(0))).toBeNull();
  });
  it("holds the day-after check until 20 hours after the latest fill (common practice)", () => {
    const rows: LeakRow[] = [{ kind: "filled", passed: true, at: at(0) }];
    expect(leakCheckRefusal("after 24 hours", rows, at(19.5))).toMatch(/come back in 0.5 hours/);
    expect(leakCheckRefusal("after 24 hours", rows, at(20))).toBeNull();
    // A refill restarts the clock.
    const refilled: LeakRow[] = [...rows, { kind: "filled", passed: true, at: at(22) }];
    expect(leakCheckRefusal("after 24 hours", refilled, at(30))).toMatch(/8.0 hours ago/);
  });
});

describe("leakTestPassed", () => {
  it("needs a fill and a passed latest day-after check", () => {
    const fill: LeakRow = { kind: "filled", passed: true, at: at(0) };
    expect(leakTestPassed([fill])).toBe(false);
    expect(leakTestPassed([fill, { kind: "after 24 hours", passed: false, at: at(24) }])).toBe(false);
    expect(leakTestPassed([fill, { kind: "after 24 hours", passed: false, at: at(24) }, { kind: "after 24 hours", passed: true, at: at(48) }])).toBe(true);
    expect(leakTestPassed([{ kind: "after 24 hours", passed: true, at: at(24) }])).toBe(false);
  });
});

describe("bedFootprintFromDesign", () => {
  it("takes the inside of a rectangular tank", () => {
    expect(bedFootprintFromDesign({ shape: "rectangular", lengthMm: 1200, widthMm: 600, panelThicknessMm: 12 })).toEqual({ lengthMm: 1176, widthMm: 576, note: null });
  });
  it("gives a round floor as a square of equal area", () => {
    const f = bedFootprintFromDesign({ shape: "cylinder", diameterMm: 924, panelThicknessMm: 12 })!;
    // π r² with r = 450 mm.
    expect(f.lengthMm * f.widthMm).toBeCloseTo(Math.PI * 450 * 450, 6);
  });
  it("returns null without dimensions", () => {
    expect(bedFootprintFromDesign({})).toBeNull();
    expect(bedFootprintFromDesign(null)).toBeNull();
  });
});

describe("worked install-day examples", () => {
  it("substrate for a 1200 × 600 mm bed at 60 mm of sand", () => {
    // 1200 × 600 × 60 mm = 43.2 L; at 1600 kg/m³ bed density that is 69.12 kg; 10 kg bags → 7.
    const q = substrateQuantity({ footprintLengthMm: 1200, footprintWidthMm: 600, depthMm: 60, bulkDensityKgM3: 1600, bagSizeKg: 10 });
    expect(q.volumeL).toBeCloseTo(43.2, 10);
    expect(q.massKg).toBeCloseTo(69.12, 10);
    expect(q.bags).toBe(7);
    // Pound = 0.45359237 kg exactly (international yard and pound, 1959): 69.12 kg = 152.383… lb.
    expect(kgToPounds(q.massKg)).toBeCloseTo(69.12 / 0.45359237, 10);
  });
  it("fill time and conditioner for 400 L at a bucket-measured flow", () => {
    // A 10 L bucket filled in 40 s is 15 L/min; 400 L takes 26.7 min; a label of 5 mL per 100 L gives 20 mL.
    const flow = hoseFlowFromBucket(10, 40);
    expect(flow).toBe(15);
    const plan = fillPlan({ netVolumeL: 400, hoseFlowLPerMin: flow, conditionerDose: { ml: 5, perLitres: 100 } });
    expect(plan.fillTimeMinutes).toBeCloseTo(26.6667, 4);
    expect(plan.conditionerMl).toBe(20);
  });
  it("converts gallons by the exact definition", () => {
    // US gallon = 231 in³ exactly (NIST Handbook 44, Appendix C), inch = 25.4 mm: 3.785411784 L.
    const litresPerGallon = (231 * 25.4 ** 3) / 1e6;
    expect(gallonsToLitres(1)).toBeCloseTo(litresPerGallon, 12);
    expect(litresToGallons(400)).toBeCloseTo(400 / litresPerGallon, 10);
  });
});
