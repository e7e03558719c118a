import "server-only";
import { eq } from "drizzle-orm";
import { db, type Db, type Tx } from "../index";
import { company } from "../schema";
import { resolveStageDurations, validateStageDurations, type StageDurations } from "../../lib/stages/durations";
import { badRequest, conflict } from "../../server/errors";

/** The company's stored overrides of the expected stage durations, as saved. */
export async function getStageDurationOverrides(conn: Db | Tx = db()): Promise<Record<string, unknown>> {
  const [row] = await conn.select({ d: company.stageDurations }).from(company).limit(1);
  return row?.d ?? {};
}

/** Expected days per stage: the company's valid overrides over the defaults. */
export async function getStageDurations(conn: Db | Tx = db()): Promise<StageDurations> {
  return resolveStageDurations(await getStageDurationOverrides(conn));
}

/** Saves the stage durations and the notice delay, the company's timing settings. */
export async function saveTimingSettings(input: { stageDurations: Record<string, number | null>; noticeDelaySeconds: number | null }, now = new Date()) {
  const problems = validateStageDurations(input.stageDurations);
  if (problems.length) throw badRequest("Some durations need attention.", Object.fromEntries(problems.map((p) => [`stageDurations.${p.stage}`, p.message])));
  const kept = Object.fromEntries(Object.entries(input.stageDurations).filter(([, v]) => v !== null));
  const updated = await db()
    .update(company)
    .set({ stageDurations: kept, noticeDelaySeconds: input.noticeDelaySeconds, updatedAt: now })
    .where(eq(company.id, 1))
    .returning({ id: company.id });
  if (!updated.length) throw conflict("The company's record is missing; set the company up before changing its settings.");
}
