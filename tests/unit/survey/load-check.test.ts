import { describe, expect, it } from "vitest";
import { loadCheck } from "@/lib/survey/load-check";
import { tankDesignSchema } from "@/lib/survey/tank-design.schema";
import { ALL_CAUTIONS } from "@/lib/tank/cautions";
import { FLOOR_CODE_VALUES } from "@/lib/tank/floor-codes";
import { completeSurvey, heavyDesign, joistSurvey, lightDesign } from "./fixtures";

describe("loadCheck", () => {
  it("screens a small tank on a ground-floor slab against the ground's bearing value", () => {
    const r = loadCheck(lightDesign(), completeSurvey());
    expect(r.floor?.method).toBe("slab");
    // Lowest presumptive bearing value, 1,500 psf: IRC Table R401.4.1 (from memory).
    expect(r.floor?.slab?.bearingKPa).toBe(FLOOR_CODE_VALUES["us-irc"].lowestBearingKPa);
    expect(r.floor?.verdict).toBe("under");
    expect(r.needsEngineerReference).toBe(false);
    expect(r.glass.ok).toBe(true);
    expect(r.cautions).toEqual(ALL_CAUTIONS);
  });

  it("a reef tank on a slab screens within the ground's bearing value", () => {
    const r = loadCheck(heavyDesign(), completeSurvey());
    expect(r.floor?.verdict).toBe("under");
  });

  it("screens with the company's code: 1.5 kN/m² (EN 1991-1-1 UK NA) gives a smaller allowance than 40 psf", () => {
    const us = loadCheck(lightDesign(), joistSurvey(), "us-irc");
    const uk = loadCheck(lightDesign(), joistSurvey(), "en-uk");
    expect(us.floor?.ratedKPa).toBeCloseTo(1.915210359, 9); // IRC Table R301.5, 40 psf
    expect(uk.floor?.ratedKPa).toBe(1.5); // UK NA Table NA.2
    expect(uk.floor?.ratio).toBeGreaterThan(us.floor?.ratio ?? Infinity);
  });

  it("asks for an engineer when a reef tank is far over the joists' allowance", () => {
    const r = loadCheck(heavyDesign(), joistSurvey());
    expect(r.floor?.verdict).toBe("far over");
    expect(r.needsEngineerReference).toBe(true);
    expect(r.load.loadPerLegKg).toBeCloseTo(r.load.totalInstalledMassKg / 6, 9);
  });

  it("skips the floor and door checks until the survey has them", () => {
    const r = loadCheck(lightDesign(), null);
    expect(r.floor).toBeNull();
    expect(r.access).toBeNull();
    expect(r.needsEngineerReference).toBe(false);
  });

  it("warns, without refusing, when the tank is bigger than the door or the room", () => {
    const design = { ...heavyDesign(), lengthMm: 3000, widthMm: 1200, heightMm: 1100 };
    design.stand = { ...design.stand, lengthMm: 3000, widthMm: 1200 };
    const survey = { ...completeSurvey(), doorWidthMm: 700, doorHeightMm: 1950, roomLengthMm: 2800, roomWidthMm: 2500 };
    const r = loadCheck(design, survey);
    expect(r.access?.tank.fits).toBe(false);
    expect(r.siteWarnings.some((w) => w.includes("narrowest door"))).toBe(true);
    expect(r.siteWarnings.some((w) => w.includes("larger than the room"))).toBe(true);
  });

  it("warns when a tank on joists runs along them", () => {
    const survey = { ...completeSurvey(), floorType: "timber joists" as const, joistDirection: "parallel" as const, joistSpanMm: 3600, joistSpacingMm: 400, bearingWallDistanceMm: 1500 };
    const r = loadCheck(lightDesign(), survey);
    expect(r.floor?.messages.join(" ")).toMatch(/along the joists/);
    expect(r.floor?.joists?.direction).toBe("parallel");
  });
});

describe("tankDesignSchema", () => {
  const fields = (input: unknown) => {
    const r = tankDesignSchema.safeParse(input);
    return r.success ? {} : Object.fromEntries(r.error.issues.map((i) => [i.path.join("."), i.message]));
  };

  it("accepts the fixture designs", () => {
    expect(fields(lightDesign())).toEqual({});
    expect(fields(heavyDesign())).toEqual({});
  });

  it("turns validateDesign's problems into field messages", () => {
    expect(fields({ ...lightDesign(), lengthMm: 0 })).toHaveProperty("lengthMm");
    expect(fields({ ...lightDesign(), widthMm: -300 })).toHaveProperty("widthMm");
    expect(fields({ ...lightDesign(), lengthMm: 12_000 }).lengthMm).toMatch(/over 10 m/);
    expect(fields({ ...lightDesign(), waterBelowRimMm: -10 }).waterBelowRimMm).toMatch(/below the rim/);
    expect(fields({ ...lightDesign(), panelThicknessMm: 200 }).panelThicknessMm).toMatch(/too thick/);
  });

  it("names a missing or non-numeric value", () => {
    const { heightMm: _omit, ...noHeight } = lightDesign();
    expect(fields(noHeight).heightMm).toMatch(/Enter the height/);
    expect(fields({ ...lightDesign(), rockMassKg: "lots" })).toHaveProperty("rockMassKg");
    expect(fields({ ...lightDesign(), rockMassKg: 90_000 }).rockMassKg).toMatch(/check the units/);
  });
});
