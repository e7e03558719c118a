import type { RectangularTankDesign } from "@/lib/tank/design";

/**
 * The worked demo design: 1800 × 600 × 700 mm outer, 15 mm glass, water 50 mm
 * below the rim, fresh at 25 °C, 60 mm sand, 40 kg rock, 120 L sump, 90 kg stand
 * on a solid 1800 × 600 mm base.
 */
export function demoDesign(): RectangularTankDesign {
  return {
    shape: "rectangular",
    lengthMm: 1800,
    widthMm: 600,
    heightMm: 700,
    panelMaterial: "glass",
    panelThicknessMm: 15,
    waterBelowRimMm: 50,
    water: "fresh",
    temperatureC: 25,
    substrate: { type: "sand", depthMm: 60 },
    rockMassKg: 40,
    sumpVolumeL: 120,
    stand: { massKg: 90, lengthMm: 1800, widthMm: 600, footprint: { kind: "solid", lengthMm: 1800, widthMm: 600 } },
  };
}

/** A bare rectangular tank: no substrate, rock, sump or stand mass, so volumes are easy to check by hand. */
export function bareRectangular(lengthMm: number, widthMm: number, heightMm: number, thicknessMm: number): RectangularTankDesign {
  return {
    shape: "rectangular",
    lengthMm,
    widthMm,
    heightMm,
    panelMaterial: "glass",
    panelThicknessMm: thicknessMm,
    waterBelowRimMm: 10,
    water: "fresh",
    temperatureC: 25,
    substrate: { type: "none", depthMm: 0 },
    rockMassKg: 0,
    sumpVolumeL: 0,
    stand: { massKg: 0, lengthMm, widthMm, footprint: { kind: "solid", lengthMm, widthMm } },
  };
}
