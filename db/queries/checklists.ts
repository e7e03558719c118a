import "server-only";
import { and, asc, desc, eq, isNull, sql } from "drizzle-orm";
import { generateKeyBetween } from "fractional-indexing";
import { db } from "../index";
import { attachments, checklistItems, checklistTicks, users } from "../schema";
import type { MeasureSpec } from "../schema/checklists";
import type { Stage } from "../../lib/stages/stages";
import { checkMeasuredValue } from "../../lib/install/checklist-progress";
import { AppError, badRequest, conflict, notFound, unprocessable } from "../../server/errors";

export type ChecklistItemRow = typeof checklistItems.$inferSelect;

/** The company's checklist items, in order per stage; retired ones only when asked. */
export async function listChecklistItems(opts: { includeRetired?: boolean } = {}) {
  return db()
    .select()
    .from(checklistItems)
    .where(opts.includeRetired ? sql`true` : isNull(checklistItems.retiredAt))
    .orderBy(asc(checklistItems.stage), sql`${checklistItems.position} collate "C"`);
}

async function lastPosition(stage: Stage): Promise<string | null> {
  const [row] = await db()
    .select({ position: checklistItems.position })
    .from(checklistItems)
    .where(eq(checklistItems.stage, stage))
    .orderBy(desc(sql`${checklistItems.position} collate "C"`))
    .limit(1);
  return row?.position ?? null;
}

export async function createChecklistItem(input: { stage: Stage; label: string; hint?: string | null; needsPhoto: boolean; measure: MeasureSpec | null }) {
  const position = generateKeyBetween(await lastPosition(input.stage), null);
  const [row] = await db()
    .insert(checklistItems)
    .values({ stage: input.stage, label: input.label, hint: input.hint || null, needsPhoto: input.needsPhoto, measure: input.measure, position })
    .returning();
  return row;
}

export async function getChecklistItem(id: string) {
  const [row] = await db().select().from(checklistItems).where(eq(checklistItems.id, id)).limit(1);
  return row ?? null;
}

/**
 * Edits an item. A move names its new neighbours (by id) within the same stage; the new position is
 * a fractional key between theirs, so no other row is rewritten.
 */
export async function updateChecklistItem(
  id: string,
  input: { label?: string; hint?: string | null; needsPhoto?: boolean; measure?: MeasureSpec | null; retire?: boolean; after?: string | null; before?: string | null },
) {
  const item = await getChecklistItem(id);
  if (!item) throw notFound("That checklist item");
  if (item.retiredAt && !input.retire) throw conflict("This item is retired. Add a new item instead of changing a retired one.");
  const patch: Partial<typeof checklistItems.$inferInsert> = {};
  if (input.label !== undefined) patch.label = input.label;
  if (input.hint !== undefined) patch.hint = input.hint || null;
  if (input.needsPhoto !== undefined) patch.needsPhoto = input.needsPhoto;
  if (input.measure !== undefined) patch.measure = input.measure;
  if (input.retire) patch.retiredAt = item.retiredAt ?? new Date();
  if (input.after !== undefined || input.before !== undefined) {
    const neighbour = async (nid: string | null | undefined) => {
      if (!nid) return null;
      const n = await getChecklistItem(nid);
      if (!n || n.stage !== item.stage) throw badRequest("Items can only be moved within their own stage.");
      return n.position;
    };
    const lo = await neighbour(input.after);
    const hi = await neighbour(input.before);
    if (lo !== null && hi !== null && lo >= hi) throw conflict("The list changed while you were moving this item. Reload and try again.");
    patch.position = generateKeyBetween(lo, hi);
  }
  if (!Object.keys(patch).length) return item;
  const [row] = await db().update(checklistItems).set(patch).where(eq(checklistItems.id, id)).returning();
  return row;
}

export type TickView = {
  id: string;
  itemId: string;
  done: boolean;
  byUserId: string;
  note: string | null;
  value: number | null;
  attachmentId: string | null;
  byName: string;
  at: Date;
  seq: number;
};

const tickColumns = {
  id: checklistTicks.id,
  itemId: checklistTicks.itemId,
  done: checklistTicks.done,
  note: checklistTicks.note,
  value: checklistTicks.value,
  attachmentId: checklistTicks.attachmentId,
  byName: users.name,
  byUserId: checklistTicks.byUserId,
  at: checklistTicks.at,
  seq: checklistTicks.seq,
};

/** Every tick on a project, oldest first (the page folds them into each item's state and history). */
export async function listProjectTicks(projectId: string): Promise<TickView[]> {
  const rows = await db()
    .select(tickColumns)
    .from(checklistTicks)
    .innerJoin(users, eq(users.id, checklistTicks.byUserId))
    .where(eq(checklistTicks.projectId, projectId))
    .orderBy(asc(checklistTicks.seq));
  return rows.map((r) => ({ ...r, seq: r.seq ?? 0 }));
}

export async function listItemTicks(projectId: string, itemId: string): Promise<TickView[]> {
  const rows = await db()
    .select(tickColumns)
    .from(checklistTicks)
    .innerJoin(users, eq(users.id, checklistTicks.byUserId))
    .where(and(eq(checklistTicks.projectId, projectId), eq(checklistTicks.itemId, itemId)))
    .orderBy(desc(checklistTicks.seq));
  return rows.map((r) => ({ ...r, seq: r.seq ?? 0 }));
}

/** The newest tick row of one item on a project: the item's state. */
export async function latestTick(projectId: string, itemId: string) {
  const [row] = await db()
    .select()
    .from(checklistTicks)
    .where(and(eq(checklistTicks.projectId, projectId), eq(checklistTicks.itemId, itemId)))
    .orderBy(desc(checklistTicks.seq))
    .limit(1);
  return row ?? null;
}

export type TickInput = { itemId: string; done: boolean; note?: string | null; value?: number | null; attachmentId?: string | null; clientKey: string };

/**
 * Records a tick or an untick. The device's key makes a retried save land once: a key already
 * stored on this project returns that row (replayed = true) and changes nothing.
 */
export async function recordTick(projectId: string, userId: string, input: TickInput): Promise<{ tick: typeof checklistTicks.$inferSelect; replayed: boolean }> {
  const [existing] = await db().select().from(checklistTicks).where(eq(checklistTicks.clientKey, input.clientKey)).limit(1);
  if (existing) {
    if (existing.projectId !== projectId || existing.itemId !== input.itemId) throw conflict("That save key was already used for another item. Reload the page and tick again.");
    return { tick: existing, replayed: true };
  }
  const item = await getChecklistItem(input.itemId);
  if (!item) throw notFound("That checklist item");
  if (item.retiredAt) throw conflict(`"${item.label}" was retired from the checklist, so it can't be ticked any more. Reload to see the current list.`);

  let value: number | null = null;
  let attachmentId: string | null = null;
  if (input.done) {
    if (item.measure) {
      const problem = checkMeasuredValue(item.measure, input.value);
      if (problem) throw badRequest("Check the measured value.", { value: problem });
      value = input.value!;
    }
    if (input.attachmentId) {
      const [photo] = await db()
        .select({ id: attachments.id, status: attachments.status })
        .from(attachments)
        .where(and(eq(attachments.id, input.attachmentId), eq(attachments.projectId, projectId)))
        .limit(1);
      if (!photo || photo.status !== "ready") throw badRequest("The photo isn't uploaded yet.", { attachmentId: "Wait for the photo to finish uploading, then tick again." });
      attachmentId = photo.id;
    }
    if (item.needsPhoto && !attachmentId) throw unprocessable(`"${item.label}" needs a photo. Attach one, then tick it.`, { fields: { attachmentId: "Attach a photo first." } });
  } else if (!input.note?.trim()) {
    throw badRequest("Say why it's being unticked.", { note: "A reason is needed to untick an item." });
  }

  const [tick] = await db()
    .insert(checklistTicks)
    .values({ projectId, itemId: item.id, done: input.done, note: input.note?.trim() || null, value, attachmentId, clientKey: input.clientKey, byUserId: userId })
    .onConflictDoNothing({ target: checklistTicks.clientKey })
    .returning();
  if (!tick) {
    // Two copies of the same save raced; the other one won.
    const [won] = await db().select().from(checklistTicks).where(eq(checklistTicks.clientKey, input.clientKey)).limit(1);
    if (!won) throw new AppError(409, "That save clashed with another. Try again.");
    return { tick: won, replayed: true };
  }
  return { tick, replayed: false };
}
