import type { UnitSystem } from "../tank/units";
import { getPath, keepOrConvert, toFieldText, type NumberKind } from "./form-values";
import type { StoredDesign } from "./load-check";

/** The design form's values: choices and typed text in the user's units. */
export type DesignFormValues = {
  shape: string;
  lengthMm: string;
  widthMm: string;
  heightMm: string;
  diameterMm: string;
  bowDepthMm: string;
  panelMaterial: string;
  /** "free" (open top) or "braced" (top frame or brace). */
  topEdge: string;
  panelThicknessMm: string;
  bottomThicknessMm: string;
  waterBelowRimMm: string;
  water: string;
  salinityPsu: string;
  temperatureC: string;
  substrate: { type: string; depthMm: string };
  rockMassKg: string;
  sumpVolumeL: string;
  stand: {
    massKg: string;
    lengthMm: string;
    widthMm: string;
    heightMm: string;
    footprint: { kind: string; lengthMm: string; widthMm: string; count: string; legLengthMm: string; legWidthMm: string };
  };
};

/** Every number in the form, by its path (the same path the schema reports problems at). */
export const DESIGN_NUMBER_KINDS: Record<string, NumberKind> = {
  lengthMm: "length",
  widthMm: "length",
  heightMm: "length",
  diameterMm: "length",
  bowDepthMm: "length",
  panelThicknessMm: "length",
  bottomThicknessMm: "length",
  waterBelowRimMm: "length",
  salinityPsu: "plain",
  temperatureC: "temperature",
  "substrate.depthMm": "length",
  rockMassKg: "mass",
  sumpVolumeL: "volume",
  "stand.massKg": "mass",
  "stand.lengthMm": "length",
  "stand.widthMm": "length",
  "stand.heightMm": "length",
  "stand.footprint.lengthMm": "length",
  "stand.footprint.widthMm": "length",
  "stand.footprint.count": "plain",
  "stand.footprint.legLengthMm": "length",
  "stand.footprint.legWidthMm": "length",
};

/** A new design's starting point: only the choices, no sizes. */
export function emptyDesignForm(): DesignFormValues {
  return {
    shape: "rectangular",
    lengthMm: "",
    widthMm: "",
    heightMm: "",
    diameterMm: "",
    bowDepthMm: "",
    panelMaterial: "glass",
    topEdge: "free",
    panelThicknessMm: "",
    bottomThicknessMm: "",
    waterBelowRimMm: "",
    water: "fresh",
    salinityPsu: "",
    temperatureC: "",
    substrate: { type: "sand", depthMm: "" },
    rockMassKg: "0",
    sumpVolumeL: "0",
    stand: { massKg: "", lengthMm: "", widthMm: "", heightMm: "", footprint: { kind: "solid", lengthMm: "", widthMm: "", count: "4", legLengthMm: "", legWidthMm: "" } },
  };
}

/** A stored design as form values in the user's units. */
export function designToForm(design: StoredDesign | null | undefined, system: UnitSystem): DesignFormValues {
  const form = emptyDesignForm();
  if (!design) return form;
  form.shape = design.shape;
  form.panelMaterial = design.panelMaterial;
  // Designs saved before the question was asked are open-top.
  form.topEdge = design.topEdge ?? "free";
  form.water = design.water;
  form.substrate.type = design.substrate.type;
  form.stand.footprint.kind = design.stand.footprint.kind;
  for (const [path, kind] of Object.entries(DESIGN_NUMBER_KINDS)) {
    const v = getPath(design, path);
    if (typeof v === "number") setText(form, path, toFieldText(kind, v, system));
  }
  return form;
}

function setText(form: DesignFormValues, path: string, text: string) {
  const keys = path.split(".");
  let cur = form as unknown as Record<string, unknown>;
  for (const k of keys.slice(0, -1)) cur = cur[k] as Record<string, unknown>;
  cur[keys[keys.length - 1]] = text;
}

/**
 * Form values back to a design in SI, shaped for the schema (which then runs validateDesign).
 * Fields the person didn't change keep the stored SI value exactly.
 */
export function designFromForm(form: DesignFormValues, system: UnitSystem, stored?: StoredDesign | null): Record<string, unknown> {
  const n = (path: string) => keepOrConvert(DESIGN_NUMBER_KINDS[path], String(getPath(form, path) ?? ""), system, getPath(stored, path) as number | undefined);
  const f = form.stand.footprint;
  const footprint =
    f.kind === "legs"
      ? { kind: "legs", count: n("stand.footprint.count"), legLengthMm: n("stand.footprint.legLengthMm"), legWidthMm: n("stand.footprint.legWidthMm") }
      : { kind: "solid", lengthMm: n("stand.footprint.lengthMm"), widthMm: n("stand.footprint.widthMm") };
  const size =
    form.shape === "cylinder"
      ? { diameterMm: n("diameterMm"), heightMm: n("heightMm") }
      : form.shape === "bowfront"
        ? { lengthMm: n("lengthMm"), widthMm: n("widthMm"), bowDepthMm: n("bowDepthMm"), heightMm: n("heightMm") }
        : { lengthMm: n("lengthMm"), widthMm: n("widthMm"), heightMm: n("heightMm") };
  const design: Record<string, unknown> = {
    shape: form.shape,
    ...size,
    panelMaterial: form.panelMaterial,
    topEdge: form.topEdge,
    panelThicknessMm: n("panelThicknessMm"),
    bottomThicknessMm: n("bottomThicknessMm"),
    waterBelowRimMm: n("waterBelowRimMm"),
    water: form.water,
    salinityPsu: form.water === "salt" ? n("salinityPsu") : undefined,
    temperatureC: n("temperatureC"),
    substrate: { type: form.substrate.type, depthMm: form.substrate.type === "none" ? 0 : n("substrate.depthMm") },
    rockMassKg: n("rockMassKg"),
    sumpVolumeL: n("sumpVolumeL"),
    stand: { massKg: n("stand.massKg"), lengthMm: n("stand.lengthMm"), widthMm: n("stand.widthMm"), heightMm: n("stand.heightMm"), footprint },
  };
  return dropUndefined(design);
}

/** JSON drops undefined keys anyway; dropping them here keeps the browser's copy equal to the stored one. */
function dropUndefined(obj: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(obj)) {
    if (v === undefined) continue;
    out[k] = v && typeof v === "object" && !Array.isArray(v) ? dropUndefined(v as Record<string, unknown>) : v;
  }
  return out;
}
