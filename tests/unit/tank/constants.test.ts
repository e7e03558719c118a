import { describe, expect, it } from "vitest";
import { ACRYLIC_DENSITY_KG_M3, ROCK_DENSITY_KG_M3, SODA_LIME_GLASS_DENSITY_KG_M3, SUBSTRATE_PROPERTIES, panelDensityKgM3 } from "@/lib/tank/densities";
import { MAX_DIMENSION_MM } from "@/lib/tank/design";
import { ACRYLIC_DESIGN_STRESS_MPA, DEFAULT_GLASS_SAFETY_FACTOR, FLOAT_GLASS_MODULUS_OF_RUPTURE_MPA, STANDARD_GLASS_THICKNESSES_MM } from "@/lib/tank/glass-strength";
import { minimumCylinderWallThickness } from "@/lib/tank/glass-cylinder";
import { KG_PER_POUND, KPA_PER_PSF, LITRES_PER_US_GALLON, MM_PER_INCH, M_PER_FOOT, STANDARD_GRAVITY, psfToKpa } from "@/lib/tank/units";
import { DEFAULT_REEF_SALINITY_PSU } from "@/lib/tank/water-density";

// Every constant in lib/tank taken from a published source, pinned to its value, so a change to
// any of them fails here by name. (Plate coefficients and building-code loads are pinned in
// glass.test.ts and floor.test.ts.)

describe("unit factors (exact definitions)", () => {
  it("length, mass, volume and gravity", () => {
    expect(MM_PER_INCH).toBe(25.4); // 1959 yard and pound agreement, NIST Handbook 44 App. C
    expect(KG_PER_POUND).toBe(0.45359237); // same agreement
    expect(M_PER_FOOT).toBe(0.3048); // NIST Handbook 44 App. C
    expect(LITRES_PER_US_GALLON).toBe(3.785411784); // 231 in³, NIST Handbook 44 App. C
    expect(STANDARD_GRAVITY).toBe(9.80665); // 3rd CGPM (1901)
  });

  it("pressure: 1 psf = 47.880259 Pa", () => {
    expect(KPA_PER_PSF).toBeCloseTo(0.0478802589803, 13); // 4.4482216152605 N / 0.09290304 m² (NIST Handbook 44)
    expect(psfToKpa(1)).toBeCloseTo(0.0478802589803, 13);
  });
});

describe("densities", () => {
  it("panel materials", () => {
    expect(SODA_LIME_GLASS_DENSITY_KG_M3).toBe(2500); // EN 572-1
    expect(ACRYLIC_DENSITY_KG_M3).toBe(1190); // sheet makers' data, from memory
    expect(panelDensityKgM3("glass")).toBe(2500);
    expect(panelDensityKgM3("low-iron glass")).toBe(2500);
    expect(panelDensityKgM3("acrylic")).toBe(1190);
  });

  it("rock and substrates", () => {
    expect(ROCK_DENSITY_KG_M3).toBe(2600); // solid stone, from memory
    expect(SUBSTRATE_PROPERTIES).toEqual({
      sand: { bulkDensityKgM3: 1600, porosity: 0.4 }, // common practice / from memory
      gravel: { bulkDensityKgM3: 1500, porosity: 0.4 },
      "aqua soil": { bulkDensityKgM3: 1000, porosity: 0.5 },
      none: { bulkDensityKgM3: 0, porosity: 1 },
    });
    expect(DEFAULT_REEF_SALINITY_PSU).toBe(35); // natural seawater, EOS-80 reference
  });
});

describe("strength figures", () => {
  it("glass, acrylic and standard thicknesses", () => {
    expect(FLOAT_GLASS_MODULUS_OF_RUPTURE_MPA).toBe(19.3); // from memory, common practice
    expect(DEFAULT_GLASS_SAFETY_FACTOR).toBe(3.8); // common practice
    expect(ACRYLIC_DESIGN_STRESS_MPA).toBe(5); // from memory
    expect(STANDARD_GLASS_THICKNESSES_MM).toEqual([3, 4, 5, 6, 8, 10, 12, 15, 19, 25]); // EN 572-2, from memory
  });

  it("Poisson's ratio: glass 0.22, acrylic 0.37 (from memory), through the round-wall factor 6/√(12(1 − ν²))", () => {
    const at = (material: "glass" | "acrylic", nu: number) => {
      const r = minimumCylinderWallThickness({ waterHeightMm: 1000, diameterMm: 1000, material, allowableStressMPa: 1 });
      // t = k·ρgH·r/σ with ρgH = 9806.65 Pa, r = 0.5 m, σ = 1 MPa
      expect(r.requiredMm).toBeCloseTo(((6 / Math.sqrt(12 * (1 - nu * nu))) * 9806.65 * 0.5) / 1e6 * 1000, 9);
    };
    at("glass", 0.22);
    at("acrylic", 0.37);
  });

  it("our own size cut-off", () => {
    expect(MAX_DIMENSION_MM).toBe(10_000);
  });
});
