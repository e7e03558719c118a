/**
 * Strength figures for tank panels, shared by the flat-panel and round-wall
 * checks, and the plain-words verdict both show.
 */

import type { PanelMaterial } from "./design";

/** Modulus of rupture of annealed float glass, ~19.3 MPa (≈ 2800 psi; from memory, common practice for aquarium design). */
export const FLOAT_GLASS_MODULUS_OF_RUPTURE_MPA = 19.3;

/** Safety factor applied to glass's modulus of rupture (common practice for aquariums). */
export const DEFAULT_GLASS_SAFETY_FACTOR = 3.8;

/**
 * Long-term design stress for cast acrylic, MPa. Acrylic creeps under constant
 * load, so sheet makers quote a continuous-load design stress (roughly 5–10 MPa,
 * from memory) instead of a strength to divide by a safety factor; we take the
 * low end and apply no further factor.
 */
export const ACRYLIC_DESIGN_STRESS_MPA = 5;

/**
 * Nominal float glass thicknesses, mm (EN 572-2, Glass in building: float glass;
 * list from memory). Thicker panels are laminated or specially made.
 */
export const STANDARD_GLASS_THICKNESSES_MM: readonly number[] = [3, 4, 5, 6, 8, 10, 12, 15, 19, 25];

/** Allowable stress, MPa: an explicit figure wins; otherwise glass's rupture modulus / SF, or acrylic's design stress. */
export function allowableStressMPa(material: PanelMaterial, safetyFactor = DEFAULT_GLASS_SAFETY_FACTOR, override?: number): number {
  if (override !== undefined) return override;
  // Low-iron glass is float glass with less iron oxide; strength is the same.
  return material === "acrylic" ? ACRYLIC_DESIGN_STRESS_MPA : FLOAT_GLASS_MODULUS_OF_RUPTURE_MPA / safetyFactor;
}

/** Smallest standard float glass thickness at or above the requirement, mm; null past 25 mm. */
export function nextStandardGlassThicknessMm(requiredMm: number): number | null {
  return STANDARD_GLASS_THICKNESSES_MM.find((t) => t >= requiredMm) ?? null;
}

/** Plain-words verdict shared by the flat-panel and round-wall checks. */
export function panelThicknessMessage(requiredMm: number, enteredMm: number | null, suggestedMm: number | null, material: PanelMaterial): string {
  const need = `Needs at least ${requiredMm.toFixed(1)} mm`;
  const standard = suggestedMm !== null ? ` (next standard glass: ${suggestedMm} mm)` : "";
  let text: string;
  if (enteredMm === null) text = `${need}${standard}.`;
  else if (enteredMm >= requiredMm) text = `${need}; ${enteredMm} mm entered is enough.`;
  else text = `${need}; ${enteredMm} mm entered is too thin${standard}.`;
  if (material === "acrylic") {
    text += " Acrylic bows out under load far more than glass, and its thickness is often set by how far it bows, which this check doesn't cover: get the panel maker's figure.";
  } else if (suggestedMm === null) {
    text += " That is past standard float glass: laminated or specially made panels are needed.";
  }
  return text;
}
