import { describe, expect, it } from "vitest";
import { isSurveyComplete, requiredSurveyFields, surveyMissingFields } from "@/lib/survey/survey-missing";
import { siteSurveySchema } from "@/lib/survey/site-survey.schema";
import { completeSurvey } from "./fixtures";

describe("surveyMissingFields", () => {
  it("names every required field of an empty survey, joist details included until the floor is known", () => {
    const missing = surveyMissingFields({});
    expect(missing).toContain("roomUse");
    expect(missing).toContain("floorType");
    expect(missing).toContain("doorWidthMm");
    expect(missing).toContain("joistDirection");
    expect(missing).not.toContain("notes");
    expect(surveyMissingFields(null)).toEqual(missing);
  });

  it("is empty for a finished survey on a slab, which needs no joist details", () => {
    expect(surveyMissingFields(completeSurvey())).toEqual([]);
    expect(isSurveyComplete(completeSurvey())).toBe(true);
  });

  it("asks for the joists, and the distance from a bearing wall, on a joisted or raised floor", () => {
    for (const floorType of ["timber joists", "raised"] as const) {
      const missing = surveyMissingFields({ ...completeSurvey(), floorType });
      expect(missing).toEqual(["joistDirection", "joistSpanMm", "joistSpacingMm", "bearingWallDistanceMm"]);
    }
    const done = { ...completeSurvey(), floorType: "timber joists" as const, joistDirection: "perpendicular" as const, joistSpanMm: 3600, joistSpacingMm: 400, bearingWallDistanceMm: 0 };
    expect(surveyMissingFields(done)).toEqual([]);
  });

  it("counts zero, false and 'no' as answers, but not null or blank text", () => {
    const s = { ...completeSurvey(), stairs: false, outletsWithinReach: 0, waterSupplyDistanceMm: 0 };
    expect(surveyMissingFields(s)).toEqual([]);
    expect(surveyMissingFields({ ...s, outletsWithinReach: null })).toEqual(["outletsWithinReach"]);
    expect(surveyMissingFields({ ...s, roomUse: null, doorWidthMm: undefined })).toEqual(["roomUse", "doorWidthMm"]);
  });

  it("lists fields in form order", () => {
    const order = requiredSurveyFields({});
    expect(order.indexOf("roomUse")).toBeLessThan(order.indexOf("doorWidthMm"));
    expect(order.indexOf("doorWidthMm")).toBeLessThan(order.indexOf("sunExposure"));
  });
});

describe("siteSurveySchema", () => {
  it("accepts a draft with nothing filled in, and a finished survey", () => {
    expect(siteSurveySchema.safeParse({}).success).toBe(true);
    expect(siteSurveySchema.safeParse(completeSurvey()).success).toBe(true);
  });

  it("refuses zero, negative, absurd and non-numeric sizes with a message per field", () => {
    const r = siteSurveySchema.safeParse({ doorWidthMm: 0, roomLengthMm: -4000, doorHeightMm: 25_000, joistSpanMm: Number.NaN, turns: 1.5 });
    expect(r.success).toBe(false);
    const byField = Object.fromEntries(r.error!.issues.map((i) => [i.path.join("."), i.message]));
    expect(byField.doorWidthMm).toMatch(/more than zero/);
    expect(byField.roomLengthMm).toMatch(/more than zero/);
    expect(byField.doorHeightMm).toMatch(/over 10 m/);
    expect(byField.joistSpanMm).toMatch(/number/);
    expect(byField.turns).toMatch(/whole number/);
  });

  it("allows a tank right against a bearing wall (zero distance)", () => {
    expect(siteSurveySchema.safeParse({ bearingWallDistanceMm: 0 }).success).toBe(true);
  });

  it("refuses a floor type it doesn't know", () => {
    expect(siteSurveySchema.safeParse({ floorType: "trampoline" }).success).toBe(false);
  });
});
