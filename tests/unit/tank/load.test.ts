import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { TankDesign } from "@/lib/tank/design";
import { computeLoad } from "@/lib/tank/load";
import { bareRectangular, demoDesign } from "./fixtures";

describe("computeLoad: worked demo (1800 × 600 × 700 mm, 15 mm glass)", () => {
  const load = computeLoad(demoDesign());

  it("volumes", () => {
    // Inside: (1800 − 2·15) × (600 − 2·15) = 1770 × 570 = 1 008 900 mm² = 1.0089 m²; height 700 − 15 = 685 mm
    // gross = 1.0089 m² × 0.685 m = 0.6910965 m³ = 691.0965 L (prism volume)
    expect(load.grossVolumeL).toBeCloseTo(691.0965, 6);
    // 691.0965 / 3.785411784 L per US gal (NIST Handbook 44) = 182.568 gal
    expect(load.grossVolumeGal).toBeCloseTo(182.568, 3);
    // water space = 1.0089 × (685 − 50) mm = 640.6515 L
    // sand bed = 1.0089 m² × 0.060 m = 60.534 L; grains = 60.534 × (1 − 0.4 porosity, common practice) = 36.3204 L
    // rock = 40 kg / 2600 kg/m³ (solid stone, from memory) = 15.3846 L
    // net = 640.6515 − 36.3204 − 15.3846 = 588.9465 L
    expect(load.substrateVolumeL).toBeCloseTo(60.534, 6);
    expect(load.rockVolumeL).toBeCloseTo(15.3846, 4);
    expect(load.netVolumeL).toBeCloseTo(588.9465, 4);
    expect(load.netVolumeGal).toBeCloseTo(155.583, 3); // 588.9465 / 3.785411784
  });

  it("masses", () => {
    // ρ(25 °C) = 997.0470 kg/m³ (Tanaka et al. 2001 table)
    expect(load.waterDensityKgM3).toBeCloseTo(997.047, 3);
    // 588.9465 L × 0.997047 kg/L = 587.207 kg
    expect(load.waterMassKg).toBeCloseTo(587.207, 2);
    // panels = outer solid − cavity = 1.8 × 0.6 × 0.7 − 0.6910965 = 0.0649035 m³
    //   (cross-check by panel: bottom 1800×600×15 = 16.2 L; front+back 2×1800×685×15 = 36.99 L;
    //    ends 2×570×685×15 = 11.7135 L; total 64.9035 L)
    // × 2500 kg/m³ (EN 572-1 soda-lime glass) = 162.259 kg
    expect(load.glassMassKg).toBeCloseTo(162.25875, 4);
    // 60.534 L × 1.6 kg/L (sand bulk density, common practice) = 96.854 kg
    expect(load.substrateMassKg).toBeCloseTo(96.8544, 4);
    // 120 L × 0.997047 = 119.646 kg
    expect(load.sumpWaterMassKg).toBeCloseTo(119.6456, 3);
    expect(load.rockMassKg).toBe(40);
    expect(load.standMassKg).toBe(90);
    // 587.207 + 162.259 + 96.854 + 40 + 119.646 + 90 = 1095.966 kg: about 1.1 t on the floor
    expect(load.totalInstalledMassKg).toBeCloseTo(1095.966, 2);
  });

  it("floor pressure", () => {
    // 1095.966 kg × 9.80665 m/s² (3rd CGPM standard gravity) = 10.74776 kN over 1.8 × 0.6 = 1.08 m²
    expect(load.footprintAreaM2).toBeCloseTo(1.08, 12);
    expect(load.floorPressureKPa).toBeCloseTo(9.9516, 3); // 10.74776 / 1.08
    expect(load.floorPressurePsf).toBeCloseTo(207.84, 2); // 9.9516 / 0.0478802589803 (NIST Handbook 44 derived)
    expect(load.loadPerLegKg).toBeNull();
    expect(load.loadPerLegKN).toBeNull();
    expect(load.legContactPressureKPa).toBeNull();
  });
});

describe("computeLoad: variations on the demo", () => {
  it("salt water is heavier by the density ratio", () => {
    const salt = computeLoad({ ...demoDesign(), water: "salt" });
    // EOS-80 at 35 psu, 25 °C: 1023.3412 kg/m³ (see water-density tests)
    expect(salt.waterDensityKgM3).toBeCloseTo(1023.3412, 3);
    expect(salt.waterMassKg).toBeCloseTo(588.9465 * 1.0233412, 2); // 602.693 kg
  });

  it("acrylic panels weigh 1190 kg/m³", () => {
    // 0.0649035 m³ × 1190 kg/m³ (acrylic, from memory) = 77.235 kg
    expect(computeLoad({ ...demoDesign(), panelMaterial: "acrylic" }).glassMassKg).toBeCloseTo(77.235, 3);
  });

  it("legs: pressure over the outline, point load per leg", () => {
    const d = demoDesign();
    const load = computeLoad({
      ...d,
      stand: { ...d.stand, footprint: { kind: "legs", count: 6, legLengthMm: 100, legWidthMm: 100 } },
    });
    expect(load.footprintAreaM2).toBeCloseTo(1.08, 12); // stand outline 1800 × 600
    expect(load.floorPressureKPa).toBeCloseTo(9.9516, 3);
    expect(load.loadPerLegKg).toBeCloseTo(182.661, 3); // 1095.966 / 6
    expect(load.loadPerLegKN).toBeCloseTo(1.79129, 4); // 10.74776 kN / 6
    expect(load.legContactPressureKPa).toBeCloseTo(179.129, 2); // 1.79129 kN / (0.1 × 0.1 m²)
  });

  it("gravel and aqua soil use their own bulk density and porosity", () => {
    const d = demoDesign();
    const gravel = computeLoad({ ...d, substrate: { type: "gravel", depthMm: 60 } });
    expect(gravel.substrateMassKg).toBeCloseTo(60.534 * 1.5, 4); // 1500 kg/m³, common practice
    expect(gravel.netVolumeL).toBeCloseTo(588.9465, 4); // same 0.4 porosity as sand
    const soil = computeLoad({ ...d, substrate: { type: "aqua soil", depthMm: 60 } });
    expect(soil.substrateMassKg).toBeCloseTo(60.534, 4); // 1000 kg/m³, from memory
    expect(soil.netVolumeL).toBeCloseTo(640.6515 - 60.534 * 0.5 - 15.3846, 4); // porosity 0.5: 594.9999 L
  });

  it("no substrate means no bed, even if a depth was left in the form", () => {
    const none = computeLoad({ ...demoDesign(), substrate: { type: "none", depthMm: 60 } });
    expect(none.substrateVolumeL).toBe(0);
    expect(none.substrateMassKg).toBe(0);
    expect(none.netVolumeL).toBeCloseTo(640.6515 - 15.3846, 4); // water space less the rock only
  });
});

describe("computeLoad: other shapes", () => {
  it("cylinder on four legs", () => {
    const d = demoDesign();
    const cyl: TankDesign = {
      ...d,
      shape: "cylinder",
      diameterMm: 1000,
      heightMm: 1200,
      panelThicknessMm: 12,
      waterBelowRimMm: 100,
      substrate: { type: "none", depthMm: 0 },
      rockMassKg: 0,
      sumpVolumeL: 0,
      stand: { massKg: 90, lengthMm: 1000, widthMm: 1000, footprint: { kind: "legs", count: 4, legLengthMm: 100, legWidthMm: 100 } },
    };
    const load = computeLoad(cyl);
    // inner radius 500 − 12 = 488 mm; π r² = 748 151.4 mm² (circle area); height 1200 − 12 = 1188 mm
    // gross = 748 151.4 × 1188 = 888.804 L; net = 748 151.4 × (1188 − 100) = 813.989 L
    expect(load.grossVolumeL).toBeCloseTo(888.804, 3);
    expect(load.netVolumeL).toBeCloseTo(813.989, 3);
    // wall + bottom disc = π(500² × 1200 − 488² × 1188) mm³ = 53.674 L × 2.5 kg/L (EN 572-1) = 134.185 kg
    expect(load.glassMassKg).toBeCloseTo(134.185, 3);
    // 813.989 × 0.997047 + 134.185 + 90 = 1035.770 kg; per leg ÷ 4 = 258.942 kg
    expect(load.totalInstalledMassKg).toBeCloseTo(1035.770, 2);
    expect(load.loadPerLegKg).toBeCloseTo(258.942, 2);
    expect(load.floorPressureKPa).toBeCloseTo(10.1574, 3); // 1035.770 × 9.80665 / 1000 / 1.0 m²
  });

  it("bowfront: rectangle plus the front segment, inside the panels", () => {
    const d = demoDesign();
    const bow: TankDesign = {
      ...d,
      shape: "bowfront",
      lengthMm: 1200,
      widthMm: 500,
      bowDepthMm: 150,
      heightMm: 600,
      panelThicknessMm: 10,
      substrate: { type: "none", depthMm: 0 },
      rockMassKg: 0,
      sumpVolumeL: 0,
      stand: { ...d.stand, widthMm: 650 },
    };
    const load = computeLoad(bow);
    // R = (600² + 150²)/300 = 1275 mm; centre yc = 500 + 150 − 1275 = −625; a = 600 − 10 = 590; Ri = 1265
    // inner area = 2·590·(−625 − 10) + 590·√(1265² − 590²) + 1265²·asin(590/1265)
    //            = −749 300 + 660 200.5 + 776 461.5 = 687 362.0 mm²  (geometry.ts, bowfrontPlanAreaMm2)
    // gross = 687 362.0 × (600 − 10) = 405.544 L; net = 687 362.0 × 540 = 371.175 L
    expect(load.grossVolumeL).toBeCloseTo(405.544, 3);
    expect(load.netVolumeL).toBeCloseTo(371.175, 3);
    // Rough hand check: 1180 × 480 rectangle + segment(1180, 150) = 685 912 mm², within 0.25 %
    expect(Math.abs(load.grossVolumeL / ((685912 * 590) / 1e6) - 1)).toBeLessThan(0.0025);
  });
});

describe("computeLoad: properties", () => {
  const dims = fc.record({
    l: fc.integer({ min: 300, max: 4000 }),
    w: fc.integer({ min: 300, max: 1500 }),
    h: fc.integer({ min: 300, max: 1500 }),
    t: fc.integer({ min: 4, max: 25 }),
    grow: fc.integer({ min: 1, max: 500 }),
  });

  it("gross and net volume grow with each dimension", () => {
    fc.assert(
      fc.property(dims, ({ l, w, h, t, grow }) => {
        const base = computeLoad(bareRectangular(l, w, h, t));
        for (const bigger of [
          bareRectangular(l + grow, w, h, t),
          bareRectangular(l, w + grow, h, t),
          bareRectangular(l, w, h + grow, t),
        ]) {
          const load = computeLoad(bigger);
          expect(load.grossVolumeL).toBeGreaterThan(base.grossVolumeL);
          expect(load.netVolumeL).toBeGreaterThan(base.netVolumeL);
        }
      }),
    );
  });

  it("net never exceeds gross, and all masses are non-negative", () => {
    fc.assert(
      fc.property(dims, fc.integer({ min: 0, max: 200 }), fc.integer({ min: 0, max: 100 }), ({ l, w, h, t }, sand, rock) => {
        const d: TankDesign = { ...bareRectangular(l, w, h, t), substrate: { type: "sand", depthMm: sand }, rockMassKg: rock };
        const load = computeLoad(d);
        expect(load.netVolumeL).toBeLessThanOrEqual(load.grossVolumeL);
        expect(load.netVolumeL).toBeGreaterThanOrEqual(0);
        expect(load.glassMassKg).toBeGreaterThan(0);
      }),
    );
  });

  it("mass grows with water density (salinity)", () => {
    fc.assert(
      fc.property(dims, fc.double({ min: 0, max: 40, noNaN: true }), ({ l, w, h, t }, s) => {
        const salty = (psu: number): TankDesign => ({ ...bareRectangular(l, w, h, t), water: "salt", salinityPsu: psu });
        expect(computeLoad(salty(s + 1)).totalInstalledMassKg).toBeGreaterThan(computeLoad(salty(s)).totalInstalledMassKg);
      }),
    );
  });

  it("glass panels outweigh acrylic panels of the same size", () => {
    fc.assert(
      fc.property(dims, ({ l, w, h, t }) => {
        const glass = computeLoad(bareRectangular(l, w, h, t));
        const acrylic = computeLoad({ ...bareRectangular(l, w, h, t), panelMaterial: "acrylic" });
        // 2500 / 1190 kg/m³ (EN 572-1 glass; acrylic from memory)
        expect(glass.glassMassKg / acrylic.glassMassKg).toBeCloseTo(2500 / 1190, 9);
      }),
    );
  });
});

describe("floor area under a solid base", () => {
  it("uses the solid base's own size, not the stand's outline, where they differ", () => {
    // Stand outline 1800 × 600 mm, but it stands on a solid plinth of 1500 × 400 mm = 0.6 m².
    const d = demoDesign();
    const load = computeLoad({ ...d, stand: { ...d.stand, footprint: { kind: "solid", lengthMm: 1500, widthMm: 400 } } });
    expect(load.footprintAreaM2).toBeCloseTo(0.6, 12);
    // pressure = total weight / base area, not / the outline's 1.08 m²
    expect(load.floorPressureKPa).toBeCloseTo((load.totalInstalledMassKg * 9.80665) / 1000 / 0.6, 9);
    expect(load.loadPerLegKg).toBeNull();
  });
});
