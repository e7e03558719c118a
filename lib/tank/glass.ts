/**
 * Minimum panel thickness for the water pressure on a tank's walls. A screening
 * check for the designer: the panel maker and, for large tanks, an engineer
 * confirm the final figure.
 */

import type { PanelMaterial, TankDesign } from "./design";
import { bottomThicknessMm, internalHeightMm } from "./geometry";
import { minimumCylinderWallThickness } from "./glass-cylinder";
import { GLASS_CAUTIONS } from "./cautions";
import {
  allowableStressMPa,
  nextStandardGlassThicknessMm,
  panelThicknessMessage,
} from "./glass-strength";
import { STANDARD_GRAVITY } from "./units";
import { waterDensity } from "./water-density";

/** How the top edge of a wall panel is held. */
export type TopEdge = "free" | "braced";
export const TOP_EDGES: readonly TopEdge[] = ["free", "braced"];

/** A plate coefficient table: ratio a/b → β, for σ_max = β·q·b²/t². */
export type CoefficientTable = ReadonlyArray<readonly [ratio: number, beta: number]>;

/*
 * Plate coefficients from Roark's Formulas for Stress and Strain, 7th ed. (Young & Budynas),
 * Table 11.4, rectangular plates of constant thickness. Every case there gives the peak bending
 * stress as σ_max = β·q·b²/t², where q is the largest pressure of the load (for water: the
 * pressure at the bottom, q = ρ·g·H) and b is the length named in each case. Values recalled
 * from memory (Table 11.4, cases named below); tests/unit/tank/plate-series.ts checks each one
 * against an independent series (Lévy) solution of the same plate, within a few per cent.
 */

/**
 * Case 1e, all four edges simply supported, load increasing uniformly along the width b (the
 * short side). For a wall at least as long as it is deep: b = water height H, a = panel length L,
 * ratio a/b = L/H, σ = β·q·H²/t². From memory (Roark 7th ed., Table 11.4, case 1e).
 */
export const BRACED_WIDE_TABLE: CoefficientTable = [
  [1.0, 0.16],
  [1.5, 0.26],
  [2.0, 0.32],
  [2.5, 0.35],
  [3.0, 0.36],
  [3.5, 0.37],
  [4.0, 0.37],
];

/**
 * Case 1d, all four edges simply supported, load increasing uniformly along the length a (the
 * long side). For a wall deeper than it is long: a = water height H, b = panel length L,
 * ratio a/b = H/L, σ = β·q·L²/t². From memory (Roark 7th ed., Table 11.4, case 1d).
 */
export const BRACED_TALL_TABLE: CoefficientTable = [
  [1.0, 0.16],
  [1.5, 0.26],
  [2.0, 0.34],
  [2.5, 0.38],
  [3.0, 0.43],
  [3.5, 0.47],
  [4.0, 0.49],
];

/**
 * Case 10, three edges simply supported and one edge (b) free, load decreasing uniformly from
 * the edge opposite the free edge to zero at the free edge: an open-top wall, bottom and both
 * ends held, top free. b = the free edge = panel length L, a = water height H, ratio a/b = H/L,
 * σ = β·q·L²/t² with q = ρ·g·H at the bottom. From memory (Roark 7th ed., Table 11.4, case 10,
 * the linearly varying load; the entries for a/b ≥ 2 are left out because we can't vouch for
 * them from memory).
 */
export const FREE_TOP_TABLE: CoefficientTable = [
  [0.5, 0.11],
  [2 / 3, 0.16], // printed as 0.667
  [1.0, 0.2],
  [1.5, 0.28],
];

/** β at a ratio by linear interpolation in a table; null outside the table's ratios. */
export function interpolateTable(table: CoefficientTable, ratio: number): number | null {
  if (!(ratio >= table[0][0] && ratio <= table[table.length - 1][0])) return null;
  // Stops at the last entry at the latest: the ratio is no more than the last entry's.
  let i = 1;
  while (ratio > table[i][0]) i++;
  const [r0, b0] = table[i - 1];
  const [r1, b1] = table[i];
  return b0 + ((b1 - b0) * (ratio - r0)) / (r1 - r0);
}

/** The coefficient used for one wall, with the plate case and the length b it multiplies. */
export interface PlateCoefficient {
  beta: number;
  /** The length squared in σ = β·q·b²/t², mm. */
  bMm: number;
  /** The table's ratio a/b for this wall. */
  ratio: number;
  /** Which case of Roark Table 11.4 gave β. */
  plateCase: "10" | "1d" | "1e";
  /** The wall is past the table's ratios: β is the table's end value and the result a lower bound. */
  beyondTable: boolean;
}

function fromTable(table: CoefficientTable, ratio: number): { beta: number; beyondTable: boolean } {
  const inside = interpolateTable(table, ratio);
  if (inside !== null) return { beta: inside, beyondTable: false };
  // Stryker disable next-line EqualityOperator: only reached when the ratio is outside the table, so it never equals the first entry's ratio
  const end = ratio < table[0][0] ? table[0] : table[table.length - 1];
  return { beta: end[1], beyondTable: true };
}

/**
 * The plate coefficient for a wall of length L holding water of depth H.
 *
 * Held on four edges ("braced"): case 1e when L ≥ H (b = H), case 1d when H > L (b = L).
 * Open top ("free"): case 10 with b = L and a/b = H/L. Past case 10's table on the tall side
 * (H/L > 1.5) the free edge is far from where the stress peaks and the plate tends to the
 * four-edge case 1d; a plate with one support fewer can't carry more, so we take the larger of
 * the two and flag it as past the table.
 */
export function plateCoefficient(panelLengthMm: number, waterHeightMm: number, topEdge: TopEdge): PlateCoefficient {
  const L = panelLengthMm;
  const H = waterHeightMm;
  if (topEdge === "braced") {
    if (L >= H) return { ...fromTable(BRACED_WIDE_TABLE, L / H), bMm: H, ratio: L / H, plateCase: "1e" };
    return { ...fromTable(BRACED_TALL_TABLE, H / L), bMm: L, ratio: H / L, plateCase: "1d" };
  }
  const ratio = H / L;
  const free = fromTable(FREE_TOP_TABLE, ratio);
  // Stryker disable next-line EqualityOperator: at a ratio equal to the table's last entry free.beyondTable is false, so ">=" can't change the outcome
  if (free.beyondTable && ratio > FREE_TOP_TABLE[FREE_TOP_TABLE.length - 1][0]) {
    const braced = fromTable(BRACED_TALL_TABLE, ratio);
    return { beta: Math.max(free.beta, braced.beta), bMm: L, ratio, plateCase: braced.beta > free.beta ? "1d" : "10", beyondTable: true };
  }
  return { ...free, bMm: L, ratio, plateCase: "10" };
}

export interface PanelThicknessInput {
  /** Depth of water at the bottom of the panel, mm. */
  waterHeightMm: number;
  /** Horizontal length of the panel, mm. */
  panelLengthMm: number;
  material: PanelMaterial;
  /** How the top edge is held; "free" (open top, rimless) when not given. */
  topEdge?: TopEdge;
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
  /** The length squared in σ = β·q·b²/t², mm. */
  bMm: number;
  plateCase: PlateCoefficient["plateCase"];
  topEdge: TopEdge;
  /** Past the table: requiredMm is a lower bound and the panel needs a brace or the maker's figure. */
  beyondTable: boolean;
  /** Peak bending stress in the entered panel (or the required one when none entered), MPa. */
  stressMPa: number;
  allowableStressMPa: number;
  /** Next standard float glass thickness; null for acrylic or past 25 mm. */
  suggestedMm: number | null;
  /** The advice in the message, without figures. */
  notes: string[];
  message: string;
}

const CYLINDER_NOTE =
  "This is the strength figure for water pressure only; curved panels' thickness is usually set by how they are made and handled, so confirm it with the panel maker.";

/** Advice about the material that goes with every thickness, without figures. */
function materialNotes(material: PanelMaterial, requiredMm: number): string[] {
  if (material === "acrylic")
    return ["Acrylic bows out under load far more than glass, and its thickness is often set by how far it bows, which this check doesn't cover: get the panel maker's figure."];
  if (nextStandardGlassThicknessMm(requiredMm) === null) return ["That is past standard float glass: laminated or specially made panels are needed."];
  return [];
}

/**
 * Minimum thickness of a wall panel under water pressure, from σ = β·q·b²/t² (Roark 7th ed.,
 * Table 11.4; see plateCoefficient for which case, b and ratio):
 *   q = ρ·g·H (pressure at the bottom), t = b·√(β·q / σ_allow),
 *   σ_allow = modulus of rupture / safety factor (glass) or the design stress (acrylic).
 * Conversion to the form aquarium tables use, σ = β′·ρ·g·H³/t²: with b = H (case 1e),
 * β′ = β; with b = L (cases 10 and 1d), β·ρ·g·H·L² = β·(L/H)²·ρ·g·H³, so β′ = β·(L/H)².
 */
export function minimumPanelThickness(input: PanelThicknessInput): PanelThicknessResult {
  const topEdge = input.topEdge ?? "free";
  const coefficient = plateCoefficient(input.panelLengthMm, input.waterHeightMm, topEdge);
  const rho = input.waterDensityKgM3 ?? 1000;
  const q = rho * STANDARD_GRAVITY * (input.waterHeightMm / 1000); // Pa, hydrostatic pressure at the bottom
  const b = coefficient.bMm / 1000;
  const allowMPa = allowableStressMPa(input.material, input.safetyFactor, input.allowableStressMPa);
  const loadTerm = coefficient.beta * q * b * b; // N, so that σ = loadTerm / t²
  const requiredMm = Math.sqrt(loadTerm / (allowMPa * 1e6)) * 1000;
  const enteredMm = input.enteredMm ?? null;
  const tM = (enteredMm ?? requiredMm) / 1000;
  const stressMPa = loadTerm / (tM * tM) / 1e6;
  const suggestedMm = input.material === "acrylic" ? null : nextStandardGlassThicknessMm(requiredMm);
  // Nothing entered never meets the bound.
  const meetsBound = (enteredMm ?? -Infinity) >= requiredMm;
  let message =
    coefficient.beyondTable && meetsBound
      ? `Needs at least ${requiredMm.toFixed(1)} mm; ${enteredMm} mm entered meets that, but that is not enough to go on.`
      : panelThicknessMessage(requiredMm, enteredMm, suggestedMm, input.material);
  const notes = materialNotes(input.material, requiredMm);
  if (coefficient.beyondTable) {
    const beyond =
      "This panel's proportions are past the plate table, so the figure is only a lower bound." +
      (topEdge === "free"
        ? " An open-top panel this shape needs a centre brace (or a top frame), or the panel maker's own calculation."
        : " It needs a centre brace or the panel maker's own calculation.");
    notes.push(beyond);
    message += ` ${beyond}`;
  }
  return {
    requiredMm,
    enteredMm,
    // Past the table the figure is a lower bound: passing it proves nothing.
    ok: enteredMm === null ? null : meetsBound && !coefficient.beyondTable,
    beta: coefficient.beta,
    bMm: coefficient.bMm,
    plateCase: coefficient.plateCase,
    topEdge,
    beyondTable: coefficient.beyondTable,
    stressMPa,
    allowableStressMPa: allowMPa,
    suggestedMm,
    notes,
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
  /** Past the plate table: requiredMm is only a lower bound. */
  lowerBound: boolean;
  /** Where the figure comes from, in words, for the sheet. */
  source: string;
  /** What the figures mean, in words without figures, so any unit system can show them. */
  notes: string[];
  /** The whole verdict in millimetres. */
  message: string;
}

export interface GlassCheck {
  /** True only when every panel passes. */
  ok: boolean;
  topEdge: TopEdge;
  panels: PanelCheck[];
  /** Shown beside every glass result. */
  cautions: readonly string[];
}

const CASE_WORDS: Record<PlateCoefficient["plateCase"], string> = {
  "10": "three edges simply supported, top edge free",
  "1d": "four edges simply supported, load along the length",
  "1e": "four edges simply supported, load along the width",
};

function plateSource(r: PanelThicknessResult): string {
  return `Roark's Formulas for Stress and Strain, 7th ed., Table 11.4 case ${r.plateCase} (${CASE_WORDS[r.plateCase]}), β = ${r.beta.toFixed(3)}${r.beyondTable ? ", past the table" : ""}`;
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
  const topEdge = design.topEdge ?? "free";
  if (design.shape === "cylinder") {
    const r = minimumCylinderWallThickness({ ...common, diameterMm: design.diameterMm });
    walls.push({
      panel: "wall",
      requiredMm: r.requiredMm,
      enteredMm: t,
      ok: r.requiredMm <= t,
      beta: null,
      stressMPa: r.stressMPa,
      lowerBound: false,
      notes: [CYLINDER_NOTE, ...materialNotes(design.panelMaterial, r.requiredMm)],
      source: "Thin-walled cylinder with bending at a built-in base (Timoshenko & Woinowsky-Krieger, Theory of Plates and Shells, §117)",
      message: r.message,
    });
  } else {
    const spans: Array<[PanelName, number]> = [
      ["front and back", design.lengthMm],
      ["sides", design.widthMm],
    ];
    for (const [panel, lengthMm] of spans) {
      const r = minimumPanelThickness({ ...common, panelLengthMm: lengthMm, topEdge });
      const curvedNote =
        design.shape === "bowfront" && panel === "front and back"
          ? " The curved front is checked as a flat panel, which is on the safe side."
          : "";
      walls.push({
        panel,
        requiredMm: r.requiredMm,
        enteredMm: t,
        ok: r.ok === true,
        beta: r.beta,
        stressMPa: r.stressMPa,
        lowerBound: r.beyondTable,
        source: plateSource(r),
        notes: [...r.notes, ...(curvedNote ? [curvedNote.trim()] : [])],
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
    lowerBound: walls.some((w) => w.lowerBound),
    source: "Common practice: the bottom at least as thick as the thickest wall needs, on a flat, level, continuous stand top",
    notes: ["This assumes the bottom sits flat on a level, continuous stand top; a bottom carried only at its edges needs its own design."],
    message:
      `Needs at least ${bottomRequiredMm.toFixed(1)} mm, as thick as the thickest wall needs; ` +
      `${bottomEnteredMm} mm entered is ${bottomOk ? "enough" : "too thin"}. ` +
      "This assumes the bottom sits flat on a level, continuous stand top; a bottom carried only at its edges needs its own design.",
  };

  const panels = [...walls, bottom];
  return { ok: panels.every((p) => p.ok), topEdge, panels, cautions: GLASS_CAUTIONS };
}
