/**
 * Short cautions shown beside tank results. Kept as plain strings in one place
 * so every screen words them the same way and tests can check they are present.
 */

export const SCREENING_ONLY =
  "This is a screening estimate, not a structural design. A structural engineer must confirm the floor and stand.";

export const LICENSED_WORK =
  "Floors, stands, glass and electrical work near water are for licensed professionals working under your local codes.";

export const WEIGHTS_FROM_INPUTS =
  "Weights assume the sizes and materials entered here. Check them against the actual build.";

export const HEAVY_LIFTING =
  "Heavy glass needs enough people and proper lifting gear to move safely.";

/** Beside every glass result. */
export const GLASS_CAUTIONS: readonly string[] = [
  "A screening estimate, not a structural design: the panel maker and a structural engineer confirm the glass.",
  "Local codes and licensed professionals decide.",
];

/** Beside every floor result. */
export const FLOOR_CAUTIONS: readonly string[] = [
  "A screening estimate, not a structural design: a structural engineer confirms the floor.",
  "Local codes and licensed professionals decide.",
];

/** Every caution, in the order they are shown. */
export const ALL_CAUTIONS: readonly string[] = [SCREENING_ONLY, LICENSED_WORK, WEIGHTS_FROM_INPUTS, HEAVY_LIFTING];
