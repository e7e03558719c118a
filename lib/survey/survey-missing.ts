import type { SiteSurvey, SurveyField } from "./site-survey.schema";

/** What each field is called on screen, so missing fields can be named. */
export const SURVEY_FIELD_LABELS: Record<SurveyField, string> = {
  roomUse: "Room use",
  floorType: "Floor type",
  floorLevel: "Floor level",
  roomLengthMm: "Room length",
  roomWidthMm: "Room width",
  ceilingHeightMm: "Ceiling height",
  joistDirection: "Joist direction",
  joistSpanMm: "Joist span",
  joistSpacingMm: "Joist spacing",
  joistSize: "Joist size",
  bearingWallDistanceMm: "Distance from a load-bearing wall",
  doorWidthMm: "Narrowest door width",
  doorHeightMm: "Narrowest door height",
  stairs: "Stairs on the way in",
  turns: "Turns on the way in",
  accessNotes: "Access notes",
  outletsWithinReach: "Outlets within reach",
  groundFaultProtection: "Ground-fault protection",
  dedicatedCircuit: "Dedicated circuit",
  waterSupplyDistanceMm: "Distance to a water supply",
  drainDistanceMm: "Distance to a drain",
  sunExposure: "Direct sun",
  heatSources: "Heat sources",
  notes: "Notes",
};

/** Needed for every survey: what the floor screening, access check and install day rely on. */
const ALWAYS_REQUIRED: SurveyField[] = [
  "roomUse",
  "floorType",
  "floorLevel",
  "roomLengthMm",
  "roomWidthMm",
  "doorWidthMm",
  "doorHeightMm",
  "stairs",
  "outletsWithinReach",
  "groundFaultProtection",
  "dedicatedCircuit",
  "waterSupplyDistanceMm",
  "drainDistanceMm",
  "sunExposure",
];

/** A floor carried on joists is screened on how they run and where the tank sits on them. */
const JOIST_REQUIRED: SurveyField[] = ["joistDirection", "joistSpanMm", "joistSpacingMm", "bearingWallDistanceMm"];

/** Whether the floor type means the tank stands on joists (a raised floor is joisted too). */
export function isJoistedFloor(floorType: SiteSurvey["floorType"]): boolean {
  return floorType === "timber joists" || floorType === "raised";
}

/** The fields a survey still needs, in form order; empty means the survey is complete. */
export function requiredSurveyFields(survey: Partial<SiteSurvey>): SurveyField[] {
  const fields = [...ALWAYS_REQUIRED];
  // The floor type decides the rest; until it is chosen, ask for the joist details too.
  if (!survey.floorType || isJoistedFloor(survey.floorType)) fields.push(...JOIST_REQUIRED);
  const order = Object.keys(SURVEY_FIELD_LABELS) as SurveyField[];
  return order.filter((f) => fields.includes(f));
}

/** Required fields left empty. A value of zero or `false` counts as filled in. */
export function surveyMissingFields(survey: Partial<SiteSurvey> | null | undefined): SurveyField[] {
  const s = survey ?? {};
  return requiredSurveyFields(s).filter((f) => {
    const v = s[f];
    return v === undefined || v === null || (typeof v === "string" && v.trim() === "");
  });
}

export function isSurveyComplete(survey: Partial<SiteSurvey> | null | undefined): boolean {
  return surveyMissingFields(survey).length === 0;
}
