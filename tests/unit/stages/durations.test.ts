import { describe, expect, it } from "vitest";
import { DEFAULT_STAGE_DURATIONS, DURATION_BOUNDS, resolveStageDurations, stageLateness, validateStageDurations } from "@/lib/stages/durations";

const now = new Date("2026-06-15T10:00:00Z");
const daysAgo = (n: number) => new Date(now.getTime() - n * 86_400_000).toISOString();

describe("stage durations", () => {
  it("has a default for every stage but in service (house defaults, common practice)", () => {
    expect(DEFAULT_STAGE_DURATIONS.in_service).toBeNull();
    expect(DEFAULT_STAGE_DURATIONS.cycling).toBe(42);
    expect(DEFAULT_STAGE_DURATIONS.fill_leak_test).toBe(3);
  });

  it("takes a company's valid overrides and ignores bad ones", () => {
    const d = resolveStageDurations({ cycling: 56, aquascape: 0, site_survey: "soon", in_service: 10 });
    expect(d.cycling).toBe(56);
    expect(d.aquascape).toBe(DEFAULT_STAGE_DURATIONS.aquascape);
    expect(d.site_survey).toBe(DEFAULT_STAGE_DURATIONS.site_survey);
    expect(d.in_service).toBeNull();
  });

  it("explains a bad value by stage", () => {
    expect(validateStageDurations({ aquascape: 2.5 })).toEqual([{ stage: "aquascape", message: expect.stringContaining("Aquascape") }]);
    expect(validateStageDurations({ aquascape: 400 })).toHaveLength(1);
    expect(validateStageDurations({ aquascape: 5, cycling: null })).toEqual([]);
  });

  it("calls a card late only against its own stage", () => {
    const d = resolveStageDurations();
    // Twenty days into a six-week cycle is on time, even if the target install date passed long ago.
    expect(stageLateness({ stage: "cycling", stageEnteredAt: daysAgo(20) }, d, now)).toEqual({ expectedBy: daysAgo(-22), lateBy: 0 });
    // Five days in a three-day fill & leak test is two days late.
    expect(stageLateness({ stage: "fill_leak_test", stageEnteredAt: daysAgo(5) }, d, now).lateBy).toBe(2);
    // Any part of a day over is at least one day late.
    expect(stageLateness({ stage: "fill_leak_test", stageEnteredAt: new Date(now.getTime() - 3.2 * 86_400_000) }, d, now).lateBy).toBe(1);
    expect(stageLateness({ stage: "in_service", stageEnteredAt: daysAgo(400) }, d, now)).toEqual({ expectedBy: null, lateBy: 0 });
  });
});

describe("stage durations: the house defaults and the bounds, value by value", () => {
  it("two weeks to survey, two to approve the load, a week to build, three days to fill, six weeks each to cycle and to stock (common practice)", () => {
    expect({ ...DEFAULT_STAGE_DURATIONS }).toEqual({
      site_survey: 14,
      stand_load_check: 14,
      aquascape: 7,
      fill_leak_test: 3,
      cycling: 42,
      first_stocking: 42,
      in_service: null,
    });
  });

  it("a company may set from 1 to 365 whole days, no fewer and no more", () => {
    expect(DURATION_BOUNDS).toEqual({ min: 1, max: 365 });
    expect(validateStageDurations({ aquascape: 1, cycling: 365 })).toEqual([]);
    expect(validateStageDurations({ aquascape: 0 })).toEqual([{ stage: "aquascape", message: "Aquascape: give a whole number of days from 1 to 365." }]);
    expect(validateStageDurations({ cycling: 366 })).toEqual([{ stage: "cycling", message: "Cycling: give a whole number of days from 1 to 365." }]);
  });
});
