import { z } from "zod";
import { text as cleanText } from "../validation/text";

/**
 * The site survey, stored whole in `site_surveys.data` as SI values (millimetres). Every field is
 * optional so a half-done survey saves as a draft; `surveyMissingFields` says what is still needed.
 * Values that are present must make sense, so a typo never reaches the floor screening.
 */

export const FLOOR_TYPES = ["timber joists", "concrete slab", "raised", "other"] as const;
export const JOIST_DIRECTIONS = ["perpendicular", "parallel", "unknown"] as const;
export const FLOOR_LEVELS = ["basement", "ground", "upper"] as const;
export const ROOM_USES = ["living", "sleeping"] as const;
export const YES_NO_UNKNOWN = ["yes", "no", "unknown"] as const;
export const SUN_EXPOSURES = ["none", "some", "strong"] as const;

/** A length in millimetres: more than zero (or zero when `allowZero`) and at most `maxMm`. */
function length(label: string, maxMm: number, allowZero = false) {
  const metres = maxMm / 1000;
  return z
    .number({ error: `${label} must be a number.` })
    .refine(Number.isFinite, `${label} must be a number.`)
    .refine((v) => (allowZero ? v >= 0 : v > 0), allowZero ? `${label} can't be negative.` : `${label} must be more than zero.`)
    .refine((v) => v <= maxMm, `${label} is over ${metres} m. Check the units.`)
    .nullish();
}

function count(label: string, max: number) {
  return z
    .number({ error: `${label} must be a number.` })
    .int(`${label} must be a whole number.`)
    .min(0, `${label} can't be negative.`)
    .max(max, `${label} looks too high: at most ${max}.`)
    .nullish();
}

function choice<T extends readonly [string, ...string[]]>(values: T, message: string) {
  return z.enum(values, { error: message }).nullish();
}

const text = (max: number) => cleanText(max, `Keep this under ${max} characters.`).nullish();

export const siteSurveySchema = z.object({
  // Room and floor
  roomUse: choice(ROOM_USES, "Choose living area or sleeping room."),
  floorType: choice(FLOOR_TYPES, "Choose the kind of floor."),
  floorLevel: choice(FLOOR_LEVELS, "Choose the floor level."),
  roomLengthMm: length("Room length", 50_000),
  roomWidthMm: length("Room width", 50_000),
  ceilingHeightMm: length("Ceiling height", 10_000),
  joistDirection: choice(JOIST_DIRECTIONS, "Choose how the joists run."),
  joistSpanMm: length("Joist span", 15_000),
  joistSpacingMm: length("Joist spacing", 2_000),
  joistSize: text(80),
  bearingWallDistanceMm: length("Distance from a load-bearing wall", 50_000, true),
  // Access
  doorWidthMm: length("Narrowest door width", 10_000),
  doorHeightMm: length("Narrowest door height", 10_000),
  stairs: z.boolean({ error: "Say whether there are stairs." }).nullish(),
  turns: count("Turns on the way in", 30),
  accessNotes: text(1000),
  // Power
  outletsWithinReach: count("Outlets within reach", 50),
  groundFaultProtection: choice(YES_NO_UNKNOWN, "Say whether there is ground-fault protection."),
  dedicatedCircuit: choice(YES_NO_UNKNOWN, "Say whether there is a dedicated circuit."),
  // Water
  waterSupplyDistanceMm: length("Distance to a water supply", 100_000, true),
  drainDistanceMm: length("Distance to a drain", 100_000, true),
  // Sun and heat
  sunExposure: choice(SUN_EXPOSURES, "Choose how much direct sun the spot gets."),
  heatSources: text(500),
  notes: text(4000),
});

export type SiteSurvey = z.infer<typeof siteSurveySchema>;
export type SurveyField = keyof SiteSurvey;
