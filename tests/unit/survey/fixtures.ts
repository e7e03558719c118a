import type { SiteSurvey } from "@/lib/survey/site-survey.schema";
import type { StoredDesign } from "@/lib/survey/load-check";
import type { RectangularTankDesign } from "@/lib/tank/design";

/** A finished survey of a ground-floor living room on a slab, in SI. */
export function completeSurvey(): SiteSurvey {
  return {
    roomUse: "living",
    floorType: "concrete slab",
    floorLevel: "ground",
    roomLengthMm: 5200,
    roomWidthMm: 4100,
    ceilingHeightMm: 2500,
    doorWidthMm: 820,
    doorHeightMm: 2040,
    stairs: false,
    turns: 1,
    outletsWithinReach: 2,
    groundFaultProtection: "yes",
    dedicatedCircuit: "no",
    waterSupplyDistanceMm: 6000,
    drainDistanceMm: 7500,
    sunExposure: "some",
    notes: "Fixture survey.",
  };
}

/** The same room on an upper floor of timber joists: 3.6 m span at 400 mm, the stand 300 mm off a bearing wall, across the joists. */
export function joistSurvey(): SiteSurvey {
  return {
    ...completeSurvey(),
    floorType: "timber joists",
    floorLevel: "upper",
    joistDirection: "perpendicular",
    joistSpanMm: 3600,
    joistSpacingMm: 400,
    bearingWallDistanceMm: 300,
  };
}

/**
 * A small shrimp tank, 600 × 300 × 300 mm in 6 mm glass, on a wide low cabinet whose solid base
 * spreads the weight: it screens under a living-room floor's rating.
 */
export function lightDesign(): StoredDesign & RectangularTankDesign {
  return {
    shape: "rectangular",
    lengthMm: 600,
    widthMm: 300,
    heightMm: 300,
    panelMaterial: "glass",
    topEdge: "braced",
    panelThicknessMm: 6,
    waterBelowRimMm: 30,
    water: "fresh",
    temperatureC: 24,
    substrate: { type: "aqua soil", depthMm: 40 },
    rockMassKg: 3,
    sumpVolumeL: 0,
    stand: { massKg: 30, lengthMm: 1200, widthMm: 600, heightMm: 700, footprint: { kind: "solid", lengthMm: 1200, widthMm: 600 } },
  };
}

/** A deep reef tank: 1800 × 600 × 750 mm, 19 mm glass, with a sump. Over a living-room floor's rating. */
export function heavyDesign(): StoredDesign & RectangularTankDesign {
  return {
    shape: "rectangular",
    lengthMm: 1800,
    widthMm: 600,
    heightMm: 750,
    panelMaterial: "low-iron glass",
    topEdge: "braced",
    panelThicknessMm: 19,
    waterBelowRimMm: 40,
    water: "salt",
    temperatureC: 25,
    substrate: { type: "sand", depthMm: 50 },
    rockMassKg: 60,
    sumpVolumeL: 150,
    stand: { massKg: 120, lengthMm: 1800, widthMm: 600, heightMm: 900, footprint: { kind: "legs", count: 6, legLengthMm: 100, legWidthMm: 100 } },
  };
}
