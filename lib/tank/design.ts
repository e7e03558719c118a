/**
 * The tank design a customer and installer agree on, in stored SI units
 * (millimetres, kilograms, litres, degrees Celsius), and the checks that catch
 * impossible or mistyped entries before any weight is computed from them.
 */

import {
  internalHeightMm,
  outerPlanExtentMm,
  smallestPlanDimensionMm,
  waterHeightMm,
} from "./geometry";

export type TankShape = "rectangular" | "cylinder" | "bowfront";
export type PanelMaterial = "glass" | "low-iron glass" | "acrylic";
export type WaterKind = "fresh" | "salt";
export type SubstrateType = "sand" | "gravel" | "aqua soil" | "none";

/** Where the stand touches the floor: one solid plinth, or separate legs. */
export type StandFootprint =
  | { kind: "solid"; lengthMm: number; widthMm: number }
  /** legLengthMm × legWidthMm is the floor contact of each leg. */
  | { kind: "legs"; count: number; legLengthMm: number; legWidthMm: number };

export interface StandDesign {
  massKg: number;
  /** Overall outline of the stand, mm. */
  lengthMm: number;
  widthMm: number;
  footprint: StandFootprint;
}

interface TankDesignCommon {
  panelMaterial: PanelMaterial;
  /**
   * How the walls' top edge is held: "free" for an open top (rimless), "braced" for a top frame
   * or perimeter brace that holds it. Designs saved before this was asked read as "free".
   */
  topEdge?: "free" | "braced";
  /** Side (wall) panel thickness, mm. */
  panelThicknessMm: number;
  /** Bottom panel thickness, mm; defaults to panelThicknessMm. */
  bottomThicknessMm?: number;
  /** Gap from the water surface up to the rim, mm; must be above zero. */
  waterBelowRimMm: number;
  water: WaterKind;
  /** Salt water only; defaults to 35 psu. */
  salinityPsu?: number;
  temperatureC: number;
  substrate: { type: SubstrateType; depthMm: number };
  rockMassKg: number;
  /** Water held in a sump inside the stand, L; counted in the installed weight. */
  sumpVolumeL: number;
  stand: StandDesign;
}

export interface RectangularTankDesign extends TankDesignCommon {
  shape: "rectangular";
  lengthMm: number;
  /** Front-to-back depth, mm. */
  widthMm: number;
  heightMm: number;
}

export interface CylinderTankDesign extends TankDesignCommon {
  shape: "cylinder";
  diameterMm: number;
  heightMm: number;
}

export interface BowfrontTankDesign extends TankDesignCommon {
  shape: "bowfront";
  lengthMm: number;
  /** Front-to-back depth at the ends, mm. */
  widthMm: number;
  /** Extra depth at the centre of the curved front, mm. */
  bowDepthMm: number;
  heightMm: number;
}

export type TankDesign = RectangularTankDesign | CylinderTankDesign | BowfrontTankDesign;

export interface DesignProblem {
  /** Dotted path of the field, e.g. "stand.footprint.count". */
  field: string;
  message: string;
}

/**
 * Largest dimension we accept, mm. Our own cut-off: past 10 m a figure is almost
 * certainly a units slip (metres typed as millimetres the other way round, or an
 * extra zero), and such builds are one-off engineering projects anyway.
 */
export const MAX_DIMENSION_MM = 10_000;

/** Range of the density equations in water-density.ts (Tanaka 2001: 0–40 °C). */
const MIN_TEMPERATURE_C = 0;
const MAX_TEMPERATURE_C = 40;
/** EOS-80 one-atmosphere equation validity: 0–42 psu (Millero & Poisson 1981). */
const MAX_SALINITY_PSU = 42;

type Check = (problems: DesignProblem[]) => void;

function positiveLength(field: string, label: string, value: number): Check {
  return (problems) => {
    if (!Number.isFinite(value)) problems.push({ field, message: `${label} must be a number.` });
    else if (value <= 0) problems.push({ field, message: `${label} must be more than zero.` });
    else if (value > MAX_DIMENSION_MM)
      problems.push({ field, message: `${label} is over 10 m. Check the units: sizes are in millimetres.` });
  };
}

function nonNegative(field: string, label: string, value: number): Check {
  return (problems) => {
    if (!Number.isFinite(value)) problems.push({ field, message: `${label} must be a number.` });
    else if (value < 0) problems.push({ field, message: `${label} can't be negative.` });
  };
}

function shapeChecks(design: TankDesign): Check[] {
  switch (design.shape) {
    case "rectangular":
      return [
        positiveLength("lengthMm", "Length", design.lengthMm),
        positiveLength("widthMm", "Width", design.widthMm),
        positiveLength("heightMm", "Height", design.heightMm),
      ];
    case "cylinder":
      return [
        positiveLength("diameterMm", "Diameter", design.diameterMm),
        positiveLength("heightMm", "Height", design.heightMm),
      ];
    case "bowfront":
      return [
        positiveLength("lengthMm", "Length", design.lengthMm),
        positiveLength("widthMm", "Width at the ends", design.widthMm),
        positiveLength("bowDepthMm", "Bow depth", design.bowDepthMm),
        positiveLength("heightMm", "Height", design.heightMm),
        (problems) => {
          // Past a half-circle the front would curve back on itself.
          if (design.bowDepthMm > design.lengthMm / 2)
            problems.push({ field: "bowDepthMm", message: "Bow depth can't be more than half the length." });
        },
      ];
  }
}

function standChecks(design: TankDesign): Check[] {
  const { stand } = design;
  const checks: Check[] = [
    nonNegative("stand.massKg", "Stand weight", stand.massKg),
    positiveLength("stand.lengthMm", "Stand length", stand.lengthMm),
    positiveLength("stand.widthMm", "Stand width", stand.widthMm),
  ];
  const fp = stand.footprint;
  if (fp.kind === "solid") {
    checks.push(
      positiveLength("stand.footprint.lengthMm", "Stand base length", fp.lengthMm),
      positiveLength("stand.footprint.widthMm", "Stand base width", fp.widthMm),
      (problems) => {
        if (fp.lengthMm > stand.lengthMm || fp.widthMm > stand.widthMm)
          problems.push({ field: "stand.footprint", message: "Stand base is bigger than the stand itself." });
      },
    );
  } else {
    checks.push(
      (problems) => {
        if (!Number.isInteger(fp.count) || fp.count < 1)
          problems.push({ field: "stand.footprint.count", message: "Number of legs must be a whole number, 1 or more." });
      },
      positiveLength("stand.footprint.legLengthMm", "Leg length", fp.legLengthMm),
      positiveLength("stand.footprint.legWidthMm", "Leg width", fp.legWidthMm),
    );
  }
  return checks;
}

/** Relations between fields, run only once every single field is sensible. */
function relationChecks(design: TankDesign, problems: DesignProblem[]): void {
  const t = design.panelThicknessMm;
  const bottom = design.bottomThicknessMm ?? t;
  if (t >= smallestPlanDimensionMm(design) / 2) {
    problems.push({ field: "panelThicknessMm", message: "Panels are too thick for the tank's size: there would be no room inside." });
  }
  if (bottom >= design.heightMm) {
    // Without its own figure the bottom takes the side thickness, so point at the field the user typed.
    const field = design.bottomThicknessMm === undefined ? "panelThicknessMm" : "bottomThicknessMm";
    problems.push({ field, message: "Bottom panel is at least as thick as the tank is tall." });
    return;
  }
  if (design.waterBelowRimMm >= internalHeightMm(design)) {
    problems.push({ field: "waterBelowRimMm", message: "Water level is at or below the bottom: the tank would be empty." });
    return;
  }
  if (design.substrate.type !== "none" && design.substrate.depthMm >= waterHeightMm(design)) {
    problems.push({ field: "substrate.depthMm", message: "Substrate is deeper than the water." });
  }
}

/** Whether the stand's outline covers the tank; the bottom must be carried all over, not at its edges. */
function standOverhangCheck(design: TankDesign, problems: DesignProblem[]): void {
  const extent = outerPlanExtentMm(design);
  if (design.stand.lengthMm < extent.lengthMm || design.stand.widthMm < extent.widthMm)
    problems.push({ field: "stand", message: "Stand is smaller than the tank: the tank's whole bottom must sit on the stand." });
}

/**
 * Lists every problem with a design in plain words, one per field where possible.
 * An empty list means the design can be used for weights and checks.
 */
export function validateDesign(design: TankDesign): DesignProblem[] {
  const problems: DesignProblem[] = [];
  const checks: Check[] = [
    ...shapeChecks(design),
    positiveLength("panelThicknessMm", "Panel thickness", design.panelThicknessMm),
    (p) => {
      if (design.bottomThicknessMm !== undefined)
        positiveLength("bottomThicknessMm", "Bottom thickness", design.bottomThicknessMm)(p);
    },
    (p) => {
      const v = design.waterBelowRimMm;
      if (!Number.isFinite(v)) p.push({ field: "waterBelowRimMm", message: "Water level must be a number." });
      else if (v <= 0)
        p.push({ field: "waterBelowRimMm", message: "Water level must be below the rim: leave a gap so the tank can't overflow." });
    },
    (p) => {
      const v = design.temperatureC;
      if (!Number.isFinite(v) || v < MIN_TEMPERATURE_C || v > MAX_TEMPERATURE_C)
        p.push({ field: "temperatureC", message: "Water temperature must be between 0 °C and 40 °C." });
    },
    (p) => {
      const s = design.salinityPsu;
      if (design.water === "salt" && s !== undefined && (!Number.isFinite(s) || s < 0 || s > MAX_SALINITY_PSU))
        p.push({ field: "salinityPsu", message: "Salinity must be between 0 and 42 psu (natural seawater is about 35)." });
    },
    nonNegative("substrate.depthMm", "Substrate depth", design.substrate.depthMm),
    nonNegative("rockMassKg", "Rock weight", design.rockMassKg),
    nonNegative("sumpVolumeL", "Sump volume", design.sumpVolumeL),
    ...standChecks(design),
  ];
  for (const check of checks) check(problems);
  // Cross-field checks on bad single values would only repeat the same mistake in other words,
  // so each runs only when the fields it compares passed on their own.
  const tankFieldsOk = problems.every((p) => p.field.startsWith("stand"));
  const standOutlineOk = !problems.some((p) => p.field === "stand.lengthMm" || p.field === "stand.widthMm");
  if (tankFieldsOk) relationChecks(design, problems);
  if (tankFieldsOk && standOutlineOk) standOverhangCheck(design, problems);
  return problems;
}
