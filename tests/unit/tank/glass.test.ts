import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { BETA_TABLE, betaForRatio, checkGlass, minimumPanelThickness } from "@/lib/tank/glass";
import { minimumCylinderWallThickness } from "@/lib/tank/glass-cylinder";
import {
  ACRYLIC_DESIGN_STRESS_MPA,
  DEFAULT_GLASS_SAFETY_FACTOR,
  FLOAT_GLASS_MODULUS_OF_RUPTURE_MPA,
  allowableStressMPa,
  nextStandardGlassThicknessMm,
} from "@/lib/tank/glass-strength";
import type { TankDesign } from "@/lib/tank/design";
import { demoDesign } from "./fixtures";

describe("β table", () => {
  it("holds the coefficients commonly quoted for aquarium glass", () => {
    // Roark's Formulas for Stress and Strain, Table 11.4 (linearly varying load, three edges
    // supported, top free) as commonly quoted for aquariums; values from memory
    expect(BETA_TABLE).toEqual([
      [0.5, 0.085],
      [0.667, 0.1156],
      [1.0, 0.16],
      [1.5, 0.26],
      [2.0, 0.34],
      [2.5, 0.38],
      [3.0, 0.43],
    ]);
  });

  it("returns table values at the table's ratios", () => {
    for (const [ratio, beta] of BETA_TABLE) expect(betaForRatio(ratio)).toBeCloseTo(beta, 12);
  });

  it("interpolates linearly and clamps at the ends", () => {
    expect(betaForRatio(1.25)).toBeCloseTo(0.21, 12); // halfway from 0.16 to 0.26
    expect(betaForRatio(2.25)).toBeCloseTo(0.36, 12); // halfway from 0.34 to 0.38
    expect(betaForRatio(0.3)).toBe(0.085);
    expect(betaForRatio(5)).toBe(0.43);
  });

  it("never falls as the panel gets longer (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 5, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (r, d) => {
        expect(betaForRatio(r + d)).toBeGreaterThanOrEqual(betaForRatio(r));
      }),
    );
  });
});

describe("strength figures", () => {
  it("float glass 19.3 MPa with safety factor 3.8", () => {
    expect(FLOAT_GLASS_MODULUS_OF_RUPTURE_MPA).toBe(19.3); // from memory, common practice
    expect(DEFAULT_GLASS_SAFETY_FACTOR).toBe(3.8); // common practice
    expect(allowableStressMPa("glass")).toBeCloseTo(5.078947, 6); // 19.3 / 3.8
    expect(allowableStressMPa("low-iron glass", 5)).toBeCloseTo(3.86, 12); // 19.3 / 5
    expect(allowableStressMPa("acrylic")).toBe(ACRYLIC_DESIGN_STRESS_MPA);
    expect(allowableStressMPa("glass", 3.8, 7)).toBe(7);
  });

  it("standard glass thicknesses", () => {
    expect(nextStandardGlassThicknessMm(11.9)).toBe(12);
    expect(nextStandardGlassThicknessMm(12)).toBe(12);
    expect(nextStandardGlassThicknessMm(15.6)).toBe(19);
    expect(nextStandardGlassThicknessMm(26)).toBeNull();
  });
});

describe("minimumPanelThickness", () => {
  it("worked example: 1200 mm long, 600 mm of water", () => {
    // L/H = 2.0 → β = 0.34 (table above)
    // ρgH³ = 1000 × 9.80665 × 0.6³ = 2118.236 N; × β = 720.200
    // σ = 19.3 / 3.8 = 5.078947 MPa; t = √(720.200 / 5.078947e6) = 0.011908 m = 11.91 mm → 12 mm glass
    const r = minimumPanelThickness({ waterHeightMm: 600, panelLengthMm: 1200, material: "glass" });
    expect(r.beta).toBe(0.34);
    expect(r.requiredMm).toBeCloseTo(11.908, 3);
    expect(r.suggestedMm).toBe(12);
    expect(r.enteredMm).toBeNull();
    expect(r.ok).toBeNull();
    expect(r.stressMPa).toBeCloseTo(5.078947, 6); // at the required thickness the stress is the allowable
    expect(r.message).toBe("Needs at least 11.9 mm (next standard glass: 12 mm).");
  });

  it("worked example: 900 mm long, 450 mm of water", () => {
    // L/H = 2.0 → β = 0.34; ρgH³ = 9806.65 × 0.091125 = 893.631 N; × 0.34 = 303.835
    // t = √(303.835 / 5.078947e6) = 7.734 mm → 8 mm glass
    const r = minimumPanelThickness({ waterHeightMm: 450, panelLengthMm: 900, material: "glass", enteredMm: 6 });
    expect(r.requiredMm).toBeCloseTo(7.7345, 4);
    expect(r.ok).toBe(false);
    // σ at 6 mm = 303.835 / 0.006² = 8.440 MPa
    expect(r.stressMPa).toBeCloseTo(8.4398, 3);
    expect(r.message).toBe("Needs at least 7.7 mm; 6 mm entered is too thin (next standard glass: 8 mm).");
  });

  it("interpolated β: 625 mm long, 500 mm of water", () => {
    // L/H = 625/500 = 1.25 → β = 0.21; t = √(0.21 × 9806.65 × 0.125 / 5.078947e6) = 7.119 mm
    const r = minimumPanelThickness({ waterHeightMm: 500, panelLengthMm: 625, material: "glass", enteredMm: 8 });
    expect(r.beta).toBeCloseTo(0.21, 12);
    expect(r.requiredMm).toBeCloseTo(7.1193, 4);
    expect(r.ok).toBe(true);
  });

  it("a larger safety factor needs thicker glass", () => {
    // t ∝ √SF: 11.908 × √(5 / 3.8) = 13.659 mm
    const r = minimumPanelThickness({ waterHeightMm: 600, panelLengthMm: 1200, material: "glass", safetyFactor: 5 });
    expect(r.requiredMm).toBeCloseTo(11.908027 * Math.sqrt(5 / 3.8), 6);
  });

  it("acrylic uses its design stress and says deflection isn't covered", () => {
    // t = √(720.200 / 5e6) = 12.002 mm
    const r = minimumPanelThickness({ waterHeightMm: 600, panelLengthMm: 1200, material: "acrylic" });
    expect(r.allowableStressMPa).toBe(5);
    expect(r.requiredMm).toBeCloseTo(12.0017, 4);
    expect(r.suggestedMm).toBeNull();
    expect(r.message).toContain("Acrylic bows out");
  });

  it("warns past the table's longest ratio", () => {
    const r = minimumPanelThickness({ waterHeightMm: 500, panelLengthMm: 2000, material: "glass" });
    expect(r.beta).toBe(0.43);
    expect(r.message).toContain("more than 3 times as long");
  });

  it("thickness grows with water depth and with panel length (property)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 200, max: 1500 }), fc.integer({ min: 200, max: 4000 }), fc.integer({ min: 1, max: 300 }), (h, l, d) => {
        const base = minimumPanelThickness({ waterHeightMm: h, panelLengthMm: l, material: "glass" }).requiredMm;
        expect(minimumPanelThickness({ waterHeightMm: h + d, panelLengthMm: l, material: "glass" }).requiredMm).toBeGreaterThan(base);
        expect(minimumPanelThickness({ waterHeightMm: h, panelLengthMm: l + d, material: "glass" }).requiredMm).toBeGreaterThanOrEqual(base);
      }),
    );
  });
});

describe("minimumCylinderWallThickness", () => {
  it("worked example: 1000 mm diameter, 1000 mm of water", () => {
    // p = 1000 × 9.80665 × 1.0 = 9806.65 Pa (hydrostatic ρgH); r = 0.5 m
    // k = 6 / √(12 × (1 − 0.22²)) = 6 / 3.37923 = 1.77555 (Timoshenko & Woinowsky-Krieger §117, glass ν = 0.22 from memory)
    // t = k·p·r / σ = 1.77555 × 4903.325 / 5.078947e6 = 1.714 mm
    const r = minimumCylinderWallThickness({ waterHeightMm: 1000, diameterMm: 1000, material: "glass", enteredMm: 10 });
    expect(r.requiredMm).toBeCloseTo(1.7142, 4);
    expect(r.ok).toBe(true);
    expect(r.message).toContain("confirm it with the panel maker");
  });

  it("is about 1.78 times the bare hoop-stress figure", () => {
    // hoop only: t = p·r/σ = 4903.325 / 5.078947e6 = 0.9654 mm (thin-walled cylinder)
    const r = minimumCylinderWallThickness({ waterHeightMm: 1000, diameterMm: 1000, material: "glass" });
    expect(r.requiredMm / 0.96542).toBeCloseTo(1.7756, 3);
  });
});

describe("checkGlass", () => {
  it("the demo's 15 mm front panels are too thin when filled to the rim", () => {
    // Filled to the rim: H = 700 − 15 = 685 mm; ρ(25 °C) = 997.047 kg/m³ (Tanaka 2001)
    // front: L/H = 1800/685 = 2.6277 → β = 0.38 + 0.05 × 0.2555 = 0.39277
    //   ρgH³ = 997.047 × 9.80665 × 0.321419 = 3142.74 N; × β = 1234.39; t = √(1234.39 / 5.078947e6) = 15.590 mm
    // sides: 600/685 = 0.8759 → β = 0.1156 + 0.0444 × 0.62736 = 0.14345; t = √(0.14345 × 3142.74 / 5.078947e6) = 9.422 mm
    const g = checkGlass(demoDesign());
    const [front, sides, bottom] = g.panels;
    expect(front.panel).toBe("front and back");
    expect(front.beta).toBeCloseTo(0.39277, 5);
    expect(front.requiredMm).toBeCloseTo(15.590, 3);
    expect(front.ok).toBe(false);
    expect(front.message).toContain("next standard glass: 19 mm");
    expect(sides.panel).toBe("sides");
    expect(sides.requiredMm).toBeCloseTo(9.422, 3);
    expect(sides.ok).toBe(true);
    // bottom: at least the thickest wall requirement (common practice)
    expect(bottom.panel).toBe("bottom");
    expect(bottom.requiredMm).toBeCloseTo(15.590, 3);
    expect(bottom.ok).toBe(false);
    expect(g.ok).toBe(false);
  });

  it("passes with 19 mm glass", () => {
    expect(checkGlass({ ...demoDesign(), panelThicknessMm: 19 }).ok).toBe(true);
  });

  it("checks a separate bottom thickness", () => {
    const g = checkGlass({ ...demoDesign(), panelThicknessMm: 19, bottomThicknessMm: 12 });
    expect(g.panels.find((p) => p.panel === "bottom")?.ok).toBe(false);
  });

  it("salt water needs slightly thicker glass", () => {
    const fresh = checkGlass(demoDesign()).panels[0].requiredMm;
    const salt = checkGlass({ ...demoDesign(), water: "salt" }).panels[0].requiredMm;
    // t ∝ √ρ: √(1023.341 / 997.047) = 1.01310 (EOS-80 vs Tanaka 2001 at 25 °C)
    expect(salt / fresh).toBeCloseTo(1.0131, 4);
  });

  it("cylinders get a wall and a bottom", () => {
    const cyl: TankDesign = { ...demoDesign(), shape: "cylinder", diameterMm: 600, heightMm: 1000, panelThicknessMm: 10 };
    const g = checkGlass(cyl);
    expect(g.panels.map((p) => p.panel)).toEqual(["wall", "bottom"]);
    expect(g.ok).toBe(true);
  });

  it("bowfronts note that the curved front is checked flat", () => {
    const bow: TankDesign = { ...demoDesign(), shape: "bowfront", lengthMm: 1200, widthMm: 500, bowDepthMm: 150, heightMm: 600 };
    expect(checkGlass(bow).panels[0].message).toContain("checked as a flat panel");
  });
});
