/**
 * Plan areas and heights of a tank design. Everything that turns a design into
 * volumes (load, glass, validation) goes through here so the three shapes are
 * handled in one place.
 */

import type { TankDesign } from "./design";

/**
 * Area of a circular segment from its chord c and sagitta s (mm², or any squared unit).
 *
 * Source: standard circle geometry (e.g. CRC Standard Mathematical Tables, "circular
 * segment"): radius R = (c²/4 + s²) / (2s); half-angle α from sin α = (c/2)/R and
 * cos α = (R − s)/R; area = R² (θ − sin θ) / 2 with θ = 2α. Using atan2 for α keeps
 * it right past a semicircle (s > c/2), where R − s turns negative.
 */
export function circularSegmentArea(chord: number, sagitta: number): number {
  if (chord <= 0 || sagitta <= 0) return 0;
  const r = (chord * chord) / 4 + sagitta * sagitta;
  const radius = r / (2 * sagitta);
  const theta = 2 * Math.atan2(chord / 2, radius - sagitta);
  return (radius * radius * (theta - Math.sin(theta))) / 2;
}

/** Bottom panel thickness, mm: the side thickness unless a separate one is given. */
export function bottomThicknessMm(design: TankDesign): number {
  return design.bottomThicknessMm ?? design.panelThicknessMm;
}

/** Overall plan extent (bounding box) of the tank, mm: what must sit on the stand. */
export function outerPlanExtentMm(design: TankDesign): { lengthMm: number; widthMm: number } {
  switch (design.shape) {
    case "rectangular":
      return { lengthMm: design.lengthMm, widthMm: design.widthMm };
    case "cylinder":
      return { lengthMm: design.diameterMm, widthMm: design.diameterMm };
    case "bowfront":
      return { lengthMm: design.lengthMm, widthMm: design.widthMm + design.bowDepthMm };
  }
}

/**
 * Plan area of a bowfront outline offset inward by panel thickness t, mm².
 *
 * The outer outline is a rectangle (length L × end width W) plus a circular
 * segment on the front with chord L and sagitta s (bow depth), radius
 * R = (L²/4 + s²)/(2s), centred yc = W + s − R from the back. Offsetting the
 * back and ends by t and the curved front by t along its radius (a curved panel
 * of even thickness) leaves, for |x| ≤ a = L/2 − t, everything from y = t up to
 * the arc of radius Ri = R − t:
 *   area = 2a(yc − t) + ∫₋ₐᵃ √(Ri² − x²) dx = 2a(yc − t) + a√(Ri² − a²) + Ri²·asin(a/Ri)
 * (the integral is the standard one for a circle's ordinate, e.g. CRC Standard
 * Mathematical Tables, integral tables). At t = 0 it equals L·W plus the segment
 * area. Valid for s ≤ L/2 (no more than a half-circle), which validateDesign enforces.
 */
export function bowfrontPlanAreaMm2(lengthMm: number, widthMm: number, bowDepthMm: number, t: number): number {
  const a = Math.max(0, lengthMm / 2 - t);
  if (bowDepthMm <= 0) return 2 * a * Math.max(0, widthMm - 2 * t);
  const r = (lengthMm * lengthMm) / 4 + bowDepthMm * bowDepthMm;
  const radius = r / (2 * bowDepthMm);
  const yc = widthMm + bowDepthMm - radius;
  const ri = radius - t;
  const arcIntegral = a * Math.sqrt(Math.max(0, ri * ri - a * a)) + ri * ri * Math.asin(Math.min(1, a / ri));
  return Math.max(0, 2 * a * (yc - t) + arcIntegral);
}

/** Plan area of the tank outline offset inward by t (t = 0: the outer outline), mm². */
function planAreaMm2(design: TankDesign, t: number): number {
  switch (design.shape) {
    case "rectangular":
      return Math.max(0, design.lengthMm - 2 * t) * Math.max(0, design.widthMm - 2 * t);
    case "cylinder": {
      // Circle area π r² (standard geometry, e.g. CRC Standard Mathematical Tables).
      const r = Math.max(0, design.diameterMm / 2 - t);
      return Math.PI * r * r;
    }
    case "bowfront":
      return bowfrontPlanAreaMm2(design.lengthMm, design.widthMm, design.bowDepthMm, t);
  }
}

/** Outer plan area of the tank, mm². */
export function outerPlanAreaMm2(design: TankDesign): number {
  return planAreaMm2(design, 0);
}

/** Internal (water-side) plan area inside the side panels, mm². */
export function innerPlanAreaMm2(design: TankDesign): number {
  return planAreaMm2(design, design.panelThicknessMm);
}

/** Height from the top of the bottom panel to the rim, mm (tanks are open-topped). */
export function internalHeightMm(design: TankDesign): number {
  return Math.max(0, design.heightMm - bottomThicknessMm(design));
}

/** Depth of water above the bottom panel, mm (before substrate is added). */
export function waterHeightMm(design: TankDesign): number {
  return Math.max(0, internalHeightMm(design) - design.waterBelowRimMm);
}

/** The smallest outer plan dimension, mm: panels thicker than half of it leave no inside. */
export function smallestPlanDimensionMm(design: TankDesign): number {
  switch (design.shape) {
    case "rectangular":
    case "bowfront":
      return Math.min(design.lengthMm, design.widthMm);
    case "cylinder":
      return design.diameterMm;
  }
}
