import { describe, expect, it } from "vitest";
import { designFromForm, designToForm } from "@/lib/survey/design-form";
import { fromFieldText, toFieldText } from "@/lib/survey/form-values";
import { surveyFromForm, surveyToForm } from "@/lib/survey/survey-form";
import { tankDesignSchema } from "@/lib/survey/tank-design.schema";
import { completeSurvey, heavyDesign, lightDesign } from "./fixtures";

describe("form values", () => {
  it("shows SI values in the person's units and reads them back", () => {
    // 1 in = 25.4 mm exactly (NIST Handbook 44, Appendix C).
    expect(toFieldText("length", 254, "imperial")).toBe("10");
    expect(fromFieldText("length", "10", "imperial")).toBeCloseTo(254, 9);
    expect(toFieldText("length", 820, "metric")).toBe("820");
    expect(fromFieldText("mass", "2,5", "metric")).toBe(2.5);
    expect(fromFieldText("length", "", "metric")).toBeUndefined();
    expect(fromFieldText("length", "abc", "metric")).toBeNaN();
  });
});

describe("design form", () => {
  it("round-trips a stored design exactly in imperial when nothing was changed", () => {
    for (const design of [lightDesign(), heavyDesign()]) {
      const form = designToForm(design, "imperial");
      expect(designFromForm(form, "imperial", design)).toEqual(design);
    }
  });

  it("converts a changed field from inches to millimetres", () => {
    const design = lightDesign();
    const form = designToForm(design, "imperial");
    form.lengthMm = "30";
    const back = designFromForm(form, "imperial", design);
    expect(back.lengthMm).toBeCloseTo(762, 9);
    expect(back.widthMm).toBe(300);
  });

  it("builds the shape and footprint that the form chose, and the schema accepts it", () => {
    const form = designToForm(null, "metric");
    Object.assign(form, { shape: "cylinder", diameterMm: "900", heightMm: "1200", panelThicknessMm: "15", waterBelowRimMm: "50", temperatureC: "25" });
    form.substrate = { type: "none", depthMm: "" };
    form.stand = { massKg: "80", lengthMm: "1000", widthMm: "1000", heightMm: "", footprint: { kind: "legs", count: "4", legLengthMm: "80", legWidthMm: "80", lengthMm: "", widthMm: "" } };
    const design = designFromForm(form, "metric");
    expect(design).not.toHaveProperty("lengthMm");
    expect(design.stand).toEqual({ massKg: 80, lengthMm: 1000, widthMm: 1000, footprint: { kind: "legs", count: 4, legLengthMm: 80, legWidthMm: 80 } });
    expect(tankDesignSchema.safeParse(design).success).toBe(true);
  });
});

describe("survey form", () => {
  it("round-trips a stored survey in imperial without drift", () => {
    const survey = completeSurvey();
    const back = surveyFromForm(surveyToForm(survey, "imperial"), "imperial", survey);
    for (const [k, v] of Object.entries(survey)) expect(back[k as keyof typeof back], k).toEqual(v);
    expect(back.joistDirection).toBeNull();
  });

  it("turns yes/no into true/false and blanks into null", () => {
    const form = surveyToForm(null, "metric");
    form.stairs = "no";
    form.doorWidthMm = "810";
    const s = surveyFromForm(form, "metric");
    expect(s.stairs).toBe(false);
    expect(s.doorWidthMm).toBe(810);
    expect(s.roomUse).toBeNull();
  });
});
