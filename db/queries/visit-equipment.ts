import "server-only";
import { and, asc, eq, isNull, sql } from "drizzle-orm";
import { db, type Tx } from "../index";
import { equipment, equipmentServices } from "../schema";
import { conflict, notFound } from "../../server/errors";

/** The tank's equipment in use, each marked when it was serviced on this visit. */
export async function listVisitEquipment(projectId: string, visitId: string) {
  return db()
    .select({
      id: equipment.id,
      kind: equipment.kind,
      makeModel: equipment.makeModel,
      lastServicedAt: equipment.lastServicedAt,
      servicedOnVisit: sql<boolean>`exists (select 1 from ${equipmentServices} es where es.equipment_id = ${equipment.id} and es.visit_id = ${visitId})`,
    })
    .from(equipment)
    .where(and(eq(equipment.projectId, projectId), isNull(equipment.retiredAt)))
    .orderBy(asc(equipment.kind), asc(equipment.createdAt));
}

/** Equipment serviced on a visit, for the report and the client's e-mail. */
export async function equipmentServicedOnVisit(visitId: string, tx: Tx | ReturnType<typeof db> = db()) {
  return tx
    .select({ id: equipment.id, kind: equipment.kind, makeModel: equipment.makeModel, note: equipmentServices.note })
    .from(equipmentServices)
    .innerJoin(equipment, eq(equipment.id, equipmentServices.equipmentId))
    .where(eq(equipmentServices.visitId, visitId))
    .orderBy(asc(equipment.kind));
}

/**
 * Records that a piece of the tank's equipment was serviced on this visit and moves its last
 * service forward, which restarts its due date. The device's key makes a retried save land once;
 * a piece already serviced on the visit answers with that record.
 */
export async function serviceEquipmentOnVisit(
  tx: Tx,
  opts: { projectId: string; visitId: string; equipmentId: string; userId: string; clientKey: string; note: string | null },
  now = new Date(),
) {
  const [replay] = await tx.select().from(equipmentServices).where(eq(equipmentServices.clientKey, opts.clientKey)).limit(1);
  if (replay) {
    if (replay.equipmentId !== opts.equipmentId || replay.visitId !== opts.visitId) throw conflict("That save key was already used for something else. Reload the page and try again.");
    return { service: replay, replayed: true };
  }
  const [piece] = await tx
    .select({ id: equipment.id, retiredAt: equipment.retiredAt })
    .from(equipment)
    .where(and(eq(equipment.id, opts.equipmentId), eq(equipment.projectId, opts.projectId)))
    .for("update");
  if (!piece) throw notFound("That piece of equipment");
  if (piece.retiredAt) throw conflict("That piece of equipment was retired from this tank.");
  const [already] = await tx
    .select()
    .from(equipmentServices)
    .where(and(eq(equipmentServices.equipmentId, opts.equipmentId), eq(equipmentServices.visitId, opts.visitId)))
    .limit(1);
  if (already) return { service: already, replayed: true };
  const [service] = await tx
    .insert(equipmentServices)
    .values({ equipmentId: opts.equipmentId, visitId: opts.visitId, servicedAt: now, note: opts.note, byUserId: opts.userId, clientKey: opts.clientKey })
    .returning();
  // Never moves the date backwards: a service recorded late for an older visit doesn't undo a newer one.
  await tx
    .update(equipment)
    .set({ lastServicedAt: sql`greatest(coalesce(${equipment.lastServicedAt}, '-infinity'::timestamptz), ${now.toISOString()}::timestamptz)` })
    .where(eq(equipment.id, opts.equipmentId));
  return { service, replayed: false };
}
