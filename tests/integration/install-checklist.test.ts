import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { checklistItems, checklistTicks } from "@/db/schema";
import { makeTeam } from "../support/fixtures";
import { signedIn, type Session } from "../support/http";

async function itemWhere(pred: (i: typeof checklistItems.$inferSelect) => boolean) {
  const items = await db().select().from(checklistItems);
  const item = items.find((i) => !i.retiredAt && pred(i));
  if (!item) throw new Error("The default checklist is missing an item this test needs");
  return item;
}

const plain = () => itemWhere((i) => i.stage === "stand_load_check" && !i.needsPhoto && !i.measure);
const tick = (s: Session, projectId: string, body: Record<string, unknown>) =>
  s.post(`/api/projects/${projectId}/checklist/ticks`, { done: true, clientKey: randomUUID(), ...body });

describe("ticking a project's checklist", () => {
  it("lets assigned crew tick, and hides the project from other crew and refuses the client", async () => {
    const t = await makeTeam("aquascape");
    const item = await plain();
    const res = await tick(await signedIn(t.crew), t.project.id, { itemId: item.id, note: "Checked with the long level" });
    expect(res.status).toBe(201);
    expect(res.json.tick.done).toBe(true);

    expect((await tick(await signedIn(t.otherCrew), t.project.id, { itemId: item.id })).status).toBe(404);
    const client = await tick(await signedIn(t.client), t.project.id, { itemId: item.id });
    expect(client.status).toBe(403);
    expect((await tick(await signedIn(t.otherClient), t.project.id, { itemId: item.id })).status).toBe(404);

    const rows = await db().select().from(checklistTicks).where(eq(checklistTicks.projectId, t.project.id));
    expect(rows).toHaveLength(1);
    expect(rows[0].byUserId).toBe(t.crew.id);

    const state = await (await signedIn(t.crew)).get(`/api/projects/${t.project.id}/checklist`);
    expect(state.status).toBe(200);
    const stand = state.json.progress.find((p: { stage: string }) => p.stage === "stand_load_check");
    expect(stand.done).toBe(1);
  });

  it("applies a retried save with the same key once", async () => {
    const t = await makeTeam("aquascape");
    const item = await plain();
    const s = await signedIn(t.crew);
    const body = { itemId: item.id, done: true, clientKey: `retry-${randomUUID()}` };
    const first = await s.post(`/api/projects/${t.project.id}/checklist/ticks`, body);
    const again = await s.post(`/api/projects/${t.project.id}/checklist/ticks`, body);
    expect(first.status).toBe(201);
    expect(again.status).toBe(200);
    expect(again.json.replayed).toBe(true);
    expect(again.json.tick.id).toBe(first.json.tick.id);
    const rows = await db().select().from(checklistTicks).where(eq(checklistTicks.projectId, t.project.id));
    expect(rows).toHaveLength(1);
  });

  it("refuses a tick on a retired item", async () => {
    const t = await makeTeam("aquascape");
    const lead = await signedIn(t.lead);
    // A throwaway item in a stage no gate reads, so other tests aren't affected.
    const made = await lead.post("/api/checklist-items", { stage: "in_service", label: `Retire me ${randomUUID().slice(0, 4)}` });
    expect(made.status).toBe(201);
    expect((await lead.patch(`/api/checklist-items/${made.json.item.id}`, { retire: true })).status).toBe(200);
    const res = await tick(await signedIn(t.crew), t.project.id, { itemId: made.json.item.id });
    expect(res.status).toBe(409);
    expect(res.json.error).toMatch(/retired/);
    expect(await db().select().from(checklistTicks).where(eq(checklistTicks.projectId, t.project.id))).toHaveLength(0);
  });

  it("refuses a measured value outside the item's range, with a field message", async () => {
    const t = await makeTeam("stand_load_check");
    const item = await itemWhere((i) => !!i.measure && i.stage === "stand_load_check");
    const s = await signedIn(t.crew);
    const out = await tick(s, t.project.id, { itemId: item.id, value: item.measure!.max + 3 });
    expect(out.status).toBe(400);
    expect(out.json.fields.value).toContain(item.measure!.unit);
    const missing = await tick(s, t.project.id, { itemId: item.id });
    expect(missing.status).toBe(400);
    expect(missing.json.fields.value).toBeTruthy();
    const ok = await tick(s, t.project.id, { itemId: item.id, value: item.measure!.min });
    expect(ok.status).toBe(201);
    expect(ok.json.tick.value).toBe(item.measure!.min);
  });

  it("refuses a photo item until a photo is attached", async () => {
    const t = await makeTeam("aquascape");
    const item = await itemWhere((i) => i.stage === "aquascape" && i.needsPhoto);
    const s = await signedIn(t.crew);
    const refused = await tick(s, t.project.id, { itemId: item.id });
    expect(refused.status).toBe(422);
    expect(refused.json.error).toMatch(/needs a photo/);

    const png = await sharp({ create: { width: 40, height: 30, channels: 3, background: "#58697a" } }).png().toBuffer();
    const form = new FormData();
    form.set("file", new File([new Uint8Array(png)], "scape.png", { type: "image/png" }));
    form.set("stage", "aquascape");
    const up = await s.request("POST", `/api/projects/${t.project.id}/uploads`, form);
    expect(up.status).toBe(201);
    const ok = await tick(s, t.project.id, { itemId: item.id, attachmentId: up.json.attachment.id });
    expect(ok.status).toBe(201);
    expect(ok.json.tick.attachmentId).toBe(up.json.attachment.id);
  });

  // Crew may take back their own tick for a few minutes (tests/integration/undo-window.test.ts);
  // anyone else's tick is the lead's to untick.
  it("lets only the lead untick someone else's tick, with a reason, and keeps the history", async () => {
    const t = await makeTeam("aquascape");
    const item = await plain();
    const crew = await signedIn(t.crew);
    const lead = await signedIn(t.lead);
    expect((await tick(lead, t.project.id, { itemId: item.id })).status).toBe(201);

    expect((await tick(crew, t.project.id, { itemId: item.id, done: false, note: "Wrong tank" })).status).toBe(403);
    const noReason = await tick(lead, t.project.id, { itemId: item.id, done: false });
    expect(noReason.status).toBe(400);
    expect(noReason.json.fields.note).toBeTruthy();
    const untick = await tick(lead, t.project.id, { itemId: item.id, done: false, note: "Stand moved after this check; level it again" });
    expect(untick.status).toBe(201);

    const hist = await lead.get(`/api/projects/${t.project.id}/checklist/items/${item.id}`);
    expect(hist.status).toBe(200);
    expect(hist.json.history.map((h: { done: boolean }) => h.done)).toEqual([false, true]);
    expect(hist.json.history[0].note).toMatch(/level it again/);
    const rows = await db().select().from(checklistTicks).where(and(eq(checklistTicks.projectId, t.project.id), eq(checklistTicks.itemId, item.id)));
    expect(rows).toHaveLength(2);
  });
});

describe("checklist templates", () => {
  it("are edited by the lead only, and reorder between neighbours", async () => {
    const t = await makeTeam();
    const crew = await signedIn(t.crew);
    expect((await crew.post("/api/checklist-items", { stage: "in_service", label: "Not allowed" })).status).toBe(403);
    expect((await (await signedIn(t.client)).get("/api/checklist-items")).status).toBe(403);

    const lead = await signedIn(t.lead);
    const bad = await lead.post("/api/checklist-items", { stage: "in_service", label: "Probe depth", measure: { unit: "mm", min: 10, max: 2 } });
    expect(bad.status).toBe(400);
    expect(bad.json.fields["measure.max"]).toBeTruthy();

    const tag = randomUUID().slice(0, 4);
    const a = (await lead.post("/api/checklist-items", { stage: "in_service", label: `First ${tag}` })).json.item;
    const b = (await lead.post("/api/checklist-items", { stage: "in_service", label: `Second ${tag}`, needsPhoto: true })).json.item;
    expect((await crew.patch(`/api/checklist-items/${b.id}`, { after: null, before: a.id })).status).toBe(403);
    const moved = await lead.patch(`/api/checklist-items/${b.id}`, { after: null, before: a.id });
    expect(moved.status).toBe(200);
    const list = (await lead.get("/api/checklist-items")).json.items.filter((i: { label: string }) => i.label.endsWith(tag));
    expect(list.map((i: { label: string }) => i.label)).toEqual([`Second ${tag}`, `First ${tag}`]);

    for (const id of [a.id, b.id]) expect((await lead.patch(`/api/checklist-items/${id}`, { retire: true })).status).toBe(200);
    const after = (await lead.get("/api/checklist-items")).json.items.filter((i: { label: string }) => i.label.endsWith(tag));
    expect(after).toHaveLength(0);
    const kept = await db().select().from(checklistItems).where(eq(checklistItems.id, a.id));
    expect(kept[0].retiredAt).not.toBeNull();
  });
});
