import "server-only";
import { and, eq, ne, sql } from "drizzle-orm";
import { db } from "../index";
import { projects, stageEvents } from "../schema";
import { loadGateFacts } from "./gate-facts";
import { queueStageChangeNotices } from "./stage-change-notices";
import { issueInstalmentsOnMove } from "./invoices";
import { checkGate, moveDirection, needsCycleFacts } from "../../lib/stages/gates";
import { keyForPlacement, type Placement } from "../../lib/stages/ordering";
import { stageIndex, type Stage } from "../../lib/stages/stages";
import { AppError, badRequest, conflict, forbidden, notFound, unprocessable } from "../../server/errors";

export const STALE_MESSAGE = "Someone else moved or changed this card; the board has been refreshed.";

export type MoveInput = Placement & {
  toStage: Stage;
  version: number;
  reason?: string;
  overrideReason?: string;
};

export type MoveResult = { id: string; stage: Stage; position: string; version: number; stageEnteredAt: string; override: boolean };

// One advisory-lock namespace for board columns; the second key is the column's stage index.
export const COLUMN_LOCK_SPACE = 7301;

/**
 * Moves a card: checks its version under a row lock, the gates for a forward move, then places it
 * between its neighbours as they are now (under a per-column lock, so concurrent drops into one
 * column get distinct keys), records the stage change and queues its notices, all in one transaction.
 */
export async function moveProject(projectId: string, input: MoveInput, user: { id: string; canOverride: boolean }, now = new Date()): Promise<MoveResult> {
  if (input.overrideReason && !user.canOverride) {
    throw forbidden("Only the lead can pass a closed gate. Finish what the gate asks for, or ask the lead.");
  }
  if (input.beforeId === projectId || input.afterId === projectId) throw badRequest("A card can't be placed next to itself.", { beforeId: "Choose another card." });
  return db().transaction(async (tx) => {
    const [project] = await tx.select().from(projects).where(eq(projects.id, projectId)).for("update");
    if (!project) throw notFound();
    if (project.version !== input.version) throw conflict(STALE_MESSAGE, { currentVersion: project.version });

    const from = project.stage;
    const to = input.toStage;
    const direction = moveDirection(from, to);
    const reason = input.reason?.trim() || null;
    let override = false;
    let gateReasons: string[] | null = null;

    if (direction === "backward" && !reason) {
      throw badRequest("Say why the card is going back a stage.", { reason: "Give a reason for moving back." });
    }
    if (direction === "forward") {
      const facts = (await loadGateFacts([projectId], { conn: tx, now, cycleIds: needsCycleFacts(from, to) ? [projectId] : [] })).get(projectId);
      if (!facts) throw notFound();
      const gate = checkGate({ from, to, facts });
      if (!gate.open) {
        if (!input.overrideReason) {
          throw unprocessable(user.canOverride ? "The gate is closed. Give a reason to pass it anyway, or finish what it asks for." : "The gate is closed. Finish what it asks for, or ask the lead.", {
            reasons: gate.reasons,
            canOverride: user.canOverride,
          });
        }
        override = true;
        gateReasons = gate.reasons;
      }
    }

    await tx.execute(sql`select pg_advisory_xact_lock(${COLUMN_LOCK_SPACE}, ${stageIndex(to)})`);
    const column = await tx
      .select({ id: projects.id, position: projects.position })
      .from(projects)
      .where(and(eq(projects.stage, to), ne(projects.id, projectId)));
    let position: string;
    try {
      position = keyForPlacement(column, input);
    } catch (error) {
      throw new AppError(409, "The column's order changed while you moved the card; try the move again.", undefined, { cause: String(error) });
    }

    const stageChanged = from !== to;
    const [updated] = await tx
      .update(projects)
      .set({
        stage: to,
        position,
        version: sql`${projects.version} + 1`,
        updatedAt: now,
        ...(stageChanged ? { stageEnteredAt: now } : {}),
        // A new cycle gets its own "ready" notice.
        ...(stageChanged && to === "cycling" ? { cycleReadyNotifiedAt: null } : {}),
      })
      .where(eq(projects.id, projectId))
      .returning();

    if (stageChanged) {
      const why = override ? input.overrideReason!.trim() : reason;
      await tx.insert(stageEvents).values({ projectId, fromStage: from, toStage: to, byUserId: user.id, at: now, reason: why, override, gateReasons });
      await queueStageChangeNotices(tx, { projectId, fromStage: from, toStage: to, byUserId: user.id, override, reason: why });
      // Install day and handover bill their instalments of the accepted quote, with the move.
      await issueInstalmentsOnMove(tx, { projectId, from, to, now });
    }
    return {
      id: updated.id,
      stage: updated.stage,
      position: updated.position,
      version: updated.version,
      stageEnteredAt: updated.stageEnteredAt.toISOString(),
      override,
    };
  });
}
