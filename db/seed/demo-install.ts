import { randomUUID } from "node:crypto";
import { and, asc, eq, isNull, sql } from "drizzle-orm";
import sharp from "sharp";
import type { Tx } from "../index";
import { attachments, checklistItems, checklistTicks, leakChecks, materials, stageEvents } from "../schema";
import type { DemoContext, FeatureSeed } from "./demo-features";
import type { Stage } from "../../lib/stages/stages";
import { putObject } from "../../server/storage";

const HOUR = 3600 * 1000;
const DAY = 24 * HOUR;
const INSTALL_STAGES: Stage[] = ["stand_load_check", "aquascape", "fill_leak_test"];
const PAST_FILL: Stage[] = ["cycling", "first_stocking", "in_service"];

/** An invented placeholder picture (a tinted panel with a caption), so the gallery has something to show. */
async function demoPicture(text: string, tint: string): Promise<Buffer> {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="800" height="600"><rect width="800" height="600" fill="${tint}"/><rect x="60" y="380" width="680" height="160" rx="12" fill="#c9b98f"/><text x="400" y="300" font-family="sans-serif" font-size="40" text-anchor="middle" fill="#ffffff">${text}</text></svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 80 }).toBuffer();
}

/** Stores a demo photo; null when the object store isn't running, so the seed still completes. */
async function demoPhoto(tx: Tx, projectId: string, stage: Stage, by: string, at: Date, caption: string): Promise<string | null> {
  const key = `projects/${projectId}/${randomUUID()}`;
  try {
    const full = await demoPicture(caption, "#58697a");
    await putObject(key, full, "image/jpeg");
    const thumb = await sharp(full).resize(480, 480, { fit: "inside" }).webp({ quality: 72 }).toBuffer();
    await putObject(`${key}-thumb`, thumb, "image/webp");
    const [row] = await tx
      .insert(attachments)
      .values({ projectId, stage, key, thumbKey: `${key}-thumb`, contentType: "image/jpeg", sizeBytes: full.byteLength, fileName: "demo-photo.jpg", caption, status: "ready", uploadedBy: by, uploadedAt: at })
      .returning({ id: attachments.id });
    return row.id;
  } catch (error) {
    console.warn(`seed: demo photo skipped (${(error as Error).message})`);
    return null;
  }
}

type Item = typeof checklistItems.$inferSelect;

/** Ticks items in order from `start`, an hour apart; a photo item without a stored photo is left open. */
async function tickItems(tx: Tx, projectId: string, items: Item[], by: string, start: Date) {
  let at = start.getTime();
  for (const item of items) {
    const when = new Date(at);
    let attachmentId: string | null = null;
    if (item.needsPhoto) {
      attachmentId = await demoPhoto(tx, projectId, item.stage, by, when, item.label.replace(/^Photo of /, ""));
      if (!attachmentId) continue;
    }
    const value = item.measure ? Math.min(item.measure.max, Math.max(item.measure.min, item.measure.unit === "°C" ? 25 : item.measure.max / 2)) : null;
    await tx.insert(checklistTicks).values({ projectId, itemId: item.id, done: true, value, attachmentId, byUserId: by, at: when, clientKey: `demo-${randomUUID()}` });
    at += HOUR;
  }
}

async function stageEnteredAt(tx: Tx, projectId: string, stage: Stage, fallback: Date): Promise<Date> {
  const [row] = await tx
    .select({ at: stageEvents.at })
    .from(stageEvents)
    .where(and(eq(stageEvents.projectId, projectId), eq(stageEvents.toStage, stage)))
    .orderBy(asc(stageEvents.at))
    .limit(1);
  return row?.at ?? fallback;
}

export const seedDemoInstall: FeatureSeed = async (tx: Tx, ctx: DemoContext) => {
  const items = await tx.select().from(checklistItems).where(isNull(checklistItems.retiredAt)).orderBy(asc(checklistItems.stage), sql`${checklistItems.position} collate "C"`);
  const of = (stages: Stage[]) => items.filter((i) => stages.includes(i.stage));
  const { projectIds: p, peopleIds: who, now } = ctx;

  // Half the aquascape list done on the kitchen peninsula, and its van list.
  const kitchen = p["marchetti-kitchen"];
  await tickItems(tx, kitchen, of(["stand_load_check"]), who.crew2, new Date(now.getTime() - 3 * DAY));
  const scape = of(["aquascape"]);
  await tickItems(tx, kitchen, scape.filter((i) => !i.needsPhoto).slice(0, Math.ceil(scape.length / 2)), who.crew2, new Date(now.getTime() - 5 * HOUR));
  await tx.insert(materials).values([
    { projectId: kitchen, label: "Aqua soil, 9 L bags", quantity: 5, unit: "bags", loadedAt: new Date(now.getTime() - 20 * HOUR), loadedBy: who.crew2 },
    { projectId: kitchen, label: "Sand cap for the front, 10 kg bags", quantity: 1, unit: "bags", loadedAt: new Date(now.getTime() - 20 * HOUR), loadedBy: who.crew2 },
    { projectId: kitchen, label: "Seiryu-style grey rock", quantity: 18, unit: "kg" },
    { projectId: kitchen, label: "Driftwood branches", quantity: 3, unit: "pieces" },
    { projectId: kitchen, label: "Leveling mat, cut to 1200 × 600", quantity: 1, unit: "piece" },
  ]);

  // The shrimp shelf has its stand checked and nothing else yet.
  await tickItems(tx, p["brandt-bedroom"], of(["stand_load_check"]).slice(0, 3), who.crew1, new Date(now.getTime() - 2 * DAY));

  // The reception cylinder: filled yesterday, checked at fill, the day-after check still to do.
  const reception = p["ashdown-reception"];
  const filledAt = await stageEnteredAt(tx, reception, "fill_leak_test", new Date(now.getTime() - DAY));
  await tickItems(tx, reception, of(["stand_load_check", "aquascape"]), who.crew1, new Date(filledAt.getTime() - 2 * DAY));
  await tx.insert(leakChecks).values([
    { projectId: reception, kind: "filled", passed: true, hoseFlowLPerMin: 14, conditionerMl: 38, byUserId: who.crew1, at: new Date(filledAt.getTime() + HOUR), note: "Filled through a pre-filter; heaters and pumps unplugged throughout." },
    { projectId: reception, kind: "at fill", passed: true, byUserId: who.crew1, at: new Date(filledAt.getTime() + 2 * HOUR), note: "Base seam and bulkheads dry." },
  ]);

  // Projects past the leak test have everything ticked and both checks passed.
  for (const key of Object.keys(p)) {
    const projectId = p[key];
    const [{ stage }] = await tx.execute<{ stage: Stage }>(sql`select stage from projects where id = ${projectId}`).then((r) => r.rows);
    if (!PAST_FILL.includes(stage)) continue;
    const cyclingAt = await stageEnteredAt(tx, projectId, "cycling", new Date(now.getTime() - 30 * DAY));
    const fill = new Date(cyclingAt.getTime() - 30 * HOUR);
    const [crew] = await tx.execute<{ user_id: string }>(sql`select user_id from project_crew where project_id = ${projectId} limit 1`).then((r) => r.rows);
    await tickItems(tx, projectId, of(INSTALL_STAGES), crew.user_id, new Date(fill.getTime() - 3 * DAY));
    await tx.insert(leakChecks).values([
      { projectId, kind: "filled", passed: true, hoseFlowLPerMin: 12, conditionerMl: 30, byUserId: crew.user_id, at: fill },
      { projectId, kind: "at fill", passed: true, byUserId: crew.user_id, at: new Date(fill.getTime() + HOUR), note: "Dry all round." },
      { projectId, kind: "after 24 hours", passed: true, byUserId: crew.user_id, at: new Date(fill.getTime() + 25 * HOUR), note: "Dry all round after a day." },
    ]);
  }
};
