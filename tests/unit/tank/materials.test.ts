import { describe, expect, it } from "vitest";
import { SUBSTRATE_PROPERTIES } from "@/lib/tank/densities";
import { fillPlan, hoseFlowFromBucket, substrateQuantity } from "@/lib/tank/materials";

describe("substrateQuantity", () => {
  it("demo tank, 60 mm of sand", () => {
    // 1770 × 570 × 60 mm = 60 534 000 mm³ = 60.534 L (1 L = 10⁶ mm³, SI Brochure Table 8)
    // × 1600 kg/m³ (sand bulk density, common practice) = 96.854 kg
    const q = substrateQuantity({
      footprintLengthMm: 1770,
      footprintWidthMm: 570,
      depthMm: 60,
      bulkDensityKgM3: SUBSTRATE_PROPERTIES.sand.bulkDensityKgM3,
      bagSizeKg: 20,
    });
    expect(q.volumeL).toBeCloseTo(60.534, 9);
    expect(q.massKg).toBeCloseTo(96.8544, 9);
    expect(q.bags).toBe(5); // 96.854 / 20 = 4.84 → 5 bags
  });

  it("uses the larger bag count when both sizes are given", () => {
    // by mass 96.854 / 20 = 4.84 → 5; by volume 60.534 / 10 = 6.05 → 7
    const q = substrateQuantity({ footprintLengthMm: 1770, footprintWidthMm: 570, depthMm: 60, bulkDensityKgM3: 1600, bagSizeKg: 20, bagSizeL: 10 });
    expect(q.bags).toBe(7);
  });

  it("an exact number of bags isn't rounded up by floating-point dust", () => {
    // 100 × 100 × 210 mm = 2.1 L; 2.1 / 0.3 evaluates to 7.000000000000001 in doubles
    const q = substrateQuantity({ footprintLengthMm: 100, footprintWidthMm: 100, depthMm: 210, bulkDensityKgM3: 1500, bagSizeL: 0.3 });
    expect(q.bags).toBe(7);
  });

  it("gives no bag count without a bag size", () => {
    const q = substrateQuantity({ footprintLengthMm: 1000, footprintWidthMm: 500, depthMm: 40, bulkDensityKgM3: 1500 });
    expect(q.volumeL).toBe(20); // 1000 × 500 × 40 mm = 20 L
    expect(q.massKg).toBe(30); // 20 L × 1.5 kg/L (gravel, common practice)
    expect(q.bags).toBeNull();
  });
});

describe("substrateQuantity: rounding to whole bags", () => {
  // 1000 × 500 × 100 mm = 50 L of bed.
  const bed = { footprintLengthMm: 1000, footprintWidthMm: 500, depthMm: 100, bulkDensityKgM3: 1600 };
  it("a millionth of a bag over still buys another bag; floating-point dust (10⁻¹²) does not", () => {
    expect(substrateQuantity({ ...bed, bagSizeL: 50 / 5.000001 }).bags).toBe(6);
    expect(substrateQuantity({ ...bed, bagSizeL: 10 }).bags).toBe(5);
    expect(substrateQuantity({ ...bed, bagSizeL: 50 / (5 + 1e-12) }).bags).toBe(5);
  });
});

describe("fillPlan", () => {
  it("demo tank's net volume at 15 L/min with 5 mL per 100 L", () => {
    // 588.9465 L / 15 L/min = 39.263 min; 588.9465 × 5 / 100 = 29.447 mL (straight proportion)
    const p = fillPlan({ netVolumeL: 588.9465, hoseFlowLPerMin: 15, conditionerDose: { ml: 5, perLitres: 100 } });
    expect(p.fillTimeMinutes).toBeCloseTo(39.2631, 4);
    expect(p.conditionerMl).toBeCloseTo(29.4473, 4);
  });

  it("a per-litre dose works the same way", () => {
    const p = fillPlan({ netVolumeL: 200, hoseFlowLPerMin: 10, conditionerDose: { ml: 0.1, perLitres: 1 } });
    expect(p.fillTimeMinutes).toBe(20);
    expect(p.conditionerMl).toBeCloseTo(20, 12);
  });

  it("no conditioner, no dose", () => {
    expect(fillPlan({ netVolumeL: 100, hoseFlowLPerMin: 20 }).conditionerMl).toBeNull();
  });

  it("rejects a zero flow or a zero label volume", () => {
    expect(() => fillPlan({ netVolumeL: 100, hoseFlowLPerMin: 0 })).toThrow(RangeError);
    expect(() => fillPlan({ netVolumeL: 100, hoseFlowLPerMin: 5, conditionerDose: { ml: 5, perLitres: 0 } })).toThrow(RangeError);
  });
});

describe("hoseFlowFromBucket", () => {
  it("10 L in 40 s is 15 L/min", () => {
    expect(hoseFlowFromBucket(10, 40)).toBe(15); // 10 L × 60 s/min ÷ 40 s
    expect(() => hoseFlowFromBucket(10, 0)).toThrow(RangeError);
  });
});
