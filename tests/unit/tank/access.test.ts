import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkAccess, rectangleFitsRotated } from "@/lib/tank/access";

/** Brute force: try every tilt in 0.0005° steps (bounding box of a rotated rectangle, elementary trigonometry). */
function bruteFits(a: number, b: number, p: number, q: number): boolean {
  const steps = 180000;
  for (let i = 0; i <= steps; i++) {
    const th = (i / steps) * (Math.PI / 2);
    const c = Math.cos(th);
    const s = Math.sin(th);
    if (p * c + q * s <= a + 1e-9 && p * s + q * c <= b + 1e-9) return true;
  }
  return false;
}

describe("checkAccess", () => {
  it("the demo tank goes upright through an 800 mm door", () => {
    // 600 mm deep tank in an 800 mm opening: 200 mm spare; 700 mm tall in 2000 mm: 1300 mm spare
    const r = checkAccess({ itemLengthMm: 1800, itemWidthMm: 600, itemHeightMm: 700, doorWidthMm: 800, doorHeightMm: 2000 });
    expect(r).toEqual({ fits: true, way: "upright", clearanceMm: 200, message: "Fits upright with 200 mm to spare." });
  });

  it("a stand goes upright through a 760 mm door", () => {
    // 1800 × 600 × 900 stand: 760 − 600 = 160 mm spare
    const r = checkAccess({ itemLengthMm: 1800, itemWidthMm: 600, itemHeightMm: 900, doorWidthMm: 760, doorHeightMm: 1980 });
    expect(r.way).toBe("upright");
    expect(r.clearanceMm).toBe(160);
  });

  it("a deep tank has to go on edge", () => {
    // 900 mm deep won't pass 800 mm upright; on its back the 800 mm height crosses the 800 mm width exactly
    const r = checkAccess({ itemLengthMm: 1800, itemWidthMm: 900, itemHeightMm: 800, doorWidthMm: 800, doorHeightMm: 2000 });
    expect(r.fits).toBe(true);
    expect(r.way).toBe("on edge");
    expect(r.clearanceMm).toBe(0);
    expect(r.message).toMatch(/^Fits only turned on its side or end, with 0 mm to spare\./);
  });

  it("a tall thin panel needs the diagonal", () => {
    // 2300 × 20 × 2100 mm panel, 810 × 2040 mm door: 2100 > 2040 so neither square-on way works.
    // Carver's condition: ((2040 + 810)/(2100 + 20))² + ((2040 − 810)/(2100 − 20))² = 1.8073 + 0.3497 = 2.157 ≥ 2
    const input = { itemLengthMm: 2300, itemWidthMm: 20, itemHeightMm: 2100, doorWidthMm: 810, doorHeightMm: 2040 };
    const r = checkAccess(input);
    expect(r.fits).toBe(true);
    expect(r.way).toBe("on the diagonal");
    expect(r.clearanceMm).toBeGreaterThan(60);
    expect(r.clearanceMm).toBeLessThan(66);
    // Clearance c means it still fits a door c smaller each way; check that independently
    expect(bruteFits(2040 - 60, 810 - 60, 2100, 20)).toBe(true);
    expect(bruteFits(2040 - 66, 810 - 66, 2100, 20)).toBe(false);
  });

  it("a thin item fits up to the door's diagonal and not beyond", () => {
    // door diagonal √(810² + 2040²) = 2194.93 mm (Pythagoras)
    const door = { doorWidthMm: 810, doorHeightMm: 2040 };
    expect(checkAccess({ itemLengthMm: 2300, itemWidthMm: 1, itemHeightMm: 2194, ...door }).fits).toBe(true);
    expect(checkAccess({ itemLengthMm: 2300, itemWidthMm: 1, itemHeightMm: 2196, ...door }).fits).toBe(false);
  });

  it("too big however it is turned", () => {
    // 1000 mm is the item's thinnest side and the door is 810 mm wide: 190 mm too big
    const r = checkAccess({ itemLengthMm: 2400, itemWidthMm: 1000, itemHeightMm: 1900, doorWidthMm: 810, doorHeightMm: 2040 });
    expect(r.fits).toBe(false);
    expect(r.way).toBeNull();
    expect(r.clearanceMm).toBeCloseTo(-190, 9);
    expect(r.message).toBe(
      "Doesn't fit through this door, even tilted: about 190 mm too big. Look for a wider way in, or remove the door and its stops.",
    );
  });

  it("rejects sizes that aren't positive", () => {
    expect(() => checkAccess({ itemLengthMm: 0, itemWidthMm: 1, itemHeightMm: 1, doorWidthMm: 1, doorHeightMm: 1 })).toThrow(RangeError);
  });

  it("fits exactly when clearance is non-negative, and a bigger door never hurts (property)", () => {
    const mm = fc.integer({ min: 10, max: 3000 });
    fc.assert(
      fc.property(mm, mm, mm, mm, mm, fc.integer({ min: 0, max: 500 }), (l, w, h, dw, dh, extra) => {
        const r = checkAccess({ itemLengthMm: l, itemWidthMm: w, itemHeightMm: h, doorWidthMm: dw, doorHeightMm: dh });
        expect(r.fits).toBe(r.clearanceMm >= 0);
        expect(r.fits).toBe(r.way !== null);
        if (r.fits) {
          const wider = checkAccess({ itemLengthMm: l, itemWidthMm: w, itemHeightMm: h, doorWidthMm: dw + extra, doorHeightMm: dh + extra });
          expect(wider.fits).toBe(true);
        }
      }),
    );
  });
});

describe("rectangleFitsRotated (Carver 1956)", () => {
  it("agrees with a brute-force angle search", () => {
    const size = fc.integer({ min: 1, max: 2500 });
    fc.assert(
      fc.property(size, size, size, size, (x1, x2, y1, y2) => {
        const [a, b] = [Math.max(x1, x2), Math.min(x1, x2)];
        const [p, q] = [Math.max(y1, y2), Math.min(y1, y2)];
        expect(rectangleFitsRotated(a, b, p, q)).toBe(bruteFits(a, b, p, q));
      }),
      { numRuns: 60 },
    );
  });

  it("handles the square-on and diagonal cases", () => {
    expect(rectangleFitsRotated(2040, 810, 2000, 800)).toBe(true); // square on
    expect(rectangleFitsRotated(2040, 810, 2100, 20)).toBe(true); // diagonal, worked above
    expect(rectangleFitsRotated(2040, 810, 2100, 300)).toBe(false); // 1.410 + 0.467 = 1.877 < 2
    expect(rectangleFitsRotated(2040, 810, 1000, 900)).toBe(false); // thinner side wider than the door
  });
});

describe("checkAccess: edges", () => {
  /**
   * Best tilt for a p × q cross-section in a w × h opening, found independently of the code: the
   * best tilt is where the spare width equals the spare height (one grows, the other shrinks with
   * the angle), found by bisection to machine precision.
   */
  function exactTiltClearance(w: number, h: number, p: number, q: number): number {
    const spareW = (t: number) => w - (p * Math.cos(t) + q * Math.sin(t));
    const spareH = (t: number) => h - (p * Math.sin(t) + q * Math.cos(t));
    let lo = 0;
    let hi = Math.PI / 2;
    for (let i = 0; i < 200; i++) {
      const mid = (lo + hi) / 2;
      if (spareW(mid) < spareH(mid)) lo = mid;
      else hi = mid;
    }
    return spareW(lo);
  }

  it("an exact upright fit is upright with 0 mm to spare, not on edge", () => {
    const r = checkAccess({ itemLengthMm: 1800, itemWidthMm: 800, itemHeightMm: 700, doorWidthMm: 800, doorHeightMm: 2000 });
    expect(r).toEqual({ fits: true, way: "upright", clearanceMm: 0, message: "Fits upright with 0 mm to spare." });
    const exactHeight = checkAccess({ itemLengthMm: 1800, itemWidthMm: 600, itemHeightMm: 2000, doorWidthMm: 800, doorHeightMm: 2000 });
    expect(exactHeight.way).toBe("upright");
  });

  it("upright uses the shorter plan side, whichever way length and width are entered", () => {
    const r = checkAccess({ itemLengthMm: 600, itemWidthMm: 1800, itemHeightMm: 700, doorWidthMm: 800, doorHeightMm: 2000 });
    expect(r.way).toBe("upright");
    expect(r.clearanceMm).toBe(200);
  });

  it("upright is limited by the tighter of width and height", () => {
    // 600 mm deep in 800 mm (200 spare), 1900 mm tall in 2000 mm (100 spare): 100 mm it is.
    const r = checkAccess({ itemLengthMm: 1800, itemWidthMm: 600, itemHeightMm: 1900, doorWidthMm: 800, doorHeightMm: 2000 });
    expect(r.clearanceMm).toBe(100);
  });

  it("on edge takes the better of the two ways to turn the cross-section", () => {
    // A low deep tank, 2000 × 1000 × 700, in a 900 × 1100 door: 1000 deep won't pass 900 upright. On its
    // end (the 2000 mm length leads) the 700 × 1000 cross-section goes 700 across: min(200, 100) = 100 mm.
    const low = checkAccess({ itemLengthMm: 2000, itemWidthMm: 1000, itemHeightMm: 700, doorWidthMm: 900, doorHeightMm: 1100 });
    expect(low.way).toBe("on edge");
    expect(low.clearanceMm).toBe(100);
    // A tall tank, 2000 × 700 × 1200, in a 1300 × 1100 door: 1200 tall won't pass 1100 upright. Laid on its
    // back the 1200 mm height goes across: min(1300 − 1200, 1100 − 700) = 100 mm.
    const tall = checkAccess({ itemLengthMm: 2000, itemWidthMm: 700, itemHeightMm: 1200, doorWidthMm: 1300, doorHeightMm: 1100 });
    expect(tall.way).toBe("on edge");
    expect(tall.clearanceMm).toBe(100);
  });

  it("the tilt search finds the best angle, not just the nearest sampled one", () => {
    // The panel above: the code scans 3,600 angles then refines; without the refinement it is about 0.4 mm short.
    const r = checkAccess({ itemLengthMm: 2300, itemWidthMm: 20, itemHeightMm: 2100, doorWidthMm: 810, doorHeightMm: 2040 });
    const exact = exactTiltClearance(810, 2040, 2100, 20);
    expect(r.clearanceMm).toBeCloseTo(exact, 6);
    expect(r.message).toBe(
      `Fits only tilted through the door on the diagonal, with about ${Math.floor(exact)} mm to spare at best. Plan the move and have enough people.`,
    );
  });

  it("rounds spare room down, never up: 199.6 mm spare reads 199 mm", () => {
    const r = checkAccess({ itemLengthMm: 1800, itemWidthMm: 600.4, itemHeightMm: 700, doorWidthMm: 800, doorHeightMm: 2000 });
    expect(r.clearanceMm).toBeCloseTo(199.6, 9);
    expect(r.message).toBe("Fits upright with 199 mm to spare.");
    const nearlyWhole = checkAccess({ itemLengthMm: 1800, itemWidthMm: 600.001, itemHeightMm: 700, doorWidthMm: 800, doorHeightMm: 2000 });
    expect(nearlyWhole.message).toBe("Fits upright with 199 mm to spare.");
  });

  it("float noise just under a whole millimetre doesn't lose that millimetre", () => {
    // 800.3 − 600.1 is 200.19999999999993 in binary floating point; it should read 200 mm.
    const r = checkAccess({ itemLengthMm: 1800, itemWidthMm: 600.1, itemHeightMm: 700, doorWidthMm: 800.3, doorHeightMm: 2000 });
    expect(r.message).toBe("Fits upright with 200 mm to spare.");
    const exactNoise = checkAccess({ itemLengthMm: 1800, itemWidthMm: 0.3, itemHeightMm: 700, doorWidthMm: 0.6 + 199.7, doorHeightMm: 2000 });
    expect(exactNoise.message).toBe("Fits upright with 200 mm to spare.");
  });

  it("rounds a shortfall up, never down: 190.4 mm too big reads 191 mm", () => {
    const r = checkAccess({ itemLengthMm: 2400, itemWidthMm: 1000.4, itemHeightMm: 1900, doorWidthMm: 810, doorHeightMm: 2040 });
    expect(r.fits).toBe(false);
    expect(r.message).toMatch(/about 191 mm too big/);
  });

  it("names the side that isn't a positive number", () => {
    const ok = { itemLengthMm: 1, itemWidthMm: 1, itemHeightMm: 1, doorWidthMm: 1, doorHeightMm: 1 };
    expect(() => checkAccess({ ...ok, doorHeightMm: -5 })).toThrow(new RangeError("doorHeightMm must be a positive number of millimetres"));
    expect(() => checkAccess({ ...ok, itemWidthMm: Number.NaN })).toThrow(RangeError);
    expect(() => checkAccess({ ...ok, doorWidthMm: Infinity })).toThrow(RangeError);
  });
});

describe("rectangleFitsRotated: boundaries", () => {
  it("an exact square-on fit fits", () => {
    expect(rectangleFitsRotated(2040, 810, 2040, 810)).toBe(true);
  });

  it("Carver's sum exactly 2 fits", () => {
    // a = b: ((2a)/(p+q))² + 0 = 2 when p + q = a√2; with q → thin, p = a√2 − q. Use a = b = 10, p = 12, q = 2:
    // (20/14)² + 0 = 2.0408… ≥ 2 fits; p = 13, q = 2: (20/15)² = 1.777… < 2 doesn't.
    expect(rectangleFitsRotated(10, 10, 12, 2)).toBe(true);
    expect(rectangleFitsRotated(10, 10, 13, 2)).toBe(false);
  });
});
