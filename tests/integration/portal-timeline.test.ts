import { describe, expect, it } from "vitest";
import { and, eq, isNull } from "drizzle-orm";
import sharp from "sharp";
import { db } from "@/db";
import { attachments, checklistItems, checklistTicks, stageEvents } from "@/db/schema";
import { makeTeam } from "../support/fixtures";
import { signedIn } from "../support/http";

describe("the client's project timeline", () => {
  it("shows stage changes with the lead's override reason, completed checklists, photos and shared notes only", async () => {
    const t = await makeTeam("fill_leak_test");
    await db()
      .insert(stageEvents)
      .values([
        { projectId: t.project.id, fromStage: "stand_load_check", toStage: "aquascape", byUserId: t.lead.id, override: true, reason: "Engineer's letter arrives Monday; floor already checked on site.", at: new Date(Date.now() - 3 * 86_400_000) },
        { projectId: t.project.id, fromStage: "aquascape", toStage: "fill_leak_test", byUserId: t.crew.id, at: new Date(Date.now() - 86_400_000) },
      ]);
    const items = await db().select({ id: checklistItems.id }).from(checklistItems).where(and(eq(checklistItems.stage, "aquascape"), isNull(checklistItems.retiredAt)));
    expect(items.length).toBeGreaterThan(0);
    await db().insert(checklistTicks).values(items.map((i) => ({ projectId: t.project.id, itemId: i.id, done: true, byUserId: t.crew.id })));
    const lead = await signedIn(t.lead);
    await lead.post(`/api/projects/${t.project.id}/notes`, { body: "Rockwork photos are in the gallery.", shared: true });
    await lead.post(`/api/projects/${t.project.id}/notes`, { body: "Crew ran late; discount not offered.", shared: false });

    const client = await signedIn(t.client);
    const page = await client.get(`/projects/${t.project.id}`);
    expect(page.status).toBe(200);
    expect(page.text).toContain("Engineer&#x27;s letter arrives Monday");
    expect(page.text).toContain("Aquascape checklist completed");
    expect(page.text).toContain("Rockwork photos are in the gallery.");
    expect(page.text).not.toContain("discount not offered");
  });

  it("takes a client's problem photo through the upload route and shows it on their project's page", async () => {
    const t = await makeTeam("cycling");
    const client = await signedIn(t.client);
    const png = await sharp({ create: { width: 16, height: 16, channels: 3, background: "#2f82c4" } }).png().toBuffer();
    const form = new FormData();
    form.set("file", new File([new Uint8Array(png)], "cloudy.png", { type: "image/png" }));
    form.set("stage", "cycling");
    form.set("isProblem", "true");
    form.set("caption", "Cloudy water this morning");
    const res = await client.post(`/api/projects/${t.project.id}/uploads`, form);
    expect(res.status, res.text).toBe(201);
    const [row] = await db().select().from(attachments).where(eq(attachments.projectId, t.project.id));
    expect(row.isProblem).toBe(true);
    expect(row.status).toBe("ready");
    // The portal lists projects one line each; the photo shows on the project's own page.
    const page = await client.get(`/projects/${t.project.id}`);
    expect(page.text).toContain(`/api/attachments/${row.id}?variant=thumb`);
    expect((await client.get("/portal")).text).toContain(`/projects/${t.project.id}`);
    expect((await client.get(`/projects/${t.project.id}`)).text).toContain("New photo: Cloudy water this morning");
    expect((await (await signedIn(t.otherClient)).post(`/api/projects/${t.project.id}/uploads`, form)).status).toBe(404);
  });
});
