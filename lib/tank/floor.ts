/**
 * First-pass screening of a floor under a filled tank, by kind of floor. It tells an installer
 * when to stop and bring in a structural engineer; it never says a floor is safe.
 *
 * - Suspended timber (joists; a raised floor is joisted too): the bending moment and end shear the
 *   tank puts into the most loaded joist, against what that joist carries under the code's uniform
 *   live load over its span.
 * - Ground-bearing concrete slab: the stand's footprint pressure against the lowest presumptive
 *   bearing value of the ground the code lists.
 * - Suspended concrete, or a floor we can't name: no screening; the engineer decides.
 */

import type { StandFootprint } from "./design";
import { FLOOR_CAUTIONS } from "./cautions";
import { DEFAULT_FLOOR_CODE, FLOOR_CODE_VALUES, type FloorCode, type RoomUse } from "./floor-codes";
import { joistLoadEffects, mostLoadedJoistShare, type JoistEffects } from "./joist";

export type { RoomUse } from "./floor-codes";
export type FloorType = "timber joists" | "raised" | "concrete slab" | "suspended concrete" | "other";
export type FloorLevel = "basement" | "ground" | "upper";
export type JoistDirection = "perpendicular" | "parallel" | "unknown";
export type FloorMethod = "joists" | "slab" | "none";

export interface FloorJoists {
  spanMm?: number | null;
  spacingMm?: number | null;
  /** How the tank's long side runs against the joists: across them ("perpendicular") or along them. */
  direction?: JoistDirection | null;
  /** From the nearest bearing support (wall or beam under the joists) to the near edge of the stand, mm. */
  distanceFromSupportMm?: number | null;
}

export interface FloorScreenInput {
  /** Everything on the floor once filled, kN (computeLoad's total mass × g). */
  totalWeightKN: number;
  /** The total weight over the stand's footprint, kPa (computeLoad). */
  pressureKPa: number;
  stand: { lengthMm: number; widthMm: number; footprint: StandFootprint };
  roomUse: RoomUse;
  floorType: FloorType;
  floorLevel?: FloorLevel | null;
  code?: FloorCode;
  joists?: FloorJoists;
}

export interface SlabScreen {
  pressureKPa: number;
  bearingKPa: number;
}

export interface FloorScreenResult {
  method: FloorMethod;
  verdict: "under" | "over" | "far over" | "not screened";
  /** Share of the allowance the tank uses (1 = all of it); null when not screened. */
  ratio: number | null;
  code: FloorCode;
  roomUse: RoomUse;
  /** The code's uniform live load for the room, kPa. */
  ratedKPa: number;
  joists: JoistEffects | null;
  slab: SlabScreen | null;
  /** Plain words, without figures in units, so every unit system can show them. */
  messages: string[];
  /** Where each figure comes from. */
  sources: string[];
  needsEngineer: boolean;
  /** Shown beside every floor result. */
  cautions: readonly string[];
}

/** Above this share the verdict becomes "far over". Our own choice, not a code figure. */
export const FAR_OVER_RATIO = 2;

/** Which screening a floor gets. A concrete slab counts as ground-bearing only at ground or basement level. */
export function floorMethod(floorType: FloorType, floorLevel?: FloorLevel | null): FloorMethod {
  if (floorType === "timber joists" || floorType === "raised") return "joists";
  if (floorType === "concrete slab" && (floorLevel === "ground" || floorLevel === "basement")) return "slab";
  return "none";
}

function verdictFor(ratio: number): "under" | "over" | "far over" {
  return ratio <= 1 ? "under" : ratio > FAR_OVER_RATIO ? "far over" : "over";
}

const BEAM_SOURCE = "Simply supported beam, concentrated load at any point (AISC Steel Construction Manual, Table 3-23, case 7; Roark Table 8.1, case 1e; case numbers from memory)";

/**
 * Screens the floor under a tank. Pure: the same inputs always give the same answer.
 */
export function screenFloor(input: FloorScreenInput): FloorScreenResult {
  const code = input.code ?? DEFAULT_FLOOR_CODE;
  const values = FLOOR_CODE_VALUES[code];
  const ratedKPa = values.liveLoadKPa[input.roomUse];
  const method = floorMethod(input.floorType, input.floorLevel);
  const base = { method, code, roomUse: input.roomUse, ratedKPa, joists: null, slab: null, cautions: FLOOR_CAUTIONS };

  if (method === "none") {
    const why =
      input.floorType === "concrete slab"
        ? "A concrete slab above the ground is a suspended floor (or its level isn't recorded): we don't screen it."
        : input.floorType === "suspended concrete"
          ? "We don't screen suspended concrete floors: their strength depends on reinforcement we can't see."
          : "We can't screen this kind of floor.";
    return { ...base, verdict: "not screened", ratio: null, messages: [why, "A structural engineer decides before the tank is filled."], sources: [], needsEngineer: true };
  }

  if (method === "slab") return screenSlab(input, base);
  return screenJoists(input, base);
}

type Base = Pick<FloorScreenResult, "method" | "code" | "roomUse" | "ratedKPa" | "joists" | "slab" | "cautions">;

function screenSlab(input: FloorScreenInput, base: Base): FloorScreenResult {
  const values = FLOOR_CODE_VALUES[base.code];
  const bearingKPa = values.lowestBearingKPa;
  // The slab spreads the stand's load over more ground than its footprint, so comparing the
  // footprint pressure with the ground's bearing value is on the safe side.
  const ratio = input.pressureKPa / bearingKPa;
  const verdict = verdictFor(ratio);
  const messages: string[] = [
    verdict === "under"
      ? "The stand's footprint pressure is within the lowest bearing value the code lists for the ground under a slab."
      : "The stand's footprint pressure is more than the lowest bearing value the code lists for the ground: have a structural engineer look at the slab and the ground.",
    // Common practice: what a pressure figure can't see.
    "Still look at: cracks, settlement or damp in the slab; pipes, drains or cables under it; how thick it is and what it sits on (made or soft ground isn't covered).",
  ];
  return {
    ...base,
    slab: { pressureKPa: input.pressureKPa, bearingKPa },
    verdict,
    ratio,
    messages,
    sources: [`Lowest presumptive bearing value ${values.lowestBearingPrinted}: ${values.bearingSource}`, "Pressure = total weight / footprint area"],
    needsEngineer: verdict !== "under",
  };
}

function screenJoists(input: FloorScreenInput, base: Base): FloorScreenResult {
  const values = FLOOR_CODE_VALUES[base.code];
  const j = input.joists ?? {};
  const sources = [`Uniform live load ${values.liveLoadPrinted[input.roomUse]}: ${values.liveLoadSource}`, BEAM_SOURCE];
  if (!j.spanMm || !j.spacingMm || j.distanceFromSupportMm === null || j.distanceFromSupportMm === undefined) {
    return {
      ...base,
      verdict: "not screened",
      ratio: null,
      messages: ["Enter the joists' span and spacing and the distance from the nearest bearing wall to screen this floor.", "Until then a structural engineer decides."],
      sources,
      needsEngineer: true,
    };
  }
  const direction = j.direction ?? "unknown";
  // Unknown direction: both ways round, keep the worse.
  const tries = (direction === "unknown" ? (["perpendicular", "parallel"] as const) : [direction]).map((d) =>
    joistLoadEffects({
      totalWeightKN: input.totalWeightKN,
      spanMm: j.spanMm as number,
      spacingMm: j.spacingMm as number,
      distanceFromSupportMm: j.distanceFromSupportMm as number,
      liveLoadKPa: base.ratedKPa,
      direction: d,
      stand: input.stand,
    }),
  );
  const effects = tries.reduce((worst, e) => (e.share > worst.share ? e : worst));
  const messages: string[] = [];
  if (effects.beyondSpan) {
    messages.push("The stand reaches past the joists' span onto the next support: this screening can't place it. A structural engineer decides.");
    return { ...base, joists: effects, verdict: "not screened", ratio: null, messages, sources, needsEngineer: true };
  }
  const verdict = verdictFor(effects.share);
  const governs = effects.momentShare >= effects.shearShare ? "bending" : "end shear";
  if (verdict === "under") {
    messages.push(`The most loaded joist takes less from the tank than the code's floor load gives it (${governs} governs).`);
  } else if (verdict === "over") {
    messages.push(`The most loaded joist takes more from the tank than the code's floor load gives it (${governs} governs): have a structural engineer check the floor before the tank is filled.`);
  } else {
    messages.push(`The most loaded joist takes far more from the tank than the code's floor load gives it (${governs} governs): the floor will very likely need strengthening. Have a structural engineer check it before the tank is filled.`);
  }
  if (direction === "unknown") messages.push("Which way the joists run isn't known: we took the worse way round. Find out; a tank across the joists spreads its weight over more of them.");
  else if (direction === "parallel") messages.push("The tank runs along the joists, so its weight sits on fewer of them. Turning it across them spreads the load.");
  if (input.stand.footprint.kind === "legs")
    messages.push("Legs put their load on the joists under them: spreader boards across the joists under each pair of legs share it out (common practice).");
  if (values.concentratedKN !== null && input.stand.footprint.kind === "legs" && input.totalWeightKN / input.stand.footprint.count > values.concentratedKN)
    messages.push("Each leg carries more than the concentrated load the code designs a floor for: spread it.");
  return { ...base, joists: effects, verdict, ratio: effects.share, messages, sources, needsEngineer: verdict !== "under" };
}

export { mostLoadedJoistShare };
