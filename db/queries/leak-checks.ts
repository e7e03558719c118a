import "server-only";
import { asc, eq, sql } from "drizzle-orm";
import { db } from "../index";
import { leakChecks, users } from "../schema";
import { leakCheckRefusal, type LeakKind } from "../../lib/install/leak-rules";
import { unprocessable } from "../../server/errors";

export async function listLeakChecks(projectId: string) {
  return db()
    .select({
      id: leakChecks.id,
      kind: leakChecks.kind,
      passed: leakChecks.passed,
      note: leakChecks.note,
      hoseFlowLPerMin: leakChecks.hoseFlowLPerMin,
      conditionerMl: leakChecks.conditionerMl,
      at: leakChecks.at,
      byName: users.name,
    })
    .from(leakChecks)
    .innerJoin(users, eq(users.id, leakChecks.byUserId))
    .where(eq(leakChecks.projectId, projectId))
    .orderBy(asc(leakChecks.at));
}

/**
 * Records the fill or a leak check. Runs under a per-project lock so two phones can't both slip a
 * day-after check past the timing rule.
 */
export async function recordLeakCheck(
  projectId: string,
  userId: string,
  input: { kind: LeakKind; passed: boolean; note?: string | null; hoseFlowLPerMin?: number | null; conditionerMl?: number | null },
  now = new Date(),
) {
  return db().transaction(async (tx) => {
    await tx.execute(sql`select pg_advisory_xact_lock(hashtext(${"leak:" + projectId}))`);
    const rows = await tx.select({ kind: leakChecks.kind, passed: leakChecks.passed, at: leakChecks.at }).from(leakChecks).where(eq(leakChecks.projectId, projectId));
    const refusal = leakCheckRefusal(input.kind, rows, now);
    if (refusal) throw unprocessable(refusal);
    const [row] = await tx
      .insert(leakChecks)
      .values({
        projectId,
        kind: input.kind,
        passed: input.passed,
        note: input.note?.trim() || null,
        hoseFlowLPerMin: input.kind === "filled" ? (input.hoseFlowLPerMin ?? null) : null,
        conditionerMl: input.kind === "filled" ? (input.conditionerMl ?? null) : null,
        byUserId: userId,
        at: now,
      })
      .returning();
    return row;
  });
}
