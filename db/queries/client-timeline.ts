import "server-only";
import { and, asc, desc, eq, isNull } from "drizzle-orm";
import { db } from "../index";
import { attachments, checklistItems, checklistTicks, notes, users } from "../schema";
import { getStageTimeline } from "./project-page";
import { checklistMilestones, clientTimeline, type TimelineEntry } from "../../lib/portal/timeline";

/** Recent photos that finished uploading, newest first. */
export async function readyPhotos(projectId: string, limit = 12) {
  return db()
    .select({ id: attachments.id, caption: attachments.caption, fileName: attachments.fileName, uploadedAt: attachments.uploadedAt, isProblem: attachments.isProblem })
    .from(attachments)
    .where(and(eq(attachments.projectId, projectId), eq(attachments.status, "ready"), isNull(attachments.voidedAt)))
    .orderBy(desc(attachments.uploadedAt))
    .limit(limit);
}

/**
 * Everything a client's timeline shows: stage changes (gate decisions included), checklists
 * completed, photos, and notes the lead shared. Internal notes are excluded in the `where`.
 */
export async function getClientTimeline(projectId: string): Promise<TimelineEntry[]> {
  const [stages, items, ticks, photos, shared] = await Promise.all([
    getStageTimeline(projectId),
    db().select({ id: checklistItems.id, stage: checklistItems.stage }).from(checklistItems).where(isNull(checklistItems.retiredAt)),
    db()
      .select({ itemId: checklistTicks.itemId, done: checklistTicks.done, at: checklistTicks.at, seq: checklistTicks.seq })
      .from(checklistTicks)
      .where(eq(checklistTicks.projectId, projectId))
      .orderBy(asc(checklistTicks.seq)),
    readyPhotos(projectId, 24),
    db()
      .select({ id: notes.id, body: notes.body, createdAt: notes.createdAt, shared: notes.shared, byName: users.name })
      .from(notes)
      .innerJoin(users, eq(users.id, notes.authorId))
      .where(and(eq(notes.projectId, projectId), eq(notes.shared, true))),
  ]);
  const entries: TimelineEntry[] = [
    ...stages.map((s) => ({ kind: "stage" as const, id: s.id, at: s.at, fromStage: s.fromStage, toStage: s.toStage, override: s.override, reason: s.reason, byName: s.byName })),
    ...checklistMilestones(items, ticks.map((t) => ({ ...t, seq: t.seq ?? 0 }))).map((m) => ({ kind: "checklist" as const, id: `checklist-${m.stage}`, at: m.at, stage: m.stage })),
    ...photos.map((p) => ({ kind: "photo" as const, id: p.id, at: p.uploadedAt, caption: p.caption, fileName: p.fileName })),
    ...shared.map((n) => ({ kind: "note" as const, id: n.id, at: n.createdAt, body: n.body, byName: n.byName, shared: n.shared })),
  ];
  return clientTimeline(entries);
}
