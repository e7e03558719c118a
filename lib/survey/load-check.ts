import { checkAccess, type AccessResult } from "../tank/access";
import { ALL_CAUTIONS } from "../tank/cautions";
import type { TankDesign } from "../tank/design";
import { screenFloor, type FloorScreenResult } from "../tank/floor";
import type { FloorCode } from "../tank/floor-codes";
import { STANDARD_GRAVITY } from "../tank/units";
import { outerPlanExtentMm } from "../tank/geometry";
import { checkGlass, type GlassCheck } from "../tank/glass";
import { computeLoad, type TankLoad } from "../tank/load";
import type { SiteSurvey } from "./site-survey.schema";
import { isJoistedFloor } from "./survey-missing";

/** A design as stored: lib/tank's TankDesign, plus the stand's height for the door check. */
export type StoredDesign = TankDesign & { stand: TankDesign["stand"] & { heightMm?: number } };

export type AccessCheck = {
  doorWidthMm: number;
  doorHeightMm: number;
  tank: AccessResult;
  /** Null when the stand's height wasn't entered. */
  stand: AccessResult | null;
};

/** Everything the Site & load section and the load-check sheet show, from one design and survey. */
export type LoadCheckResults = {
  load: TankLoad;
  /** Null until the survey says what the room is used for and what the floor is. */
  floor: FloorScreenResult | null;
  glass: GlassCheck;
  /** Null until the survey has the narrowest door's size. */
  access: AccessCheck | null;
  /** Things to look at before the build that aren't errors: the room, the ceiling, the way in. */
  siteWarnings: string[];
  /** An engineer's approval is needed before the lead may sign the load check off. */
  needsEngineerReference: boolean;
  cautions: readonly string[];
};

/**
 * Runs every screening check for a design that has passed validateDesign, against the survey where
 * there is one. Pure, so the browser shows the same figures as you type that the server stores.
 */
export function loadCheck(design: StoredDesign, survey?: Partial<SiteSurvey> | null, code?: FloorCode): LoadCheckResults {
  const load = computeLoad(design);
  const glass = checkGlass(design);
  const s = survey ?? {};

  const floor =
    s.roomUse && s.floorType
      ? screenFloor({
          totalWeightKN: (load.totalInstalledMassKg * STANDARD_GRAVITY) / 1000,
          pressureKPa: load.floorPressureKPa,
          stand: design.stand,
          roomUse: s.roomUse,
          floorType: s.floorType,
          floorLevel: s.floorLevel,
          code,
          joists: isJoistedFloor(s.floorType)
            ? { spanMm: s.joistSpanMm, spacingMm: s.joistSpacingMm, direction: s.joistDirection, distanceFromSupportMm: s.bearingWallDistanceMm }
            : undefined,
        })
      : null;

  const extent = outerPlanExtentMm(design);
  const siteWarnings: string[] = [];
  let access: AccessCheck | null = null;
  if (s.doorWidthMm && s.doorHeightMm) {
    const door = { doorWidthMm: s.doorWidthMm, doorHeightMm: s.doorHeightMm };
    const tank = checkAccess({ itemLengthMm: extent.lengthMm, itemWidthMm: extent.widthMm, itemHeightMm: design.heightMm, ...door });
    const standHeight = design.stand.heightMm;
    const stand = standHeight
      ? checkAccess({ itemLengthMm: design.stand.lengthMm, itemWidthMm: design.stand.widthMm, itemHeightMm: standHeight, ...door })
      : null;
    access = { ...door, tank, stand };
    // The door check beside the results gives the figures in the reader's units.
    if (!tank.fits) siteWarnings.push("The tank won't get through the narrowest door as one piece: see the door check.");
    if (stand && !stand.fits) siteWarnings.push("The stand won't get through the narrowest door assembled: build it in the room.");
  }
  if (s.roomLengthMm && s.roomWidthMm) {
    const [tankLong, tankShort] = [Math.max(design.stand.lengthMm, extent.lengthMm), Math.max(design.stand.widthMm, extent.widthMm)].sort((a, b) => b - a);
    const [roomLong, roomShort] = [s.roomLengthMm, s.roomWidthMm].sort((a, b) => b - a);
    if (tankLong > roomLong || tankShort > roomShort) siteWarnings.push("The tank and stand are larger than the room as measured: check the room's sizes and the tank's.");
  }
  if (s.ceilingHeightMm && design.stand.heightMm && design.stand.heightMm + design.heightMm > s.ceilingHeightMm) {
    siteWarnings.push("The stand and tank together are taller than the ceiling as measured.");
  }

  const needsEngineerReference = floor !== null && floor.needsEngineer;
  return { load, floor, glass, access, siteWarnings, needsEngineerReference, cautions: ALL_CAUTIONS };
}
