import "server-only";
import { and, asc, desc, eq, inArray, isNotNull, isNull, max } from "drizzle-orm";
import { db, type Tx } from "../index";
import { holdingTanks, planBatches, planBatchItems, quarantineNotes, species, stockingPlans, tankDesigns, users, waterTests } from "../schema";
import { getDesignVolume } from "./water";
import { liveSpeciesByIds, toCheckSpecies } from "./species";
import { badRequest, conflict, notFound } from "../../server/errors";
import { checkPlan } from "../../lib/stocking/check-plan";
import { estimateBioload } from "../../lib/stocking/bioload";
import { tankFacts } from "../../lib/stocking/tank-facts";
import { quarantineDaysLeft, quarantineEndsAt } from "../../lib/stocking/quarantine";
import type { PlanLine } from "../../lib/stocking/checks";
import type { TankDesign } from "../../lib/tank/design";

export type PlanItemInput = { speciesId: string; count: number };

export type BatchStatus = "planned" | "in quarantine" | "in display";

/** Where a batch stands: planned, in a holding tank, or in the display. */
export function batchStatus(b: { quarantineStartedAt: Date | null; stockingBatchId: string | null }): BatchStatus {
  if (b.stockingBatchId) return "in display";
  return b.quarantineStartedAt ? "in quarantine" : "planned";
}

async function latestPh(projectId: string): Promise<number | null> {
  const [row] = await db()
    .select({ pH: waterTests.pH })
    .from(waterTests)
    .where(and(eq(waterTests.projectId, projectId), isNull(waterTests.voidedAt), isNotNull(waterTests.pH)))
    .orderBy(desc(waterTests.takenAt))
    .limit(1);
  return row?.pH ?? null;
}

/**
 * The project's stocking plan: its settings, its batches in order with their species, quarantine
 * and notes, and the checks on the whole plan against the tank.
 */
export async function getStockingPlan(projectId: string, now = new Date()) {
  const [[settings], batches, [designRow], volume, measuredPh] = await Promise.all([
    db().select().from(stockingPlans).where(eq(stockingPlans.projectId, projectId)),
    db()
      .select({ batch: planBatches, holdingName: holdingTanks.name })
      .from(planBatches)
      .leftJoin(holdingTanks, eq(holdingTanks.id, planBatches.holdingTankId))
      .where(eq(planBatches.projectId, projectId))
      .orderBy(asc(planBatches.position)),
    db().select({ data: tankDesigns.data }).from(tankDesigns).where(eq(tankDesigns.projectId, projectId)),
    getDesignVolume(projectId),
    latestPh(projectId),
  ]);
  const ids = batches.map((b) => b.batch.id);
  const [items, notes] = ids.length
    ? await Promise.all([
        db()
          .select({ item: planBatchItems, species })
          .from(planBatchItems)
          .innerJoin(species, eq(species.id, planBatchItems.speciesId))
          .where(and(inArray(planBatchItems.batchId, ids), isNull(planBatchItems.retiredAt)))
          .orderBy(asc(species.commonName)),
        db()
          .select({ note: quarantineNotes, byName: users.name })
          .from(quarantineNotes)
          .innerJoin(users, eq(users.id, quarantineNotes.byUserId))
          .where(inArray(quarantineNotes.batchId, ids))
          .orderBy(asc(quarantineNotes.at)),
      ])
    : [[], []];

  const reef = settings?.reef ?? false;
  const pH = settings?.targetPh ?? measuredPh;
  const tank = tankFacts({ design: (designRow?.data as unknown as TankDesign) ?? null, netVolumeL: volume?.netVolumeL ?? null, reef, pH });
  const lines: PlanLine[] = [];
  const view = batches.map(({ batch, holdingName }) => {
    const own = items.filter((i) => i.item.batchId === batch.id);
    for (const i of own) lines.push({ batch: batch.position, species: toCheckSpecies(i.species), count: i.item.count });
    const days = batch.quarantineDays;
    return {
      id: batch.id,
      position: batch.position,
      note: batch.note,
      status: batchStatus(batch),
      items: own.map((i) => ({ speciesId: i.species.id, commonName: i.species.commonName, scientificName: i.species.scientificName, count: i.item.count })),
      holdingTankId: batch.holdingTankId,
      holdingTankName: holdingName,
      quarantineStartedAt: batch.quarantineStartedAt,
      quarantineDays: days,
      quarantineEndsAt: batch.quarantineStartedAt && days != null ? quarantineEndsAt(batch.quarantineStartedAt, days) : null,
      daysLeft: batch.quarantineStartedAt && days != null && !batch.stockingBatchId ? quarantineDaysLeft(batch.quarantineStartedAt, days, now) : null,
      overrideReason: batch.overrideReason,
      stockingBatchId: batch.stockingBatchId,
      notes: notes.filter((n) => n.note.batchId === batch.id).map((n) => ({ id: n.note.id, kind: n.note.kind, at: n.note.at, text: n.note.text, byName: n.byName })),
    };
  });
  return {
    settings: { reef, targetPh: settings?.targetPh ?? null, measuredPh },
    tank,
    batches: view,
    warnings: checkPlan(lines, tank),
    bioload: estimateBioload(lines, tank),
  };
}

export type StockingPlanView = Awaited<ReturnType<typeof getStockingPlan>>;

/** Refuses species that aren't in the catalogue (or were retired), naming the field. */
async function checkSpecies(tx: Tx, items: PlanItemInput[]) {
  const found = await liveSpeciesByIds([...new Set(items.map((i) => i.speciesId))], tx);
  const fields: Record<string, string> = {};
  items.forEach((i, n) => {
    if (!found.has(i.speciesId)) fields[`items.${n}.speciesId`] = "That species isn't in the catalogue.";
  });
  if (Object.keys(fields).length) throw badRequest("Some species aren't in the catalogue; nothing was saved.", fields);
}

async function insertItems(tx: Tx, batchId: string, items: PlanItemInput[]) {
  await tx.insert(planBatchItems).values(items.map((i) => ({ batchId, speciesId: i.speciesId, count: i.count })));
}

/** Adds a batch at the end of the plan. */
export async function addPlanBatch(opts: { projectId: string; userId: string; items: PlanItemInput[]; note: string | null }) {
  return db().transaction(async (tx) => {
    await checkSpecies(tx, opts.items);
    // Lock the plan's settings row (created here if missing) so two additions don't take the same place.
    await tx.insert(stockingPlans).values({ projectId: opts.projectId, updatedBy: opts.userId }).onConflictDoNothing();
    await tx.select().from(stockingPlans).where(eq(stockingPlans.projectId, opts.projectId)).for("update");
    const [{ last }] = await tx.select({ last: max(planBatches.position) }).from(planBatches).where(eq(planBatches.projectId, opts.projectId));
    const [batch] = await tx
      .insert(planBatches)
      .values({ projectId: opts.projectId, position: (last ?? 0) + 1, note: opts.note, createdBy: opts.userId })
      .returning();
    await insertItems(tx, batch.id, opts.items);
    return batch;
  });
}

/** Locks a plan batch of this project, or answers 404. */
export async function lockPlanBatch(tx: Tx, projectId: string, batchId: string) {
  const [row] = await tx
    .select()
    .from(planBatches)
    .where(and(eq(planBatches.id, batchId), eq(planBatches.projectId, projectId)))
    .for("update");
  if (!row) throw notFound("That batch");
  return row;
}

/** Replaces a planned batch's species; the old rows are retired, not deleted. */
export async function replacePlanBatch(opts: { projectId: string; batchId: string; items: PlanItemInput[]; note: string | null }) {
  return db().transaction(async (tx) => {
    const batch = await lockPlanBatch(tx, opts.projectId, opts.batchId);
    if (batchStatus(batch) !== "planned") throw conflict("This batch is already in quarantine or in the display; its fish can't be changed.");
    await checkSpecies(tx, opts.items);
    await tx.update(planBatchItems).set({ retiredAt: new Date() }).where(and(eq(planBatchItems.batchId, batch.id), isNull(planBatchItems.retiredAt)));
    await insertItems(tx, batch.id, opts.items);
    await tx.update(planBatches).set({ note: opts.note }).where(eq(planBatches.id, batch.id));
  });
}

export async function savePlanSettings(opts: { projectId: string; userId: string; reef: boolean; targetPh: number | null }) {
  const values = { reef: opts.reef, targetPh: opts.targetPh, updatedBy: opts.userId, updatedAt: new Date() };
  await db()
    .insert(stockingPlans)
    .values({ projectId: opts.projectId, ...values })
    .onConflictDoUpdate({ target: stockingPlans.projectId, set: values });
}
