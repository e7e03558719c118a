import { describe, expect, it } from "vitest";
import { ammoniaDose, doseAdvice } from "@/lib/cycling/dose";

// The limits are the calculator's own plausibility bounds (lib/cycling/dose.ts), not published values.

const ok = { tankVolumeL: 400, targetMgL: 2, sourcePercent: 10 };

describe("ammoniaDose refuses impossible inputs, naming the field and the range", () => {
  it.each([
    [{ tankVolumeL: 0 }, "Tank volume (L) must be more than 0 and at most 10000000 (got 0)."],
    [{ tankVolumeL: 10_000_001 }, "Tank volume (L) must be more than 0 and at most 10000000 (got 10000001)."],
    [{ targetMgL: -1 }, "Target ammonia (mg/L) must be at least 0 and at most 50 (got -1)."],
    [{ targetMgL: 51 }, "Target ammonia (mg/L) must be at least 0 and at most 50 (got 51)."],
    [{ currentMgL: -0.5 }, "Current ammonia (mg/L) must be at least 0 and at most 50 (got -0.5)."],
    [{ sourcePercent: 0 }, "Solution strength (%) must be more than 0 and at most 100 (got 0)."],
    [{ sourceDensityGPerMl: 0.4 }, "Solution density (g/mL) must be at least 0.5 and at most 2 (got 0.4)."],
    [{ tankVolumeL: Number.NaN }, "Tank volume (L) must be more than 0 and at most 10000000 (got NaN)."],
  ])("%j", (bad, message) => {
    expect(() => ammoniaDose({ ...ok, ...bad })).toThrow(new RangeError(message));
  });

  it("accepts each range's edges: the largest tank, a zero target, strength 100 %, density 0.5 and 2", () => {
    expect(ammoniaDose({ ...ok, tankVolumeL: 10_000_000 }).mgNH3).toBe(20_000_000);
    expect(ammoniaDose({ ...ok, targetMgL: 0 })).toEqual({ mgNH3: 0, mL: 0, drops: 0 });
    expect(ammoniaDose({ ...ok, targetMgL: 50, currentMgL: 50 }).mgNH3).toBe(0);
    expect(ammoniaDose({ ...ok, sourcePercent: 100 }).mL).toBeCloseTo(0.8, 12);
    // 800 mg / (0.5 × 1000 × 0.1) = 16 mL; / (2 × 1000 × 0.1) = 4 mL
    expect(ammoniaDose({ ...ok, sourceDensityGPerMl: 0.5 }).mL).toBeCloseTo(16, 12);
    expect(ammoniaDose({ ...ok, sourceDensityGPerMl: 2 }).mL).toBeCloseTo(4, 12);
  });
});

describe("doseAdvice names the one field to fix", () => {
  const base = { tankVolumeL: 400, targetMgL: 2, currentMgL: 0, sourcePercent: 10 };
  const VOLUME = "Enter the water volume as a number above 0.";
  const TARGET = "Enter the target ammonia as a number from 0 to 50 mg/L.";
  const CURRENT = "Enter the ammonia reading now as a number from 0 to 50 mg/L (0 if none).";
  const STRENGTH = "Enter the solution's strength as a percentage above 0 and at most 100.";

  it.each([
    [{ tankVolumeL: 0 }, VOLUME],
    [{ tankVolumeL: 10_000_001 }, VOLUME],
    [{ tankVolumeL: Number.NaN }, VOLUME],
    [{ targetMgL: 0 }, TARGET],
    [{ targetMgL: 50.5 }, TARGET],
    [{ currentMgL: -0.25 }, CURRENT],
    [{ currentMgL: 50.5 }, CURRENT],
    [{ sourcePercent: 0 }, STRENGTH],
    [{ sourcePercent: 100.5 }, STRENGTH],
    [{ sourcePercent: Number.POSITIVE_INFINITY }, STRENGTH],
  ])("%j", (bad, message) => {
    expect(doseAdvice({ ...base, ...bad })).toEqual({ kind: "fix", message });
  });

  it("takes every edge that is allowed: the largest tank, a 50 mg/L target, a zero and a 50 mg/L reading, strength 100 %", () => {
    expect(doseAdvice({ ...base, tankVolumeL: 10_000_000 }).kind).toBe("dose");
    expect(doseAdvice({ ...base, targetMgL: 50 }).kind).toBe("dose");
    expect(doseAdvice({ ...base, currentMgL: 0 }).kind).toBe("dose");
    expect(doseAdvice({ ...base, targetMgL: 50, currentMgL: 50 })).toEqual({ kind: "none", message: "No dose: ammonia already reads 50 mg/L, at or above the 50 mg/L target." });
    expect(doseAdvice({ ...base, sourcePercent: 100 }).kind).toBe("dose");
  });
});
