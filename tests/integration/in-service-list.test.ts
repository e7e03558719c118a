import { randomUUID } from "node:crypto";
import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { projects } from "@/db/schema";
import { makeProject, makeTeam, makeUser } from "../support/fixtures";
import { anonymous, signedIn } from "../support/http";
import { RECENT_HANDOVER_DAYS } from "@/lib/stages/in-service-attention";

const DAY = 86_400_000;

/** A tank in service handed over `days` ago, titled so a search finds only this test's tanks. */
async function tankInService(opts: { client: { id: string }; lead: { id: string }; crew?: { id: string }[]; title: string; days: number }) {
  const p = await makeProject({ ...opts, stage: "in_service" });
  await db().update(projects).set({ stageEnteredAt: new Date(Date.now() - opts.days * DAY) }).where(eq(projects.id, p.id));
  return p;
}

type Page = { tanks: { id: string; title: string; handedOverAt: string }[]; total: number; page: number; pageCount: number; pageSize: number };

describe("the list of tanks in service", () => {
  it("pages through every tank, newest handover first, and searches title, client and town", async () => {
    const t = await makeTeam();
    const tag = `Vessel${randomUUID().slice(0, 6)}`;
    // 27 tanks: one page of 25 and a second of 2; handed over 20 to 46 days ago.
    for (let i = 0; i < 27; i++) await tankInService({ client: t.client, lead: t.lead, title: `${tag} ${String(i).padStart(2, "0")}`, days: 20 + i });
    const s = await signedIn(t.lead);
    const first = await s.get(`/api/in-service?q=${tag}`);
    expect(first.status).toBe(200);
    const one = first.json as Page;
    expect(one).toMatchObject({ total: 27, page: 1, pageCount: 2, pageSize: 25 });
    expect(one.tanks.map((x) => x.title)).toEqual(Array.from({ length: 25 }, (_, i) => `${tag} ${String(i).padStart(2, "0")}`));
    const two = (await s.get(`/api/in-service?q=${tag}&page=2`)).json as Page;
    expect(two.tanks.map((x) => x.title)).toEqual([`${tag} 25`, `${tag} 26`]);
    // Past the last page: an empty page, not an error.
    expect(((await s.get(`/api/in-service?q=${tag}&page=3`)).json as Page).tanks).toEqual([]);
    // One tank by its full title; by the client's name every tank of that client.
    expect(((await s.get(`/api/in-service?q=${encodeURIComponent(`${tag} 07`)}`)).json as Page).tanks.map((x) => x.title)).toEqual([`${tag} 07`]);
    expect(((await s.get(`/api/in-service?q=${encodeURIComponent(t.client.name)}`)).json as Page).total).toBe(27);
    // A % typed in the search is a character, not a wildcard.
    expect(((await s.get(`/api/in-service?q=${encodeURIComponent(`${tag}%`)}`)).json as Page).total).toBe(0);
  });

  it("shows crew only the tanks they're assigned to, and refuses clients and anonymous callers", async () => {
    const t = await makeTeam();
    const tag = `Basin${randomUUID().slice(0, 6)}`;
    const mine = await tankInService({ client: t.client, lead: t.lead, crew: [t.crew], title: `${tag} assigned`, days: 100 });
    await tankInService({ client: t.client, lead: t.lead, crew: [t.otherCrew], title: `${tag} other crew`, days: 90 });
    const crew = (await (await signedIn(t.crew)).get(`/api/in-service?q=${tag}`)).json as Page;
    expect(crew.tanks.map((x) => x.id)).toEqual([mine.id]);
    expect(crew.total).toBe(1);
    expect(((await (await signedIn(t.lead)).get(`/api/in-service?q=${tag}`)).json as Page).total).toBe(2);
    const client = await (await signedIn(t.client)).get(`/api/in-service?q=${tag}`);
    expect(client.status).toBe(403);
    expect((await anonymous().get("/api/in-service")).status).toBe(401);
  });

  it("refuses a malformed page or an over-long search with a message", async () => {
    const s = await signedIn(await makeUser("lead"));
    for (const bad of ["page=0", "page=-1", "page=abc", "page=1.5", "page=123456", `q=${"x".repeat(101)}`]) {
      const res = await s.get(`/api/in-service?${bad}`);
      expect(res.status, bad).toBe(400);
      expect(JSON.stringify(res.json)).toMatch(/page as a whole number|under 100 characters/);
    }
  });
});

describe("the board's in-service column", () => {
  it("shows the tanks handed over recently, counts the rest, and keeps other stages whole", async () => {
    const t = await makeTeam("cycling");
    const tag = `Reef${randomUUID().slice(0, 6)}`;
    const recent = await tankInService({ client: t.client, lead: t.lead, crew: [t.crew], title: `${tag} recent`, days: 1 });
    const edge = await tankInService({ client: t.client, lead: t.lead, crew: [t.crew], title: `${tag} edge`, days: RECENT_HANDOVER_DAYS - 0.5 });
    const old = await tankInService({ client: t.client, lead: t.lead, crew: [t.crew], title: `${tag} old`, days: RECENT_HANDOVER_DAYS + 1 });
    const older = await tankInService({ client: t.client, lead: t.lead, crew: [t.crew], title: `${tag} older`, days: 900 });
    // The crew member sees only these: exact counts.
    const board = (await (await signedIn(t.crew)).get("/api/projects")).json as { cards: { id: string; stage: string }[]; inServiceRest: number };
    const ids = board.cards.map((c) => c.id);
    expect(ids).toEqual(expect.arrayContaining([t.project.id, recent.id, edge.id]));
    expect(ids).not.toContain(old.id);
    expect(ids).not.toContain(older.id);
    expect(board.cards).toHaveLength(3);
    expect(board.inServiceRest).toBe(2);
  });

  it("keeps a card dropped into in service on the board, and counts a tank moved back out again", async () => {
    const t = await makeTeam("first_stocking");
    const old = await tankInService({ client: t.client, lead: t.lead, crew: [t.crew], title: "Handed over long ago", days: 400 });
    const s = await signedIn(t.lead);
    const moved = await s.post(`/api/projects/${t.project.id}/move`, { toStage: "in_service", version: t.project.version, overrideReason: "Handover checked on site" });
    expect(moved.status).toBe(200);
    const crewView = await signedIn(t.crew);
    let board = (await crewView.get("/api/projects")).json as { cards: { id: string; stage: string }[]; inServiceRest: number };
    expect(board.cards.map((c) => [c.id, c.stage])).toEqual([[t.project.id, "in_service"]]);
    expect(board.inServiceRest).toBe(1);
    // The old tank goes back to first stocking (from the list's project page, say): it is a card again.
    const back = await s.post(`/api/projects/${old.id}/move`, { toStage: "first_stocking", version: old.version, reason: "A second batch of fish" });
    expect(back.status).toBe(200);
    board = (await crewView.get("/api/projects")).json as { cards: { id: string; stage: string }[]; inServiceRest: number };
    expect(board.cards.map((c) => c.id).sort()).toEqual([t.project.id, old.id].sort());
    expect(board.inServiceRest).toBe(0);
  });
});
