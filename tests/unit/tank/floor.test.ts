import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { SCREENING_ONLY } from "@/lib/tank/cautions";
import { BEARING_WALL_NEAR_MM, FAR_OVER_RATIO, IRC_LIVE_LOAD_PSF, screenFloor } from "@/lib/tank/floor";
import { computeLoad } from "@/lib/tank/load";
import { psfToKpa } from "@/lib/tank/units";
import { demoDesign } from "./fixtures";

describe("rated live loads", () => {
  it("match IRC Table R301.5", () => {
    expect(IRC_LIVE_LOAD_PSF.living).toBe(40); // IRC Table R301.5: rooms other than sleeping rooms, 40 psf
    expect(IRC_LIVE_LOAD_PSF.sleeping).toBe(30); // IRC Table R301.5: sleeping rooms, 30 psf
  });

  it("are reported in both units", () => {
    const r = screenFloor({ pressureKPa: 1, roomUse: "living", floorType: "concrete slab" });
    expect(r.ratedPsf).toBe(40);
    expect(r.ratedKPa).toBeCloseTo(1.915210359, 9); // 40 × 0.0478802589803 (NIST Handbook 44 derived)
    const s = screenFloor({ pressureKPa: 1, roomUse: "sleeping", floorType: "concrete slab" });
    expect(s.ratedKPa).toBeCloseTo(1.436407769, 9); // 30 × 0.0478802589803
  });

  it("'far over' starts above twice the rating (our own threshold)", () => {
    expect(FAR_OVER_RATIO).toBe(2);
    expect(BEARING_WALL_NEAR_MM).toBe(600);
  });
});

describe("screenFloor verdicts", () => {
  it("under the rating", () => {
    const r = screenFloor({ pressureKPa: 1.5, roomUse: "living", floorType: "timber joists", joistDirection: "perpendicular", distanceFromBearingWallMm: 300 });
    expect(r.verdict).toBe("under");
    expect(r.ratio).toBeCloseTo(0.78320, 5); // 1.5 / 1.915210
    expect(r.needsEngineer).toBe(false);
  });

  it("the same tank is over in a bedroom", () => {
    const r = screenFloor({ pressureKPa: 1.5, roomUse: "sleeping", floorType: "timber joists", joistDirection: "perpendicular" });
    expect(r.verdict).toBe("over");
    expect(r.ratio).toBeCloseTo(1.04427, 5); // 1.5 / 1.436408
    expect(r.needsEngineer).toBe(true);
    expect(r.messages[0]).toMatch(/^Over the floor's rated load .*have a structural engineer check the floor before the tank is filled\.$/);
  });

  it("exactly at the rating is under; exactly twice is over, not far over", () => {
    expect(screenFloor({ pressureKPa: psfToKpa(40), roomUse: "living", floorType: "concrete slab" }).verdict).toBe("under");
    expect(screenFloor({ pressureKPa: psfToKpa(80), roomUse: "living", floorType: "concrete slab" }).verdict).toBe("over");
    expect(screenFloor({ pressureKPa: psfToKpa(81), roomUse: "living", floorType: "concrete slab" }).verdict).toBe("far over");
  });

  it("the demo tank is far over a living-room floor", () => {
    const { floorPressureKPa } = computeLoad(demoDesign());
    const r = screenFloor({ pressureKPa: floorPressureKPa, roomUse: "living", floorType: "timber joists", joistDirection: "perpendicular" });
    // 9.9516 kPa / 1.915210 kPa (IRC R301.5, 40 psf) = 5.196
    expect(r.ratio).toBeCloseTo(5.196, 3);
    expect(r.verdict).toBe("far over");
    expect(r.needsEngineer).toBe(true);
  });

  it("verdict follows the ratio (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 50, noNaN: true }), fc.constantFrom("living" as const, "sleeping" as const), (p, room) => {
        const r = screenFloor({ pressureKPa: p, roomUse: room, floorType: "concrete slab" });
        const expected = r.ratio <= 1 ? "under" : r.ratio > 2 ? "far over" : "over";
        expect(r.verdict).toBe(expected);
        expect(r.needsEngineer).toBe(expected !== "under");
      }),
    );
  });
});

describe("screenFloor warnings", () => {
  const base = { pressureKPa: 1, roomUse: "living", floorType: "timber joists" } as const;

  it("always carries the screening caution", () => {
    for (const floorType of ["timber joists", "concrete slab", "raised", "other"] as const) {
      expect(screenFloor({ ...base, floorType }).messages).toContain(SCREENING_ONLY);
    }
  });

  it("parallel joists need an engineer even under the rating", () => {
    const r = screenFloor({ ...base, joistDirection: "parallel" });
    expect(r.verdict).toBe("under");
    expect(r.needsEngineer).toBe(true);
    expect(r.messages.some((m) => m.includes("fewer joists"))).toBe(true);
  });

  it("unknown joist direction asks the user to find out", () => {
    const r = screenFloor({ ...base, joistDirection: "unknown" });
    expect(r.needsEngineer).toBe(false);
    expect(r.messages.some((m) => m.startsWith("Find out which way the joists run"))).toBe(true);
  });

  it("more than 600 mm from a bearing wall is flagged", () => {
    const near = screenFloor({ ...base, joistDirection: "perpendicular", distanceFromBearingWallMm: 600 });
    const far = screenFloor({ ...base, joistDirection: "perpendicular", distanceFromBearingWallMm: 601 });
    expect(near.needsEngineer).toBe(false);
    expect(far.needsEngineer).toBe(true);
    expect(far.messages.some((m) => m.includes("load-bearing wall"))).toBe(true);
  });

  it("a slab gets the slab note and no joist advice", () => {
    const r = screenFloor({ ...base, floorType: "concrete slab", joistDirection: "parallel", distanceFromBearingWallMm: 3000 });
    expect(r.needsEngineer).toBe(false);
    expect(r.messages.some((m) => m.startsWith("A concrete slab on the ground usually carries a tank well"))).toBe(true);
    expect(r.messages.some((m) => m.includes("joists"))).toBe(false);
  });

  it("an unknown floor type always needs an engineer", () => {
    const r = screenFloor({ ...base, floorType: "other" });
    expect(r.verdict).toBe("under");
    expect(r.needsEngineer).toBe(true);
  });
});
