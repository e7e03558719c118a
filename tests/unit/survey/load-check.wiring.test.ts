import { describe, expect, it } from "vitest";
import { loadCheck } from "@/lib/survey/load-check";
import { screenFloor } from "@/lib/tank/floor";
import { computeLoad } from "@/lib/tank/load";
import { checkAccess } from "@/lib/tank/access";
import { outerPlanExtentMm } from "@/lib/tank/geometry";
import { STANDARD_GRAVITY } from "@/lib/tank/units";
import { completeSurvey, heavyDesign, joistSurvey, lightDesign } from "./fixtures";

// The load check only wires lib/tank's checks to the survey: these tests pin that wiring, so the page
// and the sheet screen exactly the weight, pressure and floor the design and survey describe.
describe("the load check's wiring", () => {
  it("screens the floor with the installed weight in kN (standard gravity, 9.80665 m/s², CGPM 1901) and the survey's floor", () => {
    const design = heavyDesign();
    const survey = joistSurvey();
    const load = computeLoad(design);
    const expected = screenFloor({
      totalWeightKN: (load.totalInstalledMassKg * 9.80665) / 1000,
      pressureKPa: load.floorPressureKPa,
      stand: design.stand,
      roomUse: survey.roomUse!,
      floorType: survey.floorType!,
      floorLevel: survey.floorLevel,
      code: "en-uk",
      joists: { spanMm: survey.joistSpanMm, spacingMm: survey.joistSpacingMm, direction: survey.joistDirection, distanceFromSupportMm: survey.bearingWallDistanceMm },
    });
    expect(STANDARD_GRAVITY).toBe(9.80665);
    expect(loadCheck(design, survey, "en-uk").floor).toEqual(expected);
  });
  it("passes no joists for a floor that has none", () => {
    const design = lightDesign();
    const survey = { ...completeSurvey(), joistSpanMm: 3600, joistSpacingMm: 400 };
    const load = computeLoad(design);
    const slab = screenFloor({
      totalWeightKN: (load.totalInstalledMassKg * STANDARD_GRAVITY) / 1000,
      pressureKPa: load.floorPressureKPa,
      stand: design.stand,
      roomUse: survey.roomUse!,
      floorType: survey.floorType!,
      floorLevel: survey.floorLevel,
      code: undefined,
      joists: undefined,
    });
    expect(loadCheck(design, survey).floor).toEqual(slab);
  });
  it("waits for both the room's use and the floor's kind", () => {
    expect(loadCheck(lightDesign(), { ...completeSurvey(), roomUse: undefined }).floor).toBeNull();
    expect(loadCheck(lightDesign(), { ...completeSurvey(), floorType: undefined }).floor).toBeNull();
  });
  it("asks for an engineer exactly when the floor screen does", () => {
    const r = loadCheck(heavyDesign(), joistSurvey());
    expect(r.needsEngineerReference).toBe(r.floor!.needsEngineer);
    expect(loadCheck(lightDesign(), completeSurvey()).needsEngineerReference).toBe(false);
  });
  it("checks the tank and the assembled stand against the narrowest door, and says which won't go", () => {
    const design = lightDesign();
    const door = { doorWidthMm: 250, doorHeightMm: 700 };
    const r = loadCheck(design, { ...completeSurvey(), ...door, roomLengthMm: undefined, roomWidthMm: undefined, ceilingHeightMm: undefined });
    const extent = outerPlanExtentMm(design);
    expect(r.access).toEqual({
      ...door,
      tank: checkAccess({ itemLengthMm: extent.lengthMm, itemWidthMm: extent.widthMm, itemHeightMm: design.heightMm, ...door }),
      stand: checkAccess({ itemLengthMm: design.stand.lengthMm, itemWidthMm: design.stand.widthMm, itemHeightMm: design.stand.heightMm!, ...door }),
    });
    expect(r.access?.tank.fits).toBe(false);
    expect(r.access?.stand?.fits).toBe(false);
    expect(r.siteWarnings).toEqual([
      "The tank won't get through the narrowest door as one piece: see the door check.",
      "The stand won't get through the narrowest door assembled: build it in the room.",
    ]);
    // No stand height: no stand check, and no warning about it.
    const noHeight = { ...design, stand: { ...design.stand, heightMm: undefined } };
    const r2 = loadCheck(noHeight, { ...completeSurvey(), ...door, roomLengthMm: undefined, roomWidthMm: undefined, ceilingHeightMm: undefined });
    expect(r2.access?.stand).toBeNull();
    expect(r2.siteWarnings).toEqual(["The tank won't get through the narrowest door as one piece: see the door check."]);
    // A wide door: no warning.
    expect(loadCheck(design, { ...completeSurvey(), doorWidthMm: 2000, doorHeightMm: 2400, roomLengthMm: undefined, roomWidthMm: undefined, ceilingHeightMm: undefined }).siteWarnings).toEqual([]);
  });
  it("compares the tank with the room either way round, and warns only when it is larger", () => {
    const design = lightDesign(); // 1200 × 600 stand and tank
    const room = (l: number, w: number) => loadCheck(design, { ...completeSurvey(), doorWidthMm: undefined, doorHeightMm: undefined, ceilingHeightMm: undefined, roomLengthMm: l, roomWidthMm: w }).siteWarnings;
    const larger = ["The tank and stand are larger than the room as measured: check the room's sizes and the tank's."];
    expect(room(600, 1200)).toEqual([]);
    expect(room(1200, 600)).toEqual([]);
    expect(room(1199, 3000)).toEqual([]);
    expect(room(599, 3000)).toEqual(larger);
    expect(room(1100, 1100)).toEqual(larger);
  });
  it("warns when the stand and tank together reach above the ceiling, not when they just meet it", () => {
    const design = lightDesign();
    const tall = design.stand.heightMm! + design.heightMm;
    const at = (ceilingHeightMm: number) => loadCheck(design, { ...completeSurvey(), doorWidthMm: undefined, doorHeightMm: undefined, roomLengthMm: undefined, roomWidthMm: undefined, ceilingHeightMm }).siteWarnings;
    expect(at(tall)).toEqual([]);
    expect(at(tall - 1)).toEqual(["The stand and tank together are taller than the ceiling as measured."]);
  });
  it("waits for both of a pair of sizes, and for the stand's height before the ceiling check", () => {
    const base = { ...completeSurvey(), doorWidthMm: undefined, doorHeightMm: undefined, roomLengthMm: undefined, roomWidthMm: undefined, ceilingHeightMm: undefined };
    expect(loadCheck(lightDesign(), { ...base, doorWidthMm: 100 }).access).toBeNull();
    expect(loadCheck(lightDesign(), { ...base, doorHeightMm: 100 }).access).toBeNull();
    expect(loadCheck(lightDesign(), { ...base, roomLengthMm: 100 }).siteWarnings).toEqual([]);
    expect(loadCheck(lightDesign(), { ...base, roomWidthMm: 100 }).siteWarnings).toEqual([]);
    const noHeight = { ...lightDesign(), stand: { ...lightDesign().stand, heightMm: undefined } };
    expect(loadCheck(noHeight, { ...base, ceilingHeightMm: 100 }).siteWarnings).toEqual([]);
  });
  it("turns a stand set crosswise to match the room's long side", () => {
    const design = lightDesign();
    const crosswise = { ...design, stand: { ...design.stand, lengthMm: 600, widthMm: 1200, footprint: { kind: "solid" as const, lengthMm: 600, widthMm: 1200 } } };
    const base = { ...completeSurvey(), doorWidthMm: undefined, doorHeightMm: undefined, ceilingHeightMm: undefined };
    expect(loadCheck(crosswise, { ...base, roomLengthMm: 1250, roomWidthMm: 650 }).siteWarnings).toEqual([]);
    expect(loadCheck(crosswise, { ...base, roomLengthMm: 1250, roomWidthMm: 590 }).siteWarnings).toEqual(["The tank and stand are larger than the room as measured: check the room's sizes and the tank's."]);
  });
});
