import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { company, notes, notices } from "@/db/schema";
import { makeTeam } from "../support/fixtures";
import { signedIn } from "../support/http";
import { mailTo, waitForMail } from "../support/mail";
import { completeSurvey } from "./board-support";

// Our own test value: long enough that a move and its undo sent back to back land inside it.
const DELAY_SECONDS = 4;
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
const noticesOf = (projectId: string) => db().select().from(notices).where(eq(notices.projectId, projectId));

beforeAll(async () => {
  await db().update(company).set({ noticeDelaySeconds: DELAY_SECONDS }).where(eq(company.id, 1));
});
afterAll(async () => {
  await db().update(company).set({ noticeDelaySeconds: null }).where(eq(company.id, 1));
});

describe("sharing a note with the client", () => {
  it("names the client, holds the e-mail, and taking it back before it leaves sends nothing", async () => {
    const t = await makeTeam("aquascape");
    const lead = await signedIn(t.lead);
    const created = await lead.post(`/api/projects/${t.project.id}/notes`, { body: "Internal: the supplier is late with the rock.", shared: false });
    expect(created.status).toBe(201);
    expect(created.json.email).toBeNull();

    const before = Date.now();
    const shared = await lead.request("PATCH", `/api/projects/${t.project.id}/notes/${created.json.id}`, { shared: true });
    expect(shared.status).toBe(200);
    expect(shared.json.email.to).toBe(t.client.name);
    const leaves = new Date(shared.json.email.leavesAt).getTime();
    expect(leaves).toBeGreaterThanOrEqual(before + (DELAY_SECONDS - 1) * 1000);

    // The talk page says who will see it before anything is shared.
    const page = await lead.get(`/projects/${t.project.id}/talk`);
    expect(page.text).toContain("The e-mail leaves at");

    const back = await lead.request("PATCH", `/api/projects/${t.project.id}/notes/${created.json.id}`, { shared: false });
    expect(back.status).toBe(200);
    expect(back.json).toMatchObject({ shared: false, takenBack: true, alreadySent: false });
    const [row] = await noticesOf(t.project.id);
    expect(row.status).toBe("withdrawn");

    await sleep(DELAY_SECONDS * 1000 + 2500);
    expect(await mailTo(t.client.email)).toHaveLength(0);
    const [note] = await db().select().from(notes).where(eq(notes.id, created.json.id));
    expect(note.shared).toBe(false);
    const client = await signedIn(t.client);
    expect((await client.get(`/api/projects/${t.project.id}/notes`)).json.notes).toHaveLength(0);
  });

  it("sends the e-mail once the hold ends, and says so if it is made internal afterwards", async () => {
    const t = await makeTeam("aquascape");
    const lead = await signedIn(t.lead);
    const created = await lead.post(`/api/projects/${t.project.id}/notes`, { body: "The stand is level and bolted.", shared: true });
    expect(created.json.email.to).toBe(t.client.name);
    expect(await mailTo(t.client.email)).toHaveLength(0);
    const [mail] = await waitForMail(t.client.email, 1, 20_000);
    expect(mail.text).toContain("The stand is level and bolted.");
    const back = await lead.request("PATCH", `/api/projects/${t.project.id}/notes/${created.json.id}`, { shared: false });
    expect(back.json).toMatchObject({ takenBack: false, alreadySent: true });
  });
});

describe("stage-change notices wait out the delay", () => {
  it("a move and its undo inside the delay send nothing", async () => {
    const t = await makeTeam("site_survey");
    await completeSurvey(t.project, t.lead);
    const lead = await signedIn(t.lead);
    const fwd = await lead.post(`/api/projects/${t.project.id}/move`, { toStage: "stand_load_check", version: t.project.version });
    expect(fwd.status).toBe(200);
    const back = await lead.post(`/api/projects/${t.project.id}/move`, { toStage: "site_survey", version: fwd.json.version, reason: "Dropped in the wrong column" });
    expect(back.status).toBe(200);
    const rows = await noticesOf(t.project.id);
    expect(rows.map((r) => r.status)).toEqual(["withdrawn"]);
    await sleep(DELAY_SECONDS * 1000 + 2500);
    expect(await mailTo(t.client.email)).toHaveLength(0);
  });

  it("outside the delay, the move and its undo each send one notice", async () => {
    const t = await makeTeam("site_survey");
    await completeSurvey(t.project, t.lead);
    const lead = await signedIn(t.lead);
    const fwd = await lead.post(`/api/projects/${t.project.id}/move`, { toStage: "stand_load_check", version: t.project.version });
    expect(fwd.status).toBe(200);
    const [first] = await waitForMail(t.client.email, 1, 20_000);
    expect(first.subject).toContain("Stand & load check");
    const back = await lead.post(`/api/projects/${t.project.id}/move`, { toStage: "site_survey", version: fwd.json.version, reason: "The survey needs another visit" });
    expect(back.status).toBe(200);
    const mails = await waitForMail(t.client.email, 2, 20_000);
    expect(mails[1].subject).toContain("Site survey");
    await sleep(1500);
    expect(await mailTo(t.client.email)).toHaveLength(2);
    const rows = await db().select().from(notices).where(and(eq(notices.projectId, t.project.id), eq(notices.status, "sent")));
    expect(rows).toHaveLength(2);
  });
});
