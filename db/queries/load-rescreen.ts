import "server-only";
import { and, eq, isNull, lt } from "drizzle-orm";
import { db } from "../index";
import { loadApprovals, siteSurveys, tankDesigns } from "../schema";
import { getCompanyFloorCode } from "./company-settings";
import { LOAD_RULES_VERSION } from "./survey-design";
import { loadCheck, type LoadCheckResults, type StoredDesign } from "../../lib/survey/load-check";
import { floorBasis } from "../../lib/survey/floor-basis";
import type { SiteSurvey } from "../../lib/survey/site-survey.schema";
import { rescreenVerdict } from "../../lib/survey/rescreen";

/**
 * Re-screens every standing approval recorded under earlier glass and floor rules. One whose glass
 * or floor verdict comes out differently now is marked stale with a plain reason; the rest keep
 * standing and from now on also go stale when the floor inputs or the building code change.
 * Runs after the migrations; safe to run again (each approval is re-screened once).
 */
export async function rescreenOldApprovals(): Promise<{ checked: number; stale: number }> {
  const code = await getCompanyFloorCode();
  const rows = await db()
    .select({ id: loadApprovals.id, snapshot: loadApprovals.designSnapshot, results: loadApprovals.resultSnapshot, design: tankDesigns.data, survey: siteSurveys.data })
    .from(loadApprovals)
    .leftJoin(tankDesigns, eq(tankDesigns.projectId, loadApprovals.projectId))
    .leftJoin(siteSurveys, eq(siteSurveys.projectId, loadApprovals.projectId))
    .where(and(isNull(loadApprovals.revokedAt), lt(loadApprovals.rulesVersion, LOAD_RULES_VERSION)));
  let stale = 0;
  for (const row of rows) {
    const survey = (row.survey ?? {}) as Partial<SiteSurvey>;
    // Re-screen the design the approval holds: a later design change already makes it stale.
    const now = loadCheck(row.snapshot as unknown as StoredDesign, survey, code);
    const reason = rescreenVerdict(row.results as unknown as LoadCheckResults, now);
    if (reason) stale++;
    await db()
      .update(loadApprovals)
      .set({ staleReason: reason, floorBasis: floorBasis(survey, code), rulesVersion: LOAD_RULES_VERSION })
      .where(and(eq(loadApprovals.id, row.id), lt(loadApprovals.rulesVersion, LOAD_RULES_VERSION)));
  }
  return { checked: rows.length, stale };
}
