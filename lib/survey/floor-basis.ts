import type { FloorCode } from "../tank/floor-codes";
import type { SiteSurvey } from "./site-survey.schema";

/**
 * The survey fields the floor screening reads. An approval keeps them, with the company's building
 * code, so a change to any of them makes the approval stale. db/queries builds the same object in SQL
 * from this list, so the two can't drift apart.
 */
export const FLOOR_BASIS_FIELDS = [
  "roomUse",
  "floorType",
  "floorLevel",
  "joistDirection",
  "joistSpanMm",
  "joistSpacingMm",
  "bearingWallDistanceMm",
] as const satisfies ReadonlyArray<keyof SiteSurvey>;

export type FloorBasis = Record<string, string | number>;

/** The floor inputs and code, with empty fields left out (as jsonb_strip_nulls does). */
export function floorBasis(survey: Partial<SiteSurvey> | null | undefined, code: FloorCode): FloorBasis {
  const out: FloorBasis = {};
  for (const f of FLOOR_BASIS_FIELDS) {
    const v = survey?.[f];
    if (v !== null && v !== undefined) out[f] = v;
  }
  out.floorCode = code;
  return out;
}
