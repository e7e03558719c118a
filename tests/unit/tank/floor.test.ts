import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { FLOOR_CAUTIONS } from "@/lib/tank/cautions";
import { FAR_OVER_RATIO, floorMethod, screenFloor, type FloorScreenInput } from "@/lib/tank/floor";
import {
  BS8004_LOWEST_BEARING_KPA,
  EN_UK_CONCENTRATED_KN,
  EN_UK_UNIFORM_KPA,
  FLOOR_CODE_VALUES,
  IRC_LIVE_LOAD_PSF,
  IRC_LOWEST_BEARING_PSF,
} from "@/lib/tank/floor-codes";
import { joistLoadEffects, mostLoadedJoistShare, type JoistInput } from "@/lib/tank/joist";
import { computeLoad } from "@/lib/tank/load";
import { STANDARD_GRAVITY } from "@/lib/tank/units";
import { bareRectangular } from "./fixtures";

describe("code values", () => {
  it("US residential code live loads and bearing value", () => {
    expect(IRC_LIVE_LOAD_PSF).toEqual({ living: 40, sleeping: 30 }); // IRC Table R301.5 (from memory)
    expect(IRC_LOWEST_BEARING_PSF).toBe(1500); // IRC Table R401.4.1, clays and silts (from memory)
    const irc = FLOOR_CODE_VALUES["us-irc"];
    expect(irc.liveLoadKPa.living).toBeCloseTo(1.915210359, 9); // 40 × 0.0478802589803 kPa/psf (NIST Handbook 44, derived)
    expect(irc.liveLoadKPa.sleeping).toBeCloseTo(1.436407769, 9); // 30 × 0.0478802589803
    expect(irc.lowestBearingKPa).toBeCloseTo(71.82038847, 7); // 1500 × 0.0478802589803
    expect(irc.concentratedKN).toBeNull();
  });

  it("EN 1991-1-1 with the UK National Annex, and BS 8004's lowest bearing value", () => {
    expect(EN_UK_UNIFORM_KPA).toBe(1.5); // UK NA to BS EN 1991-1-1, Table NA.2, A1 (from memory)
    expect(EN_UK_CONCENTRATED_KN).toBe(2.0); // same table (from memory)
    expect(BS8004_LOWEST_BEARING_KPA).toBe(75); // BS 8004:1986 Table 1, firm clay lower limit (from memory)
    const en = FLOOR_CODE_VALUES["en-uk"];
    expect(en.liveLoadKPa).toEqual({ living: 1.5, sleeping: 1.5 });
    expect(en.concentratedKN).toBe(2.0);
  });

  it("'far over' starts above twice the allowance (our own threshold)", () => {
    expect(FAR_OVER_RATIO).toBe(2);
  });
});

describe("floorMethod", () => {
  it("joists for timber and raised floors, slab only on the ground, nothing otherwise", () => {
    expect(floorMethod("timber joists")).toBe("joists");
    expect(floorMethod("raised")).toBe("joists"); // raised floors stand on joists: they must get the joist checks
    expect(floorMethod("concrete slab", "ground")).toBe("slab");
    expect(floorMethod("concrete slab", "basement")).toBe("slab");
    expect(floorMethod("concrete slab", "upper")).toBe("none");
    expect(floorMethod("concrete slab", null)).toBe("none");
    expect(floorMethod("suspended concrete", "ground")).toBe("none");
    expect(floorMethod("other", "ground")).toBe("none");
  });
});

// Hand-worked joist cases. EN 1991-1-1 UK NA: q = 1.5 kN/m². Joists 4.0 m span at 400 mm:
//   w = q·s = 1.5 × 0.4 = 0.6 kN/m; M_allow = w·L²/8 = 0.6 × 16 / 8 = 1.2 kN·m; V_allow = w·L/2 = 1.2 kN
// (AISC Manual Table 3-23 case 1, simple beam with uniform load). Tank load W = 3.0 kN on a solid
// 1200 × 500 mm base. Load at x from a support on span L: M = P·x·(L − x)/L, V = P·max(x, L − x)/L
// (AISC Manual Table 3-23 case 7, concentrated load at any point).
const standSolid = { lengthMm: 1200, widthMm: 500, footprint: { kind: "solid" as const, lengthMm: 1200, widthMm: 500 } };
const joistCase = (over: Partial<JoistInput> = {}): JoistInput => ({
  totalWeightKN: 3,
  spanMm: 4000,
  spacingMm: 400,
  distanceFromSupportMm: 1750,
  liveLoadKPa: 1.5,
  direction: "perpendicular",
  stand: standSolid,
  ...over,
});

describe("joistLoadEffects: hand-worked cases", () => {
  it("mid-span, across the joists: 83 % (bending governs)", () => {
    // across 1200 mm at 400 mm → floor(1200/400) = 3 joists, P = 1.0 kN; x = 1.75 + 0.5/2 = 2.0 m
    // M = 1.0 × 2 × 2 / 4 = 1.0 kN·m → 1.0/1.2 = 83.3 %; V = 1.0 × 2/4 = 0.5 kN → 41.7 %
    const e = joistLoadEffects(joistCase());
    expect(e.joistsUnder).toBe(3);
    expect(e.loadKN).toBeCloseTo(1.0, 12);
    expect(e.positionMm).toBeCloseTo(2000, 9);
    expect(e.allowMomentKNm).toBeCloseTo(1.2, 12);
    expect(e.allowShearKN).toBeCloseTo(1.2, 12);
    expect(e.momentKNm).toBeCloseTo(1.0, 12);
    expect(e.shearKN).toBeCloseTo(0.5, 12);
    expect(e.momentShare).toBeCloseTo(0.833333, 6);
    expect(e.share).toBeCloseTo(0.833333, 6);
  });

  it("near a bearing wall: 100 mm off it, 76 % (end shear governs)", () => {
    // x = 0.1 + 0.25 = 0.35 m; M = 1.0 × 0.35 × 3.65 / 4 = 0.319375 kN·m → 26.6 %;
    // V = 1.0 × 3.65 / 4 = 0.9125 kN → 76.0 %
    const e = joistLoadEffects(joistCase({ distanceFromSupportMm: 100 }));
    expect(e.momentKNm).toBeCloseTo(0.319375, 9);
    expect(e.shearKN).toBeCloseTo(0.9125, 9);
    expect(e.momentShare).toBeCloseTo(0.266146, 6);
    expect(e.shearShare).toBeCloseTo(0.760417, 6);
    expect(e.share).toBeCloseTo(0.760417, 6);
  });

  it("along the joists at mid-span: 250 %, far over", () => {
    // across 500 mm at 400 mm → 1 joist carries all 3.0 kN; along = 1.2 m, x = 1.4 + 0.6 = 2.0 m
    // M = 3 × 2 × 2 / 4 = 3.0 kN·m → 250 %; V = 1.5 kN → 125 %
    const e = joistLoadEffects(joistCase({ direction: "parallel", distanceFromSupportMm: 1400 }));
    expect(e.joistsUnder).toBe(1);
    expect(e.momentKNm).toBeCloseTo(3.0, 12);
    expect(e.share).toBeCloseTo(2.5, 12);
  });

  it("legs concentrate the load: across the joists the two legs at one end share a joist", () => {
    // 4 legs → the front and back leg at one end: 2/4 = 0.5 of the weight (more than 1/3 for a solid base)
    const legs = { ...standSolid, footprint: { kind: "legs" as const, count: 4, legLengthMm: 80, legWidthMm: 80 } };
    expect(mostLoadedJoistShare(legs, 400, "perpendicular")).toEqual({ joistsUnder: 3, loadShare: 0.5 });
    // along the joists with the stand wider than the spacing: a row of 2 of the 4 legs
    expect(mostLoadedJoistShare(legs, 400, "parallel").loadShare).toBe(0.5);
    // narrower than the spacing: every leg may sit on one joist
    expect(mostLoadedJoistShare({ ...legs, widthMm: 350 }, 400, "parallel").loadShare).toBe(1);
  });

  it("a row is half the legs rounded up, and two legs across the joists put everything on one", () => {
    const withLegs = (count: number) => ({ ...standSolid, footprint: { kind: "legs" as const, count, legLengthMm: 80, legWidthMm: 80 } });
    // 6 legs in two rows of 3; 5 legs: a row of 3
    expect(mostLoadedJoistShare(withLegs(6), 400, "parallel").loadShare).toBe(3 / 6);
    expect(mostLoadedJoistShare(withLegs(5), 400, "parallel").loadShare).toBe(3 / 5);
    expect(mostLoadedJoistShare(withLegs(2), 400, "perpendicular").loadShare).toBe(1);
    expect(mostLoadedJoistShare(withLegs(6), 400, "perpendicular").loadShare).toBe(2 / 6);
    // A stand exactly as wide as the spacing puts its rows on two joists: still half the legs each.
    expect(mostLoadedJoistShare({ ...withLegs(4), widthMm: 400 }, 400, "parallel").loadShare).toBe(0.5);
  });

  it("a stand past the span is flagged", () => {
    expect(joistLoadEffects(joistCase({ distanceFromSupportMm: 3600 })).beyondSpan).toBe(true);
    expect(joistLoadEffects(joistCase({ distanceFromSupportMm: 3500 })).beyondSpan).toBe(false);
  });
});

describe("joist properties", () => {
  it("moving a tank towards a bearing support never raises the moment share", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 2500, max: 8000 }),
        fc.integer({ min: 300, max: 900 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (span, along, f1, f2) => {
          const room = span / 2 - along / 2; // keep the stand's centre on the near half
          const [near, far] = [Math.min(f1, f2) * room, Math.max(f1, f2) * room];
          const stand = { lengthMm: 1500, widthMm: along, footprint: { kind: "solid" as const, lengthMm: 1500, widthMm: along } };
          const a = joistLoadEffects(joistCase({ spanMm: span, stand, distanceFromSupportMm: near }));
          const b = joistLoadEffects(joistCase({ spanMm: span, stand, distanceFromSupportMm: far }));
          expect(a.momentShare).toBeLessThanOrEqual(b.momentShare + 1e-12);
        },
      ),
    );
  });

  it("more joists under the tank never raises the share", () => {
    fc.assert(
      fc.property(fc.integer({ min: 500, max: 3000 }), fc.integer({ min: 0, max: 2000 }), fc.constantFrom(300, 400, 450, 600), (long, more, spacing) => {
        const stand = (l: number) => ({ lengthMm: l, widthMm: 500, footprint: { kind: "solid" as const, lengthMm: l, widthMm: 500 } });
        const few = joistLoadEffects(joistCase({ spacingMm: spacing, stand: stand(long) }));
        const many = joistLoadEffects(joistCase({ spacingMm: spacing, stand: stand(long + more) }));
        expect(many.joistsUnder).toBeGreaterThanOrEqual(few.joistsUnder);
        expect(many.share).toBeLessThanOrEqual(few.share + 1e-12);
      }),
    );
  });
});

const joistFloor = (over: Partial<FloorScreenInput> = {}): FloorScreenInput => ({
  totalWeightKN: 3,
  pressureKPa: 5,
  stand: standSolid,
  roomUse: "living",
  floorType: "timber joists",
  code: "en-uk",
  joists: { spanMm: 4000, spacingMm: 400, direction: "perpendicular", distanceFromSupportMm: 1750 },
  ...over,
});

describe("screenFloor on joists", () => {
  it("reports the share and cites the beam formulas and the code", () => {
    const r = screenFloor(joistFloor());
    expect(r.method).toBe("joists");
    expect(r.verdict).toBe("under");
    expect(r.ratio).toBeCloseTo(0.833333, 6);
    expect(r.needsEngineer).toBe(false);
    expect(r.sources.join(" ")).toContain("AISC");
    expect(r.sources.join(" ")).toContain("NA.2");
    expect(r.cautions).toBe(FLOOR_CAUTIONS);
  });

  it("over 100 % needs the engineer; along the joists is far over", () => {
    const r = screenFloor(joistFloor({ joists: { spanMm: 4000, spacingMm: 400, direction: "parallel", distanceFromSupportMm: 1400 } }));
    expect(r.verdict).toBe("far over");
    expect(r.needsEngineer).toBe(true);
    expect(r.messages.some((m) => m.includes("fewer of them"))).toBe(true);
  });

  it("an unknown direction takes the worse way round", () => {
    const r = screenFloor(joistFloor({ joists: { spanMm: 4000, spacingMm: 400, direction: "unknown", distanceFromSupportMm: 1400 } }));
    expect(r.joists?.direction).toBe("parallel");
    expect(r.messages.some((m) => m.includes("isn't known"))).toBe(true);
  });

  it("raised floors get the same joist and bearing-wall checks", () => {
    const timber = screenFloor(joistFloor());
    const raised = screenFloor(joistFloor({ floorType: "raised" }));
    expect(raised.method).toBe("joists");
    expect(raised.joists).toEqual(timber.joists);
    const raisedFar = screenFloor(joistFloor({ floorType: "raised", joists: { spanMm: 4000, spacingMm: 400, direction: "parallel", distanceFromSupportMm: 1400 } }));
    expect(raisedFar.needsEngineer).toBe(true);
  });

  it("missing joist figures mean no screening and the engineer decides", () => {
    const r = screenFloor(joistFloor({ joists: { spanMm: 4000, spacingMm: null, direction: "perpendicular", distanceFromSupportMm: 100 } }));
    expect(r.verdict).toBe("not screened");
    expect(r.needsEngineer).toBe(true);
  });

  it("the US code's 40 psf gives a larger allowance than 1.5 kN/m²", () => {
    // w = 1.915210 × 0.4 = 0.766084 kN/m; M_allow = 0.766084 × 16/8 = 1.532168 kN·m; 1.0/1.532168 = 65.3 %
    const r = screenFloor(joistFloor({ code: "us-irc" }));
    expect(r.joists?.allowMomentKNm).toBeCloseTo(1.532168, 5);
    expect(r.ratio).toBeCloseTo(0.652670, 5);
  });

  it("an 'under' verdict never gets the 'far over' words (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 30, noNaN: true }), fc.integer({ min: 0, max: 1700 }), fc.constantFrom("perpendicular" as const, "parallel" as const, "unknown" as const), (w, a, direction) => {
        const r = screenFloor(joistFloor({ totalWeightKN: w, joists: { spanMm: 4000, spacingMm: 400, direction, distanceFromSupportMm: a } }));
        if (r.verdict === "under") expect(r.messages.some((m) => m.includes("far more") || m.includes("strengthening"))).toBe(false);
        if (r.verdict === "far over") expect(r.messages.some((m) => m.includes("far more"))).toBe(true);
        expect(r.needsEngineer).toBe(r.verdict !== "under");
      }),
    );
  });
});

describe("screenFloor on a ground-bearing slab", () => {
  it("the 1500 × 600 × 600 mm tank on a ground-floor slab is well within the ground's bearing value", () => {
    // Footprint pressure against IRC Table R401.4.1's lowest value, 1,500 psf = 71.820 kPa (from memory).
    const design = { ...bareRectangular(1500, 600, 600, 10), stand: { massKg: 60, lengthMm: 1500, widthMm: 600, footprint: { kind: "solid" as const, lengthMm: 1500, widthMm: 600 } } };
    const load = computeLoad(design);
    const r = screenFloor({
      totalWeightKN: (load.totalInstalledMassKg * STANDARD_GRAVITY) / 1000,
      pressureKPa: load.floorPressureKPa,
      stand: design.stand,
      roomUse: "living",
      floorType: "concrete slab",
      floorLevel: "ground",
      code: "us-irc",
    });
    expect(r.method).toBe("slab");
    expect(r.slab?.bearingKPa).toBeCloseTo(71.82039, 4);
    expect(r.ratio).toBeCloseTo(load.floorPressureKPa / 71.82038847, 9);
    expect(r.ratio).toBeLessThan(0.2);
    expect(r.verdict).toBe("under");
    expect(r.needsEngineer).toBe(false);
    expect(r.messages.some((m) => m.includes("pipes, drains or cables"))).toBe(true);
  });

  it("hand-worked: 8.0 kPa against 75 kPa (BS 8004) is 10.7 %", () => {
    const r = screenFloor(joistFloor({ floorType: "concrete slab", floorLevel: "ground", pressureKPa: 8, joists: undefined }));
    expect(r.ratio).toBeCloseTo(8 / 75, 12);
  });

  it("suspended concrete and unknown floors are not screened", () => {
    for (const r of [
      screenFloor(joistFloor({ floorType: "suspended concrete" })),
      screenFloor(joistFloor({ floorType: "other" })),
      screenFloor(joistFloor({ floorType: "concrete slab", floorLevel: "upper" })),
    ]) {
      expect(r.verdict).toBe("not screened");
      expect(r.ratio).toBeNull();
      expect(r.needsEngineer).toBe(true);
      expect(r.cautions).toBe(FLOOR_CAUTIONS);
    }
  });
});
