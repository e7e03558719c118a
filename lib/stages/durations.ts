import { STAGE_LABELS, type Stage } from "./stages";

/** Expected days in each stage; null means the stage has no expected end (a tank in service stays there). */
export type StageDurations = Record<Stage, number | null>;

const DAY = 86_400_000;

/**
 * House defaults, common practice for a custom install and marked so in Settings: two weeks to
 * survey and design, another two to approve the load and take the deposit, a week to build the
 * stand and aquascape, three days to fill and pass the 24-hour leak check, six weeks of fishless
 * cycling (commonly four to six), and six weeks to add fish in small batches with quarantine.
 */
export const DEFAULT_STAGE_DURATIONS: Readonly<StageDurations> = Object.freeze({
  site_survey: 14,
  stand_load_check: 14,
  aquascape: 7,
  fill_leak_test: 3,
  cycling: 42,
  first_stocking: 42,
  in_service: null,
});

/** Stages a company may set an expected duration for (in service has none). */
export const TIMED_STAGES = ["site_survey", "stand_load_check", "aquascape", "fill_leak_test", "cycling", "first_stocking"] as const satisfies readonly Stage[];

export const DURATION_BOUNDS = { min: 1, max: 365 } as const;

export type DurationProblem = { stage: Stage; message: string };

/** Checks a company's overrides; each problem names the stage it belongs to. */
export function validateStageDurations(overrides: Partial<Record<string, unknown>>): DurationProblem[] {
  const problems: DurationProblem[] = [];
  for (const stage of TIMED_STAGES) {
    const v = overrides[stage];
    if (v === undefined || v === null) continue;
    if (typeof v !== "number" || !Number.isInteger(v) || v < DURATION_BOUNDS.min || v > DURATION_BOUNDS.max) {
      problems.push({ stage, message: `${STAGE_LABELS[stage]}: give a whole number of days from ${DURATION_BOUNDS.min} to ${DURATION_BOUNDS.max}.` });
    }
  }
  return problems;
}

/** The company's durations: its valid overrides over the defaults (a bad stored value falls back to the default). */
export function resolveStageDurations(overrides: Partial<Record<string, unknown>> = {}): StageDurations {
  const bad = new Set(validateStageDurations(overrides).map((p) => p.stage));
  const out = { ...DEFAULT_STAGE_DURATIONS } as StageDurations;
  for (const stage of TIMED_STAGES) {
    const v = overrides[stage];
    if (typeof v === "number" && !bad.has(stage)) out[stage] = v;
  }
  return out;
}

export type Lateness = {
  /** When the card was expected to leave its current stage; null when the stage has no expected end. */
  expectedBy: string | null;
  /** Whole days past expectedBy (at least 1 once past it); 0 when on time or early. */
  lateBy: number;
};

/** A card is late only against its own stage: how long it has been there versus that stage's expected days. */
export function stageLateness(card: { stage: Stage; stageEnteredAt: string | Date }, durations: StageDurations, now: Date): Lateness {
  const days = durations[card.stage];
  if (days === null) return { expectedBy: null, lateBy: 0 };
  const expected = new Date(new Date(card.stageEnteredAt).getTime() + days * DAY);
  const over = now.getTime() - expected.getTime();
  // Whole days late, but never "late by 0 days" once past the expected end.
  return { expectedBy: expected.toISOString(), lateBy: over > 0 ? Math.max(1, Math.floor(over / DAY)) : 0 };
}
