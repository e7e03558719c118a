import "server-only";
import { and, desc, eq, isNull, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db } from "../index";
import { loadApprovals, siteSurveys, tankDesigns, users } from "../schema";
import type { SiteSurvey } from "../../lib/survey/site-survey.schema";
import type { LoadCheckResults, StoredDesign } from "../../lib/survey/load-check";
import type { UnitSystem } from "../../lib/tank/units";
import type { FloorBasis } from "../../lib/survey/floor-basis";
import { approvalMatchesSql, approvalStaleWhySql } from "./load-basis";

/** Approvals recorded now screen by top edge and floor type (rules version 2). */
export const LOAD_RULES_VERSION = 2;

export async function getSurvey(projectId: string) {
  const [row] = await db().select().from(siteSurveys).where(eq(siteSurveys.projectId, projectId));
  return row ? { ...row, data: row.data as Partial<SiteSurvey> } : null;
}

/** Saves the survey whole (a draft or complete); `complete` is what the gate into the load check reads. */
export async function saveSurvey(opts: { projectId: string; data: SiteSurvey; complete: boolean; userId: string }) {
  const values = { projectId: opts.projectId, data: opts.data as Record<string, unknown>, complete: opts.complete, updatedBy: opts.userId, updatedAt: new Date() };
  const [row] = await db()
    .insert(siteSurveys)
    .values(values)
    .onConflictDoUpdate({ target: siteSurveys.projectId, set: { data: values.data, complete: values.complete, updatedBy: values.updatedBy, updatedAt: values.updatedAt } })
    .returning();
  return row;
}

export async function getDesign(projectId: string) {
  const [row] = await db().select().from(tankDesigns).where(eq(tankDesigns.projectId, projectId));
  return row ? { ...row, data: row.data as unknown as StoredDesign } : null;
}

export async function saveDesign(opts: { projectId: string; data: StoredDesign; userId: string }) {
  const data = opts.data as unknown as Record<string, unknown>;
  const now = new Date();
  const [row] = await db()
    .insert(tankDesigns)
    .values({ projectId: opts.projectId, data, updatedBy: opts.userId, updatedAt: now })
    .onConflictDoUpdate({ target: tankDesigns.projectId, set: { data, updatedBy: opts.userId, updatedAt: now } })
    .returning();
  return { ...row, data: row.data as unknown as StoredDesign };
}

export type ApprovalView = {
  id: string;
  approvedAt: Date;
  approvedByName: string;
  engineerReference: string | null;
  /** True when the approval matches the design, floor inputs and code as they are now (as the gate compares). */
  current: boolean;
  /** Why it no longer matches (see lib/stages/gates staleApprovalReason); null when current. */
  staleWhy: string | null;
  revokedAt: Date | null;
  revokedByName: string | null;
  revokeReason: string | null;
  resultSnapshot: LoadCheckResults;
  designSnapshot: StoredDesign;
};

/** The approval to show: one standing for the current design if there is one, else the newest (revoked or stale). */
export async function getLatestApproval(projectId: string): Promise<ApprovalView | null> {
  const approver = alias(users, "approver");
  const revoker = alias(users, "revoker");
  const [row] = await db()
    .select({
      id: loadApprovals.id,
      approvedAt: loadApprovals.approvedAt,
      approvedByName: approver.name,
      engineerReference: loadApprovals.engineerReference,
      current: sql<boolean>`${approvalMatchesSql('"load_approvals"')}`,
      staleWhy: sql<string | null>`${approvalStaleWhySql('"load_approvals"')}`,
      revokedAt: loadApprovals.revokedAt,
      revokedByName: revoker.name,
      revokeReason: loadApprovals.revokeReason,
      resultSnapshot: loadApprovals.resultSnapshot,
      designSnapshot: loadApprovals.designSnapshot,
    })
    .from(loadApprovals)
    .innerJoin(approver, eq(approver.id, loadApprovals.approvedBy))
    .leftJoin(revoker, eq(revoker.id, loadApprovals.revokedBy))
    .where(eq(loadApprovals.projectId, projectId))
    // A standing approval of the current design first (the one the gate counts), else the newest.
    .orderBy(
      desc(sql`(${loadApprovals.revokedAt} is null and ${approvalMatchesSql('"load_approvals"')})`),
      desc(loadApprovals.approvedAt),
    )
    .limit(1);
  if (!row) return null;
  return {
    ...row,
    resultSnapshot: row.resultSnapshot as unknown as LoadCheckResults,
    designSnapshot: row.designSnapshot as unknown as StoredDesign,
  };
}

export type ApprovalOutcome =
  | { ok: true; id: string; approvedAt: Date }
  | { ok: false; reason: "no design" | "design changed" | "already approved" }
  | { ok: false; reason: "refused"; message: string; field?: string };

/**
 * Records the lead's approval of the design as it is at this moment. The design row is locked, so
 * the snapshot is exactly the stored design even if someone saves a change at the same time.
 * `decide` runs the checks on that locked design and returns the results to keep, or a refusal.
 */
export async function approveLoad(opts: {
  projectId: string;
  userId: string;
  engineerReference: string | null;
  expectedUpdatedAt?: string;
  /** The floor inputs and code the decision screens, kept so a later change makes the approval stale. */
  floorBasis: FloorBasis;
  decide: (design: StoredDesign) => { results: LoadCheckResults } | { refused: string; field?: string };
}): Promise<ApprovalOutcome> {
  return db().transaction(async (tx) => {
    const [design] = await tx.select().from(tankDesigns).where(eq(tankDesigns.projectId, opts.projectId)).for("update");
    if (!design) return { ok: false, reason: "no design" };
    if (opts.expectedUpdatedAt && design.updatedAt.toISOString() !== new Date(opts.expectedUpdatedAt).toISOString()) {
      return { ok: false, reason: "design changed" };
    }
    const [existing] = await tx
      .select({ id: loadApprovals.id })
      .from(loadApprovals)
      .where(and(eq(loadApprovals.projectId, opts.projectId), isNull(loadApprovals.revokedAt), approvalMatchesSql('"load_approvals"')))
      .limit(1);
    if (existing) return { ok: false, reason: "already approved" };
    const decision = opts.decide(design.data as unknown as StoredDesign);
    if ("refused" in decision) return { ok: false, reason: "refused", message: decision.refused, field: decision.field };
    const [row] = await tx
      .insert(loadApprovals)
      .values({
        projectId: opts.projectId,
        designSnapshot: design.data,
        resultSnapshot: JSON.parse(JSON.stringify(decision.results)) as Record<string, unknown>,
        engineerReference: opts.engineerReference,
        approvedBy: opts.userId,
        floorBasis: opts.floorBasis,
        rulesVersion: LOAD_RULES_VERSION,
      })
      .returning({ id: loadApprovals.id, approvedAt: loadApprovals.approvedAt });
    return { ok: true, ...row };
  });
}

/** Revokes every approval still standing for the project; nothing is deleted. Returns how many. */
export async function revokeLoadApproval(opts: { projectId: string; userId: string; reason: string }): Promise<number> {
  const rows = await db()
    .update(loadApprovals)
    .set({ revokedAt: new Date(), revokedBy: opts.userId, revokeReason: opts.reason })
    .where(and(eq(loadApprovals.projectId, opts.projectId), isNull(loadApprovals.revokedAt)))
    .returning({ id: loadApprovals.id });
  return rows.length;
}

export async function getUnitSystem(userId: string): Promise<UnitSystem> {
  const [row] = await db().select({ unitSystem: users.unitSystem }).from(users).where(eq(users.id, userId));
  return row?.unitSystem ?? "metric";
}

export async function setUnitSystem(userId: string, unitSystem: UnitSystem): Promise<void> {
  await db().update(users).set({ unitSystem }).where(eq(users.id, userId));
}
