import { randomUUID } from "node:crypto";
import { describe, expect, it } from "vitest";
import { and, count, eq } from "drizzle-orm";
import { db } from "@/db";
import { messages, notes, notices, visits } from "@/db/schema";
import { makeProject, makeTeam } from "../support/fixtures";
import { anonymous, signedIn } from "../support/http";

/**
 * A page the caller may not see. Under a streaming loading boundary the status line can be sent
 * before the not-found is known, so the page's content is what proves nothing leaked.
 */
function expectHiddenPage(res: { status: number; text: string }, title: string, path: string) {
  expect(res.text, path).not.toContain(title);
  if (res.status !== 404) {
    expect(res.status, path).toBe(200);
    expect(res.text, path).toContain("Nothing here, or not for you");
  }
}

const countRows = async (table: typeof messages | typeof notes | typeof visits, projectId: string) =>
  (await db().select({ n: count() }).from(table).where(eq(table.projectId, projectId)))[0].n;

describe("a client sees only their own projects and shared notes", () => {
  it("keeps internal notes from the client on every route and page", async () => {
    const t = await makeTeam("cycling");
    const lead = await signedIn(t.lead);
    const sharedBody = `Shared note ${randomUUID().slice(0, 6)}: the rock is in.`;
    const internalBody = `Internal note ${randomUUID().slice(0, 6)}: client slow to pay.`;
    expect((await lead.post(`/api/projects/${t.project.id}/notes`, { body: sharedBody, shared: true })).status).toBe(201);
    expect((await lead.post(`/api/projects/${t.project.id}/notes`, { body: internalBody, shared: false })).status).toBe(201);

    const client = await signedIn(t.client);
    const list = await client.get(`/api/projects/${t.project.id}/notes`);
    expect(list.status).toBe(200);
    expect(list.json.notes.map((n: { body: string }) => n.body)).toEqual([sharedBody]);

    const crew = await signedIn(t.crew);
    const crewList = await crew.get(`/api/projects/${t.project.id}/notes`);
    expect(crewList.json.notes.map((n: { body: string }) => n.body).sort()).toEqual([sharedBody, internalBody].sort());

    for (const path of [`/projects/${t.project.id}`, `/projects/${t.project.id}/talk`, "/portal"]) {
      const page = await client.get(path);
      expect(page.status, path).toBe(200);
      expect(page.text, path).not.toContain(internalBody.slice(0, 20));
      if (path !== "/portal") expect(page.text, path).toContain(sharedBody.slice(0, 20));
    }
    const staffPage = await lead.get(`/projects/${t.project.id}/talk`);
    expect(staffPage.text).toContain(internalBody.slice(0, 20));

    // No e-mail carries an internal note.
    const mails = await db().select({ text: notices.text, html: notices.html }).from(notices).where(eq(notices.projectId, t.project.id));
    for (const m of mails) expect(m.text + m.html).not.toContain(internalBody.slice(0, 20));
  });

  it("404s another client's project on every route and page", async () => {
    const t = await makeTeam("cycling");
    const other = await signedIn(t.otherClient);
    const id = t.project.id;
    for (const path of [`/api/projects/${id}/notes`, `/api/projects/${id}/messages`, `/api/projects/${id}/visits`, `/api/projects/${id}/calendar.ics`]) {
      const res = await other.get(path);
      expect(res.status, path).toBe(404);
      expect(res.text, path).not.toContain(t.project.title);
    }
    for (const path of [`/projects/${id}`, `/projects/${id}/talk`, `/projects/${id}/visits`]) expectHiddenPage(await other.get(path), t.project.title, path);
    expect((await other.post(`/api/projects/${id}/messages`, { body: "Hello?" })).status).toBe(404);
    expect(await countRows(messages, id)).toBe(0);
    const portal = await other.get("/portal");
    expect(portal.status).toBe(200);
    expect(portal.text).not.toContain(t.project.title);
    const own = await signedIn(t.client);
    expect((await own.get("/portal")).text).toContain(t.project.title);
    const otherCrew = await signedIn(t.otherCrew);
    expect((await otherCrew.get(`/api/projects/${id}/messages`)).status).toBe(404);
    expect((await anonymous().get(`/api/projects/${id}/messages`)).status).toBe(401);
  });
});

describe("messages", () => {
  it("lets the client write to the lead and shows author, role and order", async () => {
    const t = await makeTeam("cycling");
    const client = await signedIn(t.client);
    const sent = await client.post(`/api/projects/${t.project.id}/messages`, { body: "  The filter is making a rattling noise.  " });
    expect(sent.status).toBe(201);
    const lead = await signedIn(t.lead);
    expect((await lead.post(`/api/projects/${t.project.id}/messages`, { body: "Thanks, Teo will look on Thursday." })).status).toBe(201);
    const list = await (await signedIn(t.crew)).get(`/api/projects/${t.project.id}/messages`);
    expect(list.status).toBe(200);
    expect(list.json.messages.map((m: { body: string; authorRole: string; authorName: string }) => [m.body, m.authorRole, m.authorName])).toEqual([
      ["The filter is making a rattling noise.", "client", t.client.name],
      ["Thanks, Teo will look on Thursday.", "lead", t.lead.name],
    ]);
  });

  it("refuses empty, too-long and malformed messages, and unknown projects, changing nothing", async () => {
    const t = await makeTeam("cycling");
    const client = await signedIn(t.client);
    const url = `/api/projects/${t.project.id}/messages`;
    for (const body of [{ body: "" }, { body: "   " }, { body: "x".repeat(4001) }, {}, { body: 42 }]) {
      const res = await client.post(url, body);
      expect(res.status, JSON.stringify(body).slice(0, 40)).toBe(400);
      expect(res.json.fields.body).toBeTruthy();
    }
    expect((await client.request("POST", url, "not json", { headers: { "content-type": "application/json" } })).status).toBe(400);
    expect((await client.post(url, { body: "x".repeat(4000) })).status).toBe(201);
    expect(await countRows(messages, t.project.id)).toBe(1);
    expect((await client.post(`/api/projects/${randomUUID()}/messages`, { body: "Hi" })).status).toBe(404);
    expect((await client.post(`/api/projects/not-a-project/messages`, { body: "Hi" })).status).toBe(404);
  });
});

describe("notes", () => {
  it("lets only the lead write notes and change their sharing; forged and foreign note ids are 404", async () => {
    const t = await makeTeam("aquascape");
    const elsewhere = await makeProject({ client: t.otherClient, lead: t.lead });
    const lead = await signedIn(t.lead);
    const created = await lead.post(`/api/projects/${t.project.id}/notes`, { body: "Stand levelled to 1 mm.", shared: false });
    expect(created.status).toBe(201);
    const foreign = await lead.post(`/api/projects/${elsewhere.id}/notes`, { body: "Other project's note.", shared: false });

    expect((await (await signedIn(t.crew)).post(`/api/projects/${t.project.id}/notes`, { body: "Crew note", shared: true })).status).toBe(403);
    expect((await (await signedIn(t.client)).post(`/api/projects/${t.project.id}/notes`, { body: "Client note", shared: true })).status).toBe(403);
    expect((await (await signedIn(t.client)).patch(`/api/projects/${t.project.id}/notes/${created.json.id}`, { shared: true })).status).toBe(403);
    expect((await lead.post(`/api/projects/${t.project.id}/notes`, { body: "", shared: true })).status).toBe(400);
    expect((await lead.post(`/api/projects/${t.project.id}/notes`, { body: "No flag" })).status).toBe(400);

    for (const noteId of ["forged-id", randomUUID(), foreign.json.id]) {
      const res = await lead.patch(`/api/projects/${t.project.id}/notes/${noteId}`, { shared: true });
      expect(res.status, noteId).toBe(404);
    }
    const [untouched] = await db().select().from(notes).where(eq(notes.id, foreign.json.id));
    expect(untouched.shared).toBe(false);
    expect((await lead.patch(`/api/projects/${t.project.id}/notes/${created.json.id}`, { shared: "yes" })).status).toBe(400);

    const shared = await lead.patch(`/api/projects/${t.project.id}/notes/${created.json.id}`, { shared: true });
    expect(shared.status).toBe(200);
    expect(shared.json.shared).toBe(true);
    const clientView = await (await signedIn(t.client)).get(`/api/projects/${t.project.id}/notes`);
    expect(clientView.json.notes).toHaveLength(1);
    expect(await countRows(notes, t.project.id)).toBe(1);
  });
});

describe("visits and calendars", () => {
  it("lets the lead book visits, shows them in the project's calendar file and the personal feed", async () => {
    const t = await makeTeam("fill_leak_test");
    const lead = await signedIn(t.lead);
    const url = `/api/projects/${t.project.id}/visits`;
    const booked = await lead.post(url, { kind: "install day", startsAt: "2027-03-04T09:00:00Z", durationMinutes: 240, notes: "Two people, trolley" });
    expect(booked.status).toBe(201);
    expect((await (await signedIn(t.crew)).post(url, { kind: "water test", startsAt: "2027-03-05T09:00:00Z", durationMinutes: 30 })).status).toBe(403);
    expect((await (await signedIn(t.otherClient)).post(url, { kind: "water test", startsAt: "2027-03-05T09:00:00Z", durationMinutes: 30 })).status).toBe(404);
    const bad = await lead.post(url, { kind: "party", startsAt: "soon", durationMinutes: 5 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.json.fields).sort()).toEqual(["durationMinutes", "kind", "startsAt"]);
    expect(await countRows(visits, t.project.id)).toBe(1);

    const client = await signedIn(t.client);
    const ics = await client.get(`/api/projects/${t.project.id}/calendar.ics`);
    expect(ics.status).toBe(200);
    expect(ics.headers.get("content-type")).toMatch(/text\/calendar/);
    expect(ics.text).toContain("BEGIN:VCALENDAR");
    expect(ics.text).toContain(`Install day: ${t.project.title}`);
    expect(ics.text).toContain("DTSTART:20270304T090000Z");

    const token = await client.post("/api/calendar/token");
    expect(token.status).toBe(201);
    const feedPath = new URL(token.json.url).pathname;
    const feed = await anonymous().get(feedPath);
    expect(feed.status).toBe(200);
    expect(feed.text).toContain(t.project.title);
    const other = await (await signedIn(t.otherClient)).post("/api/calendar/token");
    expect((await anonymous().get(new URL(other.json.url).pathname)).text).not.toContain(t.project.title);

    const again = await client.post("/api/calendar/token");
    expect((await anonymous().get(feedPath)).status).toBe(404);
    expect((await anonymous().get(new URL(again.json.url).pathname)).status).toBe(200);
    expect((await anonymous().get("/api/calendar/guessed-token-0000000000000.ics")).status).toBe(404);
  });
});

describe("account", () => {
  it("saves notification preferences and contact details, refusing bad input", async () => {
    const t = await makeTeam("cycling");
    const client = await signedIn(t.client);
    expect((await client.get("/account")).status).toBe(200);
    const put = await client.request("PUT", "/api/me/notifications", { message: false });
    expect(put.status).toBe(200);
    expect(put.json.prefs).toEqual({ stage_change: true, cycle_ready: true, shared_note: true, message: false, visit_report: true });
    expect((await client.request("PUT", "/api/me/notifications", { message: "off" })).status).toBe(400);
    const contact = await client.patch("/api/me/contact", { name: "Fixture Person", phone: "+44 20 0000 0000" });
    expect(contact.status).toBe(200);
    expect(contact.json.contact.phone).toBe("+44 20 0000 0000");
    const badContact = await client.patch("/api/me/contact", { name: "", phone: "call me" });
    expect(badContact.status).toBe(400);
    expect(Object.keys(badContact.json.fields).sort()).toEqual(["name", "phone"]);
    expect((await anonymous().request("PUT", "/api/me/notifications", { message: false })).status).toBe(401);
    const rows = await db().select().from(notices).where(and(eq(notices.recipientId, t.client.id)));
    expect(rows).toHaveLength(0);
  });
});
