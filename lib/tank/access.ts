/**
 * Will the tank (or its stand) get through the door? Checked before the build,
 * because a finished glass tank that can't get in has to be rebuilt in place.
 *
 * Simplification: the item is pushed straight through the doorway with one of
 * its sides along the direction of travel, so only its cross-section (the two
 * other sides) has to pass the opening, and wall thickness doesn't matter. We
 * don't model turning in from a corridor or stairwell, or pivoting a long side
 * through the opening. Door sizes must be the clear opening: with the door open,
 * hinges, the door leaf and stops take width.
 */

export interface AccessInput {
  itemLengthMm: number;
  itemWidthMm: number;
  itemHeightMm: number;
  /** Clear opening width, mm. */
  doorWidthMm: number;
  /** Clear opening height, mm. */
  doorHeightMm: number;
}

export type AccessWay = "upright" | "on edge" | "on the diagonal";

export interface AccessResult {
  fits: boolean;
  /** The first way that fits, in order of preference; null when none does. */
  way: AccessWay | null;
  /** Spare room on the tightest side when it fits (≥ 0); how much too big when it doesn't (< 0), mm. */
  clearanceMm: number;
  message: string;
}

/**
 * Whether a p × q rectangle (p ≥ q) fits inside an a × b rectangle (a ≥ b),
 * allowing any rotation in the plane.
 *
 * Source: Carver (1956), solution to American Mathematical Monthly problem E1225,
 * restated in Wetzel (2000), "Rectangles in rectangles", Mathematics Magazine 73
 * (citation details from memory; the tests check the condition against a brute-force
 * search over angles). It fits iff
 *   (p ≤ a and q ≤ b), or
 *   (p > a, q ≤ b, and ((a + b)/(p + q))² + ((a − b)/(p − q))² ≥ 2).
 * For a very thin item (q → 0) this reduces to p ≤ √(a² + b²): the door's diagonal.
 */
export function rectangleFitsRotated(a: number, b: number, p: number, q: number): boolean {
  if (p <= a && q <= b) return true;
  if (p > a && q <= b) {
    // p > a ≥ b ≥ q, so p − q > 0 here.
    return ((a + b) / (p + q)) ** 2 + ((a - b) / (p - q)) ** 2 >= 2;
  }
  return false;
}

/**
 * Best clearance over tilt angles for a p × q cross-section in a w × h opening, mm.
 * At tilt θ the item's bounding box is (p cos θ + q sin θ) × (p sin θ + q cos θ)
 * (rotated rectangle's bounding box, elementary trigonometry). There is no neat
 * closed form for the best θ, so we scan and then refine by golden-section search.
 */
function bestTiltClearance(w: number, h: number, p: number, q: number): number {
  const slack = (theta: number): number => {
    const c = Math.cos(theta);
    const s = Math.sin(theta);
    return Math.min(w - (p * c + q * s), h - (p * s + q * c));
  };
  const steps = 3600;
  const step = Math.PI / 2 / steps;
  let bestTheta = 0;
  let best = slack(0);
  for (let i = 1; i <= steps; i++) {
    const v = slack(i * step);
    if (v > best) {
      best = v;
      bestTheta = i * step;
    }
  }
  // Golden-section search (Kiefer 1953) around the best sample.
  let lo = Math.max(0, bestTheta - step);
  let hi = Math.min(Math.PI / 2, bestTheta + step);
  const g = (Math.sqrt(5) - 1) / 2;
  for (let i = 0; i < 60; i++) {
    const x1 = hi - g * (hi - lo);
    const x2 = lo + g * (hi - lo);
    if (slack(x1) < slack(x2)) lo = x1;
    else hi = x2;
  }
  return Math.max(best, slack((lo + hi) / 2));
}

/** Whole millimetres, rounded down for spare room and up for a shortfall, so we never overstate a fit. */
function spareMm(mm: number): string {
  // The 1e-6 mm allowance stops float noise (190.0000000001) from moving a whole millimetre.
  return `${Math.floor(mm + 1e-6)} mm`;
}

function shortMm(mm: number): string {
  return `${Math.ceil(mm - 1e-6)} mm`;
}

/**
 * The verdict in words with its clearance written by `length` (spare room rounded down, a shortfall
 * rounded up), so each unit system can say it. checkAccess's own message uses whole millimetres.
 */
export function accessMessage(result: Pick<AccessResult, "fits" | "way" | "clearanceMm">, length: (mm: number, round: "down" | "up") => string): string {
  switch (result.way) {
    case "upright":
      return `Fits upright with ${length(result.clearanceMm, "down")} to spare.`;
    case "on edge":
      return `Fits only turned on its side or end, with ${length(result.clearanceMm, "down")} to spare. Turn a glass tank only when empty and fully supported.`;
    case "on the diagonal":
      return `Fits only tilted through the door on the diagonal, with about ${length(result.clearanceMm, "down")} to spare at best. Plan the move and have enough people.`;
    default:
      return `Doesn't fit through this door, even tilted: about ${length(-result.clearanceMm, "up")} too big. Look for a wider way in, or remove the door and its stops.`;
  }
}

/**
 * Checks whether an item gets through a doorway: upright first (safest for a
 * glass tank), then on edge (turned on its side or end), then tilted on the
 * diagonal. See the file comment for what the geometry leaves out.
 * Throws RangeError for sizes that aren't positive numbers.
 */
export function checkAccess(input: AccessInput): AccessResult {
  const { itemLengthMm: l, itemWidthMm: w, itemHeightMm: h, doorWidthMm: dw, doorHeightMm: dh } = input;
  for (const [name, v] of Object.entries(input)) {
    if (!Number.isFinite(v) || v <= 0) throw new RangeError(`${name} must be a positive number of millimetres`);
  }

  // Upright: height stays vertical and the longer plan side leads through the door.
  const uprightClearance = Math.min(dw - Math.min(l, w), dh - h);
  if (uprightClearance >= 0) {
    return {
      fits: true,
      way: "upright",
      clearanceMm: uprightClearance,
      message: `Fits upright with ${spareMm(uprightClearance)} to spare.`,
    };
  }

  // The longest side leads; the two shorter sides are the smallest cross-section.
  const [a, b] = [l, w, h].sort((x, y) => x - y);
  const edgeClearance = Math.max(
    Math.min(dw - a, dh - b), // thin side across the width
    Math.min(dw - b, dh - a),
  );
  if (edgeClearance >= 0) {
    return {
      fits: true,
      way: "on edge",
      clearanceMm: edgeClearance,
      message: `Fits only turned on its side or end, with ${spareMm(edgeClearance)} to spare. Turn a glass tank only when empty and fully supported.`,
    };
  }

  const tilt = bestTiltClearance(dw, dh, b, a);
  if (rectangleFitsRotated(Math.max(dw, dh), Math.min(dw, dh), b, a)) {
    // The closed form decides; the numeric search can land a hair under zero at an exact fit.
    const clearanceMm = Math.max(0, tilt);
    return {
      fits: true,
      way: "on the diagonal",
      clearanceMm,
      message: `Fits only tilted through the door on the diagonal, with about ${spareMm(clearanceMm)} to spare at best. Plan the move and have enough people.`,
    };
  }

  return {
    fits: false,
    way: null,
    // At an exact boundary the search can read a hair over zero; keep the sign honest.
    clearanceMm: Math.min(tilt, -1e-9),
    message: `Doesn't fit through this door, even tilted: about ${shortMm(-tilt)} too big. Look for a wider way in, or remove the door and its stops.`,
  };
}
