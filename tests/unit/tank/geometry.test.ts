import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { TankDesign } from "@/lib/tank/design";
import {
  bowfrontPlanAreaMm2,
  circularSegmentArea,
  innerPlanAreaMm2,
  internalHeightMm,
  outerPlanAreaMm2,
  outerPlanExtentMm,
  smallestPlanDimensionMm,
  waterHeightMm,
} from "@/lib/tank/geometry";
import { bareRectangular, demoDesign } from "./fixtures";

describe("circularSegmentArea", () => {
  it("a half-circle is π r² / 2", () => {
    // Circle area π r² (standard geometry): chord 2r, sagitta r is half a circle.
    expect(circularSegmentArea(1000, 500)).toBeCloseTo((Math.PI * 500 ** 2) / 2, 6);
  });

  it("worked example: chord 1200 mm, sagitta 150 mm", () => {
    // R = (600² + 150²) / (2 × 150) = 382 500 / 300 = 1275 mm; α = asin(600/1275) = 0.489957 rad;
    // area = R²α − (c/2)(R − s) = 1 625 625 × 0.489957 − 600 × 1125 = 796 486.9 − 675 000 = 121 486.9 mm²
    // (segment = sector minus triangle, CRC Standard Mathematical Tables, circular segment)
    expect(circularSegmentArea(1200, 150)).toBeCloseTo(121486.88, 1);
  });

  it("a shallow segment approaches the parabola's 2/3 · chord · sagitta", () => {
    // Archimedes, Quadrature of the Parabola: a parabolic segment is 2/3 of its bounding
    // rectangle, and a shallow circular arc is nearly parabolic.
    expect(circularSegmentArea(1000, 1) / ((2 / 3) * 1000 * 1)).toBeCloseTo(1, 5);
  });

  it("is zero with no bow", () => {
    expect(circularSegmentArea(1000, 0)).toBe(0);
  });
});

describe("bowfrontPlanAreaMm2", () => {
  it("with no offset is the rectangle plus the front segment", () => {
    // 1200 × 500 rectangle = 600 000 mm², plus the 121 486.9 mm² segment above
    expect(bowfrontPlanAreaMm2(1200, 500, 150, 0)).toBeCloseTo(600000 + 121486.88, 1);
  });

  it("inside the panels matches a direct numerical integration (property)", () => {
    // Independent check: midpoint-rule integral of the inner outline's depth, x from −(L/2 − t)
    // to L/2 − t, depth = yc + √((R − t)² − x²) − t (offset geometry as documented in geometry.ts).
    fc.assert(
      fc.property(
        fc.integer({ min: 400, max: 3000 }),
        fc.integer({ min: 200, max: 1000 }),
        fc.double({ min: 0.05, max: 0.5, noNaN: true }),
        fc.integer({ min: 4, max: 25 }),
        (l, w, bowFraction, t) => {
          const s = bowFraction * l;
          const r = (l * l / 4 + s * s) / (2 * s);
          const yc = w + s - r;
          const a = l / 2 - t;
          const n = 4000;
          let sum = 0;
          for (let i = 0; i < n; i++) {
            const x = -a + ((i + 0.5) * 2 * a) / n;
            sum += yc + Math.sqrt((r - t) ** 2 - x * x) - t;
          }
          const numeric = (sum * 2 * a) / n;
          expect(bowfrontPlanAreaMm2(l, w, s, t) / numeric).toBeCloseTo(1, 5);
        },
      ),
      { numRuns: 50 },
    );
  });
});

describe("design geometry", () => {
  it("rectangular demo: outer and inner areas, heights", () => {
    const d = demoDesign();
    expect(outerPlanAreaMm2(d)).toBe(1800 * 600); // 1 080 000 mm²
    expect(innerPlanAreaMm2(d)).toBe(1770 * 570); // (1800 − 2·15)(600 − 2·15) = 1 008 900 mm²
    expect(internalHeightMm(d)).toBe(685); // 700 − 15 bottom
    expect(waterHeightMm(d)).toBe(635); // 685 − 50 below the rim
    expect(outerPlanExtentMm(d)).toEqual({ lengthMm: 1800, widthMm: 600 });
  });

  it("cylinder: circle inside the wall", () => {
    const d: TankDesign = { ...demoDesign(), shape: "cylinder", diameterMm: 1000, heightMm: 1200 };
    // π × (500 − 15)² = π × 235 225 = 738 988.9 mm² (circle area π r²)
    expect(innerPlanAreaMm2(d)).toBeCloseTo(Math.PI * 485 ** 2, 6);
    expect(outerPlanExtentMm(d)).toEqual({ lengthMm: 1000, widthMm: 1000 });
  });

  it("bowfront: extent includes the bow", () => {
    const d: TankDesign = { ...demoDesign(), shape: "bowfront", lengthMm: 1200, widthMm: 500, bowDepthMm: 150, heightMm: 600 };
    expect(outerPlanExtentMm(d)).toEqual({ lengthMm: 1200, widthMm: 650 });
    expect(outerPlanAreaMm2(d)).toBeCloseTo(721486.88, 1); // 600 000 + 121 486.88 (worked above)
  });

  it("bottom thickness defaults to the side thickness but can differ", () => {
    const d = { ...demoDesign(), bottomThicknessMm: 19 };
    expect(internalHeightMm(d)).toBe(681); // 700 − 19
  });
});

describe("geometry: degenerate shapes", () => {
  it("a segment with no chord or no sagitta has no area", () => {
    expect(circularSegmentArea(0, 10)).toBe(0);
    expect(circularSegmentArea(10, 0)).toBe(0);
  });

  it("a bowfront with no bow is the rectangle inside the panels", () => {
    expect(bowfrontPlanAreaMm2(1000, 400, 0, 10)).toBe(980 * 380);
  });

  it("a bowfront's smallest plan dimension is the smaller of its length and end width", () => {
    const bow: TankDesign = { ...bareRectangular(1200, 500, 600, 10), shape: "bowfront", bowDepthMm: 150 };
    expect(smallestPlanDimensionMm(bow)).toBe(500);
  });
});
