/**
 * First-pass screening of a floor under a filled tank. It compares the tank's
 * spread-out pressure with the live load a house floor is designed for, so an
 * installer knows when to stop and bring in a structural engineer. It never
 * says a floor is safe.
 */

import { SCREENING_ONLY } from "./cautions";
import { psfToKpa } from "./units";

export type RoomUse = "living" | "sleeping";
export type FloorType = "timber joists" | "concrete slab" | "raised" | "other";
export type JoistDirection = "perpendicular" | "parallel" | "unknown";

export interface FloorScreenInput {
  /** Tank's total weight spread over its stand footprint, kPa (from computeLoad). */
  pressureKPa: number;
  roomUse: RoomUse;
  floorType: FloorType;
  /** How the tank's long side runs relative to the joists. */
  joistDirection?: JoistDirection;
  /** Distance from the tank to the nearest load-bearing wall, mm. */
  distanceFromBearingWallMm?: number;
}

export interface FloorScreenResult {
  verdict: "under" | "over" | "far over";
  ratedKPa: number;
  ratedPsf: number;
  /** Tank pressure divided by the rated live load. */
  ratio: number;
  messages: string[];
  needsEngineer: boolean;
}

/**
 * Minimum uniformly distributed live loads, International Residential Code (IRC),
 * Table R301.5: rooms other than sleeping rooms 40 psf; sleeping rooms 30 psf.
 */
export const IRC_LIVE_LOAD_PSF: Record<RoomUse, number> = {
  living: 40,
  sleeping: 30,
};

/**
 * Above this ratio the verdict becomes "far over". Our own choice, not a code
 * figure: at twice the rated load reinforcement is very likely, not just possible.
 */
export const FAR_OVER_RATIO = 2;

/**
 * Beyond this distance from a bearing wall the tank sits mid-span, where joists
 * bend and deflect most. 600 mm is our own threshold (common practice advice is
 * "as close to a load-bearing wall as you can").
 */
export const BEARING_WALL_NEAR_MM = 600;

/**
 * Screens a floor against the tank's pressure. Rated load from IRC Table R301.5;
 * ratio = pressure / rated load; warnings are common practice rules of thumb.
 */
export function screenFloor(input: FloorScreenInput): FloorScreenResult {
  const ratedPsf = IRC_LIVE_LOAD_PSF[input.roomUse];
  const ratedKPa = psfToKpa(ratedPsf);
  const ratio = input.pressureKPa / ratedKPa;
  const verdict: FloorScreenResult["verdict"] =
    ratio <= 1 ? "under" : ratio > FAR_OVER_RATIO ? "far over" : "over";

  const messages: string[] = [];
  let needsEngineer = verdict !== "under";
  const roomWords = input.roomUse === "sleeping" ? "a bedroom" : "a living area";

  if (verdict === "under") {
    messages.push(`Under the load a floor in ${roomWords} is normally designed for (${ratedPsf} psf).`);
  } else if (verdict === "over") {
    messages.push(
      `Over the floor's rated load for ${roomWords} (${ratedPsf} psf): have a structural engineer check the floor before the tank is filled.`,
    );
  } else {
    messages.push(
      `Far over the floor's rated load for ${roomWords} (${ratedPsf} psf): the floor will very likely need strengthening. Have a structural engineer check it before the tank is filled.`,
    );
  }

  const onJoists = input.floorType === "timber joists" || input.floorType === "raised";
  if (input.floorType === "concrete slab") {
    messages.push(
      "A concrete slab on the ground usually carries a tank well. A slab on an upper floor is a suspended floor and needs the same check as any other.",
    );
  } else if (input.floorType === "other") {
    messages.push("We can't screen this kind of floor: have it checked before the tank is filled.");
    needsEngineer = true;
  }

  if (onJoists) {
    if (input.joistDirection === "parallel") {
      // Common practice: running along the joists puts the weight on only one or two of them.
      messages.push("The tank runs along the joists, so its weight sits on fewer joists. Turning it across them spreads the load.");
      needsEngineer = true;
    } else if (input.joistDirection === undefined || input.joistDirection === "unknown") {
      messages.push("Find out which way the joists run: a tank across them spreads its weight over more joists.");
    }
    const d = input.distanceFromBearingWallMm;
    if (d !== undefined && d > BEARING_WALL_NEAR_MM) {
      // Common practice: mid-span is where joists bend most; near a bearing wall the load goes straight down.
      messages.push(
        `The tank is more than ${BEARING_WALL_NEAR_MM} mm from a load-bearing wall, where joists bend most. Placing it against a bearing wall is better.`,
      );
      needsEngineer = true;
    }
  }

  messages.push(SCREENING_ONLY);
  return { verdict, ratedKPa, ratedPsf, ratio, messages, needsEngineer };
}
