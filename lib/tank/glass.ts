/**
 * Minimum panel thickness for the water pressure on a tank's walls. A screening
 * check for the designer: the panel maker and, for large tanks, an engineer
 * confirm the final figure.
 */

import type { PanelMaterial, TankDesign } from "./design";
import { bottomThicknessMm, internalHeightMm } from "./geometry";
import { minimumCylinderWallThickness } from "./glass-cylinder";
import { allowableStressMPa, nextStandardGlassThicknessMm, panelThicknessMessage } from "./glass-strength";
import { STANDARD_GRAVITY } from "./units";
import { waterDensity } from "./water-density";

/**
 * Bending coefficient β by panel length / water height, for a rectangular plate
 * under hydrostatic (linearly increasing) load, simply supported on the bottom and
 * both vertical edges with the top edge free, maximum stress σ = β·ρ·g·H³ / t².
 * Source: the coefficients commonly quoted for aquarium glass, taken from the plate
 * tables in Roark's Formulas for Stress and Strain (Table 11.4, rectangular plates
 * under linearly varying load) and Timoshenko & Woinowsky-Krieger, "Theory of
 * Plates and Shells". Values from memory.
 */
export const BETA_TABLE: ReadonlyArray<readonly [ratio: number, beta: number]> = [
  [0.5, 0.085],
  [0.667, 0.1156],
  [1.0, 0.16],
  [1.5, 0.26],
  [2.0, 0.34],
  [2.5, 0.38],
  [3.0, 0.43],
];

/** β for a length/height ratio: linear interpolation in BETA_TABLE, clamped to its ends. */
export function betaForRatio(ratio: number): number {
  const first = BETA_TABLE[0];
  const last = BETA_TABLE[BETA_TABLE.length - 1];
  if (ratio <= first[0]) return first[1];
  if (ratio >= last[0]) return last[1];
  for (let i = 1; i < BETA_TABLE.length; i++) {
    const [r1, b1] = BETA_TABLE[i];
    if (ratio <= r1) {
      const [r0, b0] = BETA_TABLE[i - 1];
      return b0 + ((b1 - b0) * (ratio - r0)) / (r1 - r0);
    }
  }
  return last[1];
}

export interface PanelThicknessInput {
  /** Depth of water at the bottom of the panel, mm. */
  waterHeightMm: number;
  /** Horizontal length of the panel, mm. */
  panelLengthMm: number;
  material: PanelMaterial;
  /** Applied to glass's modulus of rupture; ignored for acrylic unless allowableStressMPa is given. */
  safetyFactor?: number;
  /** Replaces the material's default allowable stress (already including any safety factor). */
  allowableStressMPa?: number;
  /** Thickness the design uses, mm, to compare against. */
  enteredMm?: number;
  /** Defaults to 1000 kg/m³, the figure aquarium tables use; pass the real density for salt water. */
  waterDensityKgM3?: number;
}

export interface PanelThicknessResult {
  requiredMm: number;
  enteredMm: number | null;
  /** Whether the entered thickness is enough; null when none was entered. */
  ok: boolean | null;
  beta: number;
  /** Peak bending stress in the entered panel (or the required one when none entered), MPa. */
  stressMPa: number;
  allowableStressMPa: number;
  /** Next standard float glass thickness; null for acrylic or past 25 mm. */
  suggestedMm: number | null;
  message: string;
}

/**
 * Minimum thickness of a wall panel under water pressure:
 *   t = √(β · ρ · g · H³ / σ_allow),  σ_allow = modulus of rupture / safety factor,
 * from the plate-bending result σ = β·ρ·g·H³ / t² (Roark's Formulas for Stress and
 * Strain, Table 11.4; see BETA_TABLE). β comes from the panel's length/water-height
 * ratio, clamped to the table's 0.5–3.0 range.
 */
export function minimumPanelThickness(input: PanelThicknessInput): PanelThicknessResult {
  const h = input.waterHeightMm / 1000;
  const ratio = input.panelLengthMm / input.waterHeightMm;
  const beta = betaForRatio(ratio);
  const rho = input.waterDensityKgM3 ?? 1000;
  const allowMPa = allowableStressMPa(input.material, input.safetyFactor, input.allowableStressMPa);
  const loadTerm = beta * rho * STANDARD_GRAVITY * h ** 3; // N (per the σ = term / t² form)
  const requiredMm = Math.sqrt(loadTerm / (allowMPa * 1e6)) * 1000;
  const enteredMm = input.enteredMm ?? null;
  const tM = (enteredMm ?? requiredMm) / 1000;
  const stressMPa = loadTerm / (tM * tM) / 1e6;
  const suggestedMm = input.material === "acrylic" ? null : nextStandardGlassThicknessMm(requiredMm);
  let message = panelThicknessMessage(requiredMm, enteredMm, suggestedMm, input.material);
  if (ratio > BETA_TABLE[BETA_TABLE.length - 1][0]) {
    // β keeps rising past the table, so the clamped figure understates what is needed.
    message +=
      " The panel is more than 3 times as long as the water is deep, past the coefficient table: this figure is too low." +
      " Long tanks need a centre brace; have the panel maker confirm.";
  }
  return {
    requiredMm,
    enteredMm,
    ok: enteredMm === null ? null : enteredMm >= requiredMm,
    beta,
    stressMPa,
    allowableStressMPa: allowMPa,
    suggestedMm,
    message,
  };
}

export type PanelName = "front and back" | "sides" | "bottom" | "wall";

export interface PanelCheck {
  panel: PanelName;
  requiredMm: number;
  enteredMm: number;
  ok: boolean;
  /** Plate coefficient used; null where the panel isn't checked as a flat wall plate. */
  beta: number | null;
  /** Peak stress in the entered panel, MPa; null for the bottom's rule of thumb. */
  stressMPa: number | null;
  message: string;
}

export interface GlassCheck {
  /** True only when every panel passes. */
  ok: boolean;
  panels: PanelCheck[];
}

/**
 * Checks every panel of a design for water pressure. Walls are checked as if filled
 * to the rim: the set level is easy to overshoot during a fill, and a wall must
 * survive it. Flat walls use minimumPanelThickness (Roark Table 11.4 coefficients);
 * a bowfront's curved front is checked as a flat panel of the same length, which
 * is on the safe side because curvature stiffens it; round walls use
 * minimumCylinderWallThickness. The bottom uses a common practice rule: at least as
 * thick as the thickest wall needs, assuming it sits flat on a level, continuous stand top.
 */
export function checkGlass(design: TankDesign): GlassCheck {
  const heightMm = internalHeightMm(design);
  const rho = waterDensity(design.water, design.temperatureC, design.salinityPsu);
  const t = design.panelThicknessMm;
  const walls: PanelCheck[] = [];

  const common = { waterHeightMm: heightMm, material: design.panelMaterial, enteredMm: t, waterDensityKgM3: rho };
  if (design.shape === "cylinder") {
    const r = minimumCylinderWallThickness({ ...common, diameterMm: design.diameterMm });
    walls.push({
      panel: "wall",
      requiredMm: r.requiredMm,
      enteredMm: t,
      ok: r.requiredMm <= t,
      beta: null,
      stressMPa: r.stressMPa,
      message: r.message,
    });
  } else {
    const spans: Array<[PanelName, number]> = [
      ["front and back", design.lengthMm],
      ["sides", design.widthMm],
    ];
    for (const [panel, lengthMm] of spans) {
      const r = minimumPanelThickness({ ...common, panelLengthMm: lengthMm });
      const curvedNote =
        design.shape === "bowfront" && panel === "front and back"
          ? " The curved front is checked as a flat panel, which is on the safe side."
          : "";
      walls.push({
        panel,
        requiredMm: r.requiredMm,
        enteredMm: t,
        ok: r.requiredMm <= t,
        beta: r.beta,
        stressMPa: r.stressMPa,
        message: r.message + curvedNote,
      });
    }
  }

  const bottomRequiredMm = Math.max(...walls.map((w) => w.requiredMm));
  const bottomEnteredMm = bottomThicknessMm(design);
  const bottomOk = bottomEnteredMm >= bottomRequiredMm;
  const bottom: PanelCheck = {
    panel: "bottom",
    requiredMm: bottomRequiredMm,
    enteredMm: bottomEnteredMm,
    ok: bottomOk,
    beta: null,
    stressMPa: null,
    message:
      `Needs at least ${bottomRequiredMm.toFixed(1)} mm, as thick as the thickest wall needs; ` +
      `${bottomEnteredMm} mm entered is ${bottomOk ? "enough" : "too thin"}. ` +
      "This assumes the bottom sits flat on a level, continuous stand top; a bottom carried only at its edges needs its own design.",
  };

  const panels = [...walls, bottom];
  return { ok: panels.every((p) => p.ok), panels };
}
