/**
 * Wall thickness for round (cylindrical) tanks, which carry water pressure
 * differently from flat panels: mostly in hoop tension, with bending at the base.
 */

import type { PanelMaterial } from "./design";
import { allowableStressMPa, nextStandardGlassThicknessMm, panelThicknessMessage } from "./glass-strength";
import { STANDARD_GRAVITY } from "./units";

/**
 * Poisson's ratio: soda-lime glass ~0.22, cast acrylic ~0.37 (from memory;
 * typical handbook values).
 */
const POISSON_RATIO: Record<PanelMaterial, number> = { glass: 0.22, "low-iron glass": 0.22, acrylic: 0.37 };

export interface CylinderWallInput {
  waterHeightMm: number;
  /** Outer diameter, mm. */
  diameterMm: number;
  material: PanelMaterial;
  safetyFactor?: number;
  allowableStressMPa?: number;
  enteredMm?: number;
  waterDensityKgM3?: number;
}

export interface CylinderWallResult {
  requiredMm: number;
  enteredMm: number | null;
  ok: boolean | null;
  stressMPa: number;
  allowableStressMPa: number;
  message: string;
}

/**
 * Minimum wall thickness of a round tank. The wall carries water pressure mostly
 * as hoop tension, σ = p·r/t (thin-walled cylinder), but where it is held by the
 * bottom it also bends. For a wall built in at its base, Timoshenko &
 * Woinowsky-Krieger, "Theory of Plates and Shells", §117 (cylindrical tank with
 * uniform wall thickness; from memory) give the base moment
 *   M₀ = (1 − 1/(βd)) · p·r·t / √(12(1 − ν²)),
 * so the bending stress 6M₀/t² is at most 6·p·r / (t·√(12(1 − ν²))), about 1.8× the
 * hoop stress. We drop the (1 − 1/(βd)) factor (it is below 1), which keeps the
 * result on the safe side and makes t explicit:
 *   t = 6·ρ·g·H·r / (σ_allow·√(12(1 − ν²))).
 * Handling, joints and stiffness often call for more than this strength figure.
 */
export function minimumCylinderWallThickness(input: CylinderWallInput): CylinderWallResult {
  const p = (input.waterDensityKgM3 ?? 1000) * STANDARD_GRAVITY * (input.waterHeightMm / 1000); // Pa, hydrostatic p = ρgH
  const r = input.diameterMm / 2 / 1000;
  const nu = POISSON_RATIO[input.material];
  const k = 6 / Math.sqrt(12 * (1 - nu * nu));
  const allowMPa = allowableStressMPa(input.material, input.safetyFactor, input.allowableStressMPa);
  const requiredMm = ((k * p * r) / (allowMPa * 1e6)) * 1000;
  const enteredMm = input.enteredMm ?? null;
  const stressMPa = (k * p * r) / ((enteredMm ?? requiredMm) / 1000) / 1e6;
  const suggestedMm = input.material === "acrylic" ? null : nextStandardGlassThicknessMm(requiredMm);
  const message =
    panelThicknessMessage(requiredMm, enteredMm, suggestedMm, input.material) +
    " This is the strength figure for water pressure only; curved panels' thickness is usually set by" +
    " how they are made and handled, so confirm it with the panel maker.";
  return {
    requiredMm,
    enteredMm,
    ok: enteredMm === null ? null : enteredMm >= requiredMm,
    stressMPa,
    allowableStressMPa: allowMPa,
    message,
  };
}
