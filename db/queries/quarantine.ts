import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { db } from "../index";
import { holdingTanks, livestockEvents, livestockGroups, planBatchItems, planBatches, quarantineNotes, species } from "../schema";
import { addStockingBatch } from "./stocking";
import { batchStatus, lockPlanBatch } from "./stocking-plan";
import { getQuarantineDays } from "./holding-tanks";
import { badRequest, conflict, unprocessable } from "../../server/errors";
import { quarantineVerdict } from "../../lib/stocking/quarantine";

const DAY_MS = 86_400_000;

/** Puts a planned batch into a holding tank; its period is the company's setting at that moment. */
export async function startQuarantine(opts: { projectId: string; batchId: string; holdingTankId: string; startedAt: Date }) {
  const days = await getQuarantineDays();
  return db().transaction(async (tx) => {
    const batch = await lockPlanBatch(tx, opts.projectId, opts.batchId);
    if (batchStatus(batch) !== "planned") throw conflict("This batch is already in quarantine or in the display.");
    const [tank] = await tx.select({ id: holdingTanks.id }).from(holdingTanks).where(and(eq(holdingTanks.id, opts.holdingTankId), isNull(holdingTanks.retiredAt)));
    if (!tank) throw badRequest("Some fields need attention.", { holdingTankId: "Choose one of the company's holding tanks." });
    const [row] = await tx
      .update(planBatches)
      .set({ holdingTankId: tank.id, quarantineStartedAt: opts.startedAt, quarantineDays: days })
      .where(eq(planBatches.id, batch.id))
      .returning();
    return row;
  });
}

/** A daily observation or a treatment during quarantine. */
export async function addQuarantineNote(opts: { projectId: string; batchId: string; userId: string; kind: "observation" | "treatment"; at: Date; text: string }) {
  return db().transaction(async (tx) => {
    const batch = await lockPlanBatch(tx, opts.projectId, opts.batchId);
    if (!batch.quarantineStartedAt) throw conflict("This batch isn't in quarantine yet; put it in a holding tank first.");
    if (opts.at < batch.quarantineStartedAt) throw badRequest("Some fields need attention.", { at: "That is before the batch went into quarantine." });
    const [row] = await tx.insert(quarantineNotes).values({ batchId: batch.id, kind: opts.kind, at: opts.at, text: opts.text, byUserId: opts.userId }).returning();
    return row;
  });
}

/** The lead's written reason to let a batch out before its quarantine period has run. */
export async function overrideQuarantine(opts: { projectId: string; batchId: string; userId: string; reason: string }) {
  return db().transaction(async (tx) => {
    const batch = await lockPlanBatch(tx, opts.projectId, opts.batchId);
    if (batch.stockingBatchId) throw conflict("This batch is already in the display.");
    const [row] = await tx
      .update(planBatches)
      .set({ overrideReason: opts.reason, overrideBy: opts.userId, overrideAt: new Date() })
      .where(eq(planBatches.id, batch.id))
      .returning();
    return row;
  });
}

/**
 * Moves a batch from quarantine into the display: refused until its quarantine period has run (or
 * the lead overrode it in writing), and until the water allows it by the stocking rules in
 * db/queries/stocking.ts. One transaction records the stocking batch, the groups and their
 * "added" events; any refusal saves nothing.
 */
export async function addBatchToDisplay(opts: {
  projectId: string;
  batchId: string;
  user: { id: string; canOverride: boolean };
  addedAt: Date;
  reTestOverride: string | null;
  now?: Date;
}) {
  const now = opts.now ?? new Date();
  return db().transaction(async (tx) => {
    const batch = await lockPlanBatch(tx, opts.projectId, opts.batchId);
    if (batch.stockingBatchId) throw conflict("This batch is already in the display.");
    const verdict = quarantineVerdict({ startedAt: batch.quarantineStartedAt, days: batch.quarantineDays ?? 0, now: opts.addedAt, override: batch.overrideReason });
    if (!verdict.done) {
      throw unprocessable(`The batch can't go into the display yet. ${verdict.reason}`, {
        fields: { addedAt: verdict.reason },
        reasons: [verdict.reason],
        canOverride: opts.user.canOverride,
      });
    }
    const items = await tx
      .select({ count: planBatchItems.count, speciesId: species.id, name: species.commonName })
      .from(planBatchItems)
      .innerJoin(species, eq(species.id, planBatchItems.speciesId))
      .where(and(eq(planBatchItems.batchId, batch.id), isNull(planBatchItems.retiredAt)))
      .orderBy(asc(species.commonName));
    if (!items.length) throw conflict("This batch has no fish in it.");
    const fishCount = items.reduce((n, i) => n + i.count, 0);
    const spentDays = batch.quarantineStartedAt ? Math.max(0, Math.floor((opts.addedAt.getTime() - batch.quarantineStartedAt.getTime()) / DAY_MS)) : 0;
    const { batch: stocked, overridden } = await addStockingBatch({
      projectId: opts.projectId,
      user: opts.user,
      values: {
        addedAt: opts.addedAt,
        description: `Plan batch ${batch.position}: ${items.map((i) => `${i.count} × ${i.name}`).join(", ")}`,
        fishCount,
        quarantineDays: spentDays,
        overrideReason: opts.reTestOverride,
      },
      now,
      tx,
    });
    await tx.update(planBatches).set({ stockingBatchId: stocked.id }).where(eq(planBatches.id, batch.id));
    const source = `Plan batch ${batch.position}, after ${spentDays} days in quarantine${batch.overrideReason ? " (released early by the lead)" : ""}`;
    for (const item of items) {
      const [group] = await tx
        .insert(livestockGroups)
        .values({ projectId: opts.projectId, speciesId: item.speciesId, source, addedAt: opts.addedAt, planBatchId: batch.id })
        .returning();
      await tx.insert(livestockEvents).values({ projectId: opts.projectId, groupId: group.id, kind: "added", at: opts.addedAt, count: item.count, place: "display", byUserId: opts.user.id });
    }
    return { stockingBatchId: stocked.id, fishCount, reTestOverridden: overridden };
  });
}
