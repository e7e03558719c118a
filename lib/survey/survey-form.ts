import type { UnitSystem } from "../tank/units";
import { keepOrConvert, toFieldText } from "./form-values";
import type { SiteSurvey, SurveyField } from "./site-survey.schema";

/** The survey form's values: everything as the text or choice on screen ("" for not yet filled). */
export type SurveyFormValues = Record<SurveyField, string>;

type Kind = "length" | "count" | "choice" | "yesno" | "text";

export const SURVEY_FIELD_KINDS: Record<SurveyField, Kind> = {
  roomUse: "choice",
  floorType: "choice",
  floorLevel: "choice",
  roomLengthMm: "length",
  roomWidthMm: "length",
  ceilingHeightMm: "length",
  joistDirection: "choice",
  joistSpanMm: "length",
  joistSpacingMm: "length",
  joistSize: "text",
  bearingWallDistanceMm: "length",
  doorWidthMm: "length",
  doorHeightMm: "length",
  stairs: "yesno",
  turns: "count",
  accessNotes: "text",
  outletsWithinReach: "count",
  groundFaultProtection: "choice",
  dedicatedCircuit: "choice",
  waterSupplyDistanceMm: "length",
  drainDistanceMm: "length",
  sunExposure: "choice",
  heatSources: "text",
  notes: "text",
};

const FIELDS = Object.keys(SURVEY_FIELD_KINDS) as SurveyField[];

/** A stored survey as form values in the user's units. */
export function surveyToForm(survey: Partial<SiteSurvey> | null | undefined, system: UnitSystem): SurveyFormValues {
  const s = (survey ?? {}) as Record<string, unknown>;
  const out = {} as SurveyFormValues;
  for (const f of FIELDS) {
    const v = s[f];
    const kind = SURVEY_FIELD_KINDS[f];
    if (kind === "length") out[f] = toFieldText("length", v as number | null, system);
    else if (kind === "count") out[f] = toFieldText("plain", v as number | null, system);
    else if (kind === "yesno") out[f] = v === true ? "yes" : v === false ? "no" : "";
    else out[f] = typeof v === "string" ? v : "";
  }
  return out;
}

/** Form values back to a survey in SI, ready for the schema; empty fields become null. */
export function surveyFromForm(form: Partial<SurveyFormValues>, system: UnitSystem, stored?: Partial<SiteSurvey> | null): Record<SurveyField, unknown> {
  const out = {} as Record<SurveyField, unknown>;
  for (const f of FIELDS) {
    const text = (form[f] ?? "").trim();
    const kind = SURVEY_FIELD_KINDS[f];
    if (kind === "length") out[f] = keepOrConvert("length", text, system, stored?.[f] as number | undefined) ?? null;
    else if (kind === "count") out[f] = keepOrConvert("plain", text, system, undefined) ?? null;
    else if (kind === "yesno") out[f] = text === "yes" ? true : text === "no" ? false : null;
    else out[f] = text === "" ? null : text;
  }
  return out;
}
