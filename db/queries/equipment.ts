import "server-only";
import { and, asc, desc, eq, isNull, sql } from "drizzle-orm";
import { db } from "../index";
import { equipment, equipmentServices, users } from "../schema";
import { badRequest, conflict, notFound } from "../../server/errors";
import type { EquipmentKind } from "../../lib/service/equipment-kinds";

export type EquipmentRow = typeof equipment.$inferSelect;
export type PieceValues = { kind: EquipmentKind; makeModel: string | null; installedOn: string | null; warrantyUntil: string | null; serviceIntervalDays: number | null; notes: string | null };

const PIECE = "That piece of equipment";

/**
 * A tank's equipment register. The team sees retired pieces and internal notes; the client sees
 * the pieces in use, without notes.
 */
export async function listEquipment(projectId: string, opts: { internal: boolean }) {
  const rows = await db()
    .select({ piece: equipment, retiredByName: users.name })
    .from(equipment)
    .leftJoin(users, eq(users.id, equipment.retiredBy))
    .where(and(eq(equipment.projectId, projectId), opts.internal ? sql`true` : isNull(equipment.retiredAt)))
    .orderBy(sql`${equipment.retiredAt} is not null`, asc(equipment.kind), asc(equipment.createdAt));
  return rows.map(({ piece, retiredByName }) => (opts.internal ? { ...piece, retiredByName } : { ...piece, notes: null, retireReason: null, retiredByName: null }));
}

/** The last few services of each piece on a tank, newest first (the team's view). */
export async function recentEquipmentServices(projectId: string, perPiece = 3) {
  const { rows } = await db().execute<{ equipment_id: string; serviced_at: Date; note: string | null; by_name: string; visit_id: string | null }>(sql`
    select equipment_id, serviced_at, note, by_name, visit_id from (
      select s.equipment_id, s.serviced_at, s.note, u.name as by_name, s.visit_id,
        row_number() over (partition by s.equipment_id order by s.serviced_at desc, s.created_at desc) as n
      from ${equipmentServices} s join ${equipment} e on e.id = s.equipment_id join ${users} u on u.id = s.by_user_id
      where e.project_id = ${projectId}) x
    where n <= ${perPiece} order by serviced_at desc`);
  return rows.map((r) => ({ equipmentId: r.equipment_id, servicedAt: new Date(r.serviced_at), note: r.note, byName: r.by_name, visitId: r.visit_id }));
}

export async function addEquipment(opts: { projectId: string; values: PieceValues; lastServicedAt: Date | null; by: string }) {
  const [row] = await db()
    .insert(equipment)
    .values({ ...opts.values, projectId: opts.projectId, lastServicedAt: opts.lastServicedAt, createdBy: opts.by })
    .returning();
  return row;
}

/** Changes a piece still in use; a retired piece stays as it was retired. */
export async function updateEquipment(opts: { projectId: string; equipmentId: string; values: PieceValues }) {
  const [row] = await db()
    .update(equipment)
    .set({ ...opts.values, updatedAt: new Date() })
    .where(and(eq(equipment.id, opts.equipmentId), eq(equipment.projectId, opts.projectId), isNull(equipment.retiredAt)))
    .returning();
  if (!row) throw notFound(PIECE);
  return row;
}

/** Takes a piece out of use with a reason; it stays on record so old visit reports still read. */
export async function retireEquipment(opts: { projectId: string; equipmentId: string; by: string; reason: string }, now = new Date()) {
  const [row] = await db()
    .update(equipment)
    .set({ retiredAt: now, retiredBy: opts.by, retireReason: opts.reason, updatedAt: now })
    .where(and(eq(equipment.id, opts.equipmentId), eq(equipment.projectId, opts.projectId), isNull(equipment.retiredAt)))
    .returning();
  if (!row) throw notFound(PIECE);
  return row;
}

/**
 * Records a service done outside a visit and moves the piece's last service forward (never back:
 * an older service entered late leaves a newer one standing). A save repeated with the same key
 * returns the first one and changes nothing.
 */
export async function recordEquipmentService(opts: {
  projectId: string;
  equipmentId: string;
  servicedAt: Date;
  servicedOn: string;
  note: string | null;
  by: string;
  clientKey: string;
}) {
  return db().transaction(async (tx) => {
    const [piece] = await tx
      .select()
      .from(equipment)
      .where(and(eq(equipment.id, opts.equipmentId), eq(equipment.projectId, opts.projectId), isNull(equipment.retiredAt)))
      .for("update");
    if (!piece) throw notFound(PIECE);
    const [earlier] = await tx.select().from(equipmentServices).where(eq(equipmentServices.clientKey, opts.clientKey)).limit(1);
    if (earlier) {
      if (earlier.equipmentId !== piece.id) throw conflict("That save was already used for another piece. Reload the page and record the service again.");
      return { piece, service: earlier, repeated: true };
    }
    if (piece.installedOn && opts.servicedOn < piece.installedOn) throw badRequest("Check the date.", { servicedOn: "The service can't be before the piece was installed." });
    const [service] = await tx
      .insert(equipmentServices)
      .values({ equipmentId: piece.id, servicedAt: opts.servicedAt, note: opts.note, byUserId: opts.by, clientKey: opts.clientKey })
      .onConflictDoNothing({ target: equipmentServices.clientKey })
      .returning();
    if (!service) throw conflict("That service is being saved already. Reload the page to see it.");
    const [updated] = await tx
      .update(equipment)
      .set({ lastServicedAt: sql`greatest(${equipment.lastServicedAt}, ${opts.servicedAt.toISOString()}::timestamptz)`, updatedAt: new Date() })
      .where(eq(equipment.id, piece.id))
      .returning();
    return { piece: updated, service, repeated: false };
  });
}

/** A piece's services, newest first. */
export async function equipmentServiceHistory(equipmentId: string) {
  return db().select().from(equipmentServices).where(eq(equipmentServices.equipmentId, equipmentId)).orderBy(desc(equipmentServices.servicedAt));
}
