import { describe, expect, it } from "vitest";
import { ammoniaDose, doseAdvice, ML_PER_DROP } from "@/lib/cycling/dose";

// Arithmetic: mass balance (mg/L × L = mg) and % w/w strength (density × 1000 × % / 100 mg per mL).

describe("ammoniaDose worked examples", () => {
  it("400 L to 2 mg/L with a 10 % solution at density 1", () => {
    // 2 mg/L × 400 L = 800 mg NH3; 1 g/mL × 1000 mg/g × 10 / 100 = 100 mg NH3 per mL
    // 800 mg / 100 mg/mL = 8 mL; 8 mL / 0.05 mL per drop = 160 drops
    const plan = ammoniaDose({ tankVolumeL: 400, targetMgL: 2, sourcePercent: 10 });
    expect(plan.mgNH3).toBe(800);
    expect(plan.mL).toBeCloseTo(8, 10);
    expect(plan.drops).toBeCloseTo(160, 8);
  });

  it("tops up from what is already in the water, with a denser-than-stated solution", () => {
    // (2 − 0.5) mg/L × 200 L = 300 mg; 0.98 × 1000 × 5 / 100 = 49 mg per mL
    // 300 / 49 = 6.1224 mL; 6.1224 / 0.05 = 122.45 drops
    const plan = ammoniaDose({
      tankVolumeL: 200,
      targetMgL: 2,
      currentMgL: 0.5,
      sourcePercent: 5,
      sourceDensityGPerMl: 0.98,
    });
    expect(plan.mgNH3).toBeCloseTo(300, 10);
    expect(plan.mL).toBeCloseTo(6.1224, 4);
    expect(plan.drops).toBeCloseTo(122.449, 3);
  });

  it("a large display: 5000 L to 3 mg/L with 25 % solution", () => {
    // 3 × 5000 = 15 000 mg; 1 × 1000 × 25 / 100 = 250 mg per mL; 15 000 / 250 = 60 mL
    expect(ammoniaDose({ tankVolumeL: 5000, targetMgL: 3, sourcePercent: 25 }).mL).toBeCloseTo(60, 10);
  });

  it("doses nothing when the water is already at or above the target", () => {
    expect(ammoniaDose({ tankVolumeL: 400, targetMgL: 2, currentMgL: 3, sourcePercent: 10 })).toEqual({
      mgNH3: 0,
      mL: 0,
      drops: 0,
    });
  });

  it("uses 20 drops to the mL (common practice)", () => {
    expect(ML_PER_DROP).toBe(0.05);
  });

  it("rejects impossible inputs", () => {
    expect(() => ammoniaDose({ tankVolumeL: 0, targetMgL: 2, sourcePercent: 10 })).toThrow(RangeError);
    expect(() => ammoniaDose({ tankVolumeL: 400, targetMgL: -1, sourcePercent: 10 })).toThrow(RangeError);
    expect(() => ammoniaDose({ tankVolumeL: 400, targetMgL: 2, sourcePercent: 0 })).toThrow(RangeError);
    expect(() => ammoniaDose({ tankVolumeL: 400, targetMgL: 2, sourcePercent: 101 })).toThrow(RangeError);
    expect(() =>
      ammoniaDose({ tankVolumeL: 400, targetMgL: 2, sourcePercent: 10, sourceDensityGPerMl: 0 }),
    ).toThrow(RangeError);
    expect(() => ammoniaDose({ tankVolumeL: Number.NaN, targetMgL: 2, sourcePercent: 10 })).toThrow(RangeError);
  });
});

describe("doseAdvice", () => {
  it("says no dose, in words, when ammonia already reads at or above the target", () => {
    const a = doseAdvice({ tankVolumeL: 400, targetMgL: 2, currentMgL: 2.5, sourcePercent: 10 });
    expect(a).toEqual({ kind: "none", message: "No dose: ammonia already reads 2.5 mg/L, at or above the 2 mg/L target." });
    expect(doseAdvice({ tankVolumeL: 400, targetMgL: 2, currentMgL: 2, sourcePercent: 10 }).kind).toBe("none");
  });

  it("names the field to fix and never shows NaN", () => {
    for (const input of [
      { tankVolumeL: Number.NaN, targetMgL: 2, currentMgL: 0, sourcePercent: 10 },
      { tankVolumeL: 400, targetMgL: Number.NaN, currentMgL: 0, sourcePercent: 10 },
      { tankVolumeL: 400, targetMgL: 2, currentMgL: Number.NaN, sourcePercent: 10 },
      { tankVolumeL: 400, targetMgL: 2, currentMgL: 0, sourcePercent: Number.NaN },
    ]) {
      const a = doseAdvice(input);
      expect(a.kind).toBe("fix");
      expect("message" in a && a.message).not.toMatch(/NaN/);
    }
  });

  it("gives the mass-balance dose otherwise", () => {
    const a = doseAdvice({ tankVolumeL: 400, targetMgL: 2, currentMgL: 0, sourcePercent: 10 });
    // 2 mg/L × 400 L = 800 mg; 10 % w/w at 1 g/mL is 100 mg/mL, so 8 mL (mass balance, lib/cycling/dose.ts).
    expect(a.kind === "dose" && a.plan.mL).toBeCloseTo(8, 6);
  });
});
