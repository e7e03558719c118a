/** The install's stages, in order. Keys are stored; labels are what people read. */
export const STAGES = [
  "site_survey",
  "stand_load_check",
  "aquascape",
  "fill_leak_test",
  "cycling",
  "first_stocking",
  "in_service",
] as const;

export type Stage = (typeof STAGES)[number];

export const STAGE_LABELS: Record<Stage, string> = {
  site_survey: "Site survey",
  stand_load_check: "Stand & load check",
  aquascape: "Aquascape",
  fill_leak_test: "Fill & leak test",
  cycling: "Cycling",
  first_stocking: "First stocking",
  in_service: "In service",
};

/** One line a client can read: what happens in this stage. */
export const STAGE_BLURBS: Record<Stage, string> = {
  site_survey: "We measure the room, the floor, the way in, power, water and drains.",
  stand_load_check: "We design the tank and stand and check the load the floor will carry.",
  aquascape: "The crew sets the stand, places the tank and builds the rock and substrate.",
  fill_leak_test: "The tank is filled and checked for leaks at fill and again a day later.",
  cycling: "Bacteria establish in the filter; the water is tested every day or two.",
  first_stocking: "Fish go in, in small batches, each followed by a re-test.",
  in_service: "A settled tank, with regular water changes and filter service.",
};

export function stageIndex(stage: Stage): number {
  return STAGES.indexOf(stage);
}

export function isStage(value: unknown): value is Stage {
  return typeof value === "string" && (STAGES as readonly string[]).includes(value);
}

export function nextStage(stage: Stage): Stage | null {
  const i = stageIndex(stage);
  return i < STAGES.length - 1 ? STAGES[i + 1] : null;
}
