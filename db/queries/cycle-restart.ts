import "server-only";
import { eq, sql } from "drizzle-orm";
import { db } from "../index";
import { projects, stageEvents } from "../schema";
import { conflict, notFound } from "../../server/errors";

/**
 * The lead starts a project's cycle again on purpose (say after a crash in the tank): readings
 * before now stop counting and the timeline records who chose it and why.
 */
export async function restartCycle(projectId: string, input: { reason: string }, byUserId: string, now = new Date()) {
  return db().transaction(async (tx) => {
    const [project] = await tx.select().from(projects).where(eq(projects.id, projectId)).for("update");
    if (!project) throw notFound();
    if (project.stage !== "cycling") throw conflict("Only a project in cycling can have its cycle restarted.");
    await tx
      .update(projects)
      .set({ cycleStartedAt: now, cycleReadyNotifiedAt: null, version: sql`${projects.version} + 1`, updatedAt: now })
      .where(eq(projects.id, projectId));
    await tx.insert(stageEvents).values({ projectId, fromStage: "cycling", toStage: "cycling", byUserId, at: now, reason: input.reason, cycleRestarted: true });
    return { cycleStartedAt: now.toISOString() };
  });
}
