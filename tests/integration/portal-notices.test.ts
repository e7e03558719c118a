import { describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { notices, notificationPrefs } from "@/db/schema";
import { queueStageChangeNotices } from "@/db/queries/stage-change-notices";
import { makeTeam } from "../support/fixtures";
import { signedIn } from "../support/http";
import { mailTo, waitForMail } from "../support/mail";

const appUrl = () => process.env.APP_URL ?? process.env.TEST_APP_URL!;
const noticesFor = (recipientId: string, projectId: string) =>
  db().select().from(notices).where(and(eq(notices.recipientId, recipientId), eq(notices.projectId, projectId)));

describe("stage-change e-mail", () => {
  it("sends exactly one e-mail to the client and one to the lead, not to the person who moved it", async () => {
    const t = await makeTeam("site_survey");
    await db().transaction(async (tx) => {
      await queueStageChangeNotices(tx, { projectId: t.project.id, fromStage: "site_survey", toStage: "stand_load_check", byUserId: t.crew.id, override: false, reason: null });
    });
    for (const who of [t.client, t.lead]) {
      const [mail] = await waitForMail(who.email);
      expect(mail.subject).toBe(`${t.project.title}: now in Stand & load check`);
      expect(mail.text).toContain(`${appUrl()}/projects/${t.project.id}`);
      expect(mail.html).toContain(`${appUrl()}/projects/${t.project.id}`);
      expect(mail.text).toContain(t.crew.name);
    }
    // Give the worker a moment to deliver anything extra before counting.
    await new Promise((r) => setTimeout(r, 1500));
    expect(await mailTo(t.client.email)).toHaveLength(1);
    expect(await mailTo(t.lead.email)).toHaveLength(1);
    expect(await mailTo(t.crew.email)).toHaveLength(0);
  });

  it("writes nothing when the change is rolled back", async () => {
    const t = await makeTeam("site_survey");
    await expect(
      db().transaction(async (tx) => {
        await queueStageChangeNotices(tx, { projectId: t.project.id, fromStage: "site_survey", toStage: "stand_load_check", byUserId: t.lead.id, override: false, reason: null });
        throw new Error("the move failed");
      }),
    ).rejects.toThrow("the move failed");
    expect(await noticesFor(t.client.id, t.project.id)).toHaveLength(0);
  });

  it("e-mails the client once when the lead moves a card through the board, with the override reason", async () => {
    const t = await makeTeam("site_survey");
    const lead = await signedIn(t.lead);
    const res = await lead.post(`/api/projects/${t.project.id}/move`, { toStage: "stand_load_check", version: t.project.version, overrideReason: "Survey finished on paper; entering it tomorrow." });
    expect(res.status, res.text).toBe(200);
    const [mail] = await waitForMail(t.client.email);
    expect(mail.subject).toBe(`${t.project.title}: now in Stand & load check`);
    expect(mail.text).toContain("Survey finished on paper");
    await new Promise((r) => setTimeout(r, 1500));
    expect(await mailTo(t.client.email)).toHaveLength(1);
    expect(await noticesFor(t.lead.id, t.project.id)).toHaveLength(0);
  });

  it("skips a recipient who turned stage-change e-mail off", async () => {
    const t = await makeTeam("site_survey");
    await db().insert(notificationPrefs).values({ userId: t.client.id, kind: "stage_change", enabled: false });
    await db().transaction((tx) =>
      queueStageChangeNotices(tx, { projectId: t.project.id, fromStage: "site_survey", toStage: "stand_load_check", byUserId: t.crew.id, override: false, reason: null }),
    );
    expect(await noticesFor(t.client.id, t.project.id)).toHaveLength(0);
    expect(await noticesFor(t.lead.id, t.project.id)).toHaveLength(1);
  });
});

describe("note and message e-mail", () => {
  it("tells the client about a shared note, and never about an internal one", async () => {
    const t = await makeTeam("cycling");
    const lead = await signedIn(t.lead);
    await lead.post(`/api/projects/${t.project.id}/notes`, { body: "Internal: check the invoice.", shared: false });
    expect(await noticesFor(t.client.id, t.project.id)).toHaveLength(0);
    await lead.post(`/api/projects/${t.project.id}/notes`, { body: "The ammonia is dropping nicely.", shared: true });
    const [mail] = await waitForMail(t.client.email);
    expect(mail.subject).toBe(`${t.project.title}: a new note from ${t.lead.name}`);
    expect(mail.text).toContain("The ammonia is dropping nicely.");
    expect(mail.text).toContain(`${appUrl()}/projects/${t.project.id}/talk`);
    expect(mail.text).not.toContain("invoice");
  });

  it("e-mails the lead when the client writes, and the client when staff answer; preferences turn it off", async () => {
    const t = await makeTeam("cycling");
    const client = await signedIn(t.client);
    await client.post(`/api/projects/${t.project.id}/messages`, { body: "Is the cloudy water normal?" });
    const [toLead] = await waitForMail(t.lead.email);
    expect(toLead.subject).toBe(`${t.project.title}: message from ${t.client.name}`);
    expect(toLead.text).toContain("Is the cloudy water normal?");

    await (await signedIn(t.crew)).post(`/api/projects/${t.project.id}/messages`, { body: "Yes, a bacterial bloom; it clears in days." });
    const [toClient] = await waitForMail(t.client.email);
    expect(toClient.text).toContain("bacterial bloom");

    const lead = await signedIn(t.lead);
    expect((await lead.request("PUT", "/api/me/notifications", { message: false })).status).toBe(200);
    await client.post(`/api/projects/${t.project.id}/messages`, { body: "Thanks!" });
    const rows = await db().select().from(notices).where(and(eq(notices.recipientId, t.lead.id), eq(notices.kind, "message")));
    expect(rows).toHaveLength(1);
  });
});
