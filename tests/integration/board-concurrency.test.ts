import { describe, expect, it } from "vitest";
import { inArray } from "drizzle-orm";
import { db, pool } from "@/db";
import { projects } from "@/db/schema";
import { getBoard } from "@/db/queries/board";
import { getProject, makeProject, makeTeam, makeUser } from "../support/fixtures";
import { signedIn } from "../support/http";

const byKey = (a: { position: string; id: string }, b: { position: string; id: string }) => (a.position < b.position ? -1 : a.position > b.position ? 1 : a.id < b.id ? -1 : 1);

describe("moves at the same time", () => {
  it("lets exactly one of two moves with the same version through", async () => {
    const t = await makeTeam("aquascape");
    const [a, b] = await Promise.all([signedIn(t.lead), signedIn(t.crew)]);
    const body = { toStage: "site_survey", version: t.project.version, reason: "Back for a re-measure" };
    const results = await Promise.all([a.post(`/api/projects/${t.project.id}/move`, body), b.post(`/api/projects/${t.project.id}/move`, { ...body, toStage: "stand_load_check" })]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    expect((await getProject(t.project.id)).version).toBe(t.project.version + 1);
  });

  it("gives concurrent drops into one column distinct, ordered keys in the order asked for", async () => {
    const lead = await makeUser("lead");
    const client = await makeUser("client");
    const anchors: { id: string }[] = [];
    for (let i = 0; i < 4; i++) anchors.push(await makeProject({ client, lead, stage: "in_service", title: `Anchor ${i}` }));
    const movers: { id: string }[] = [];
    for (let i = 0; i < 4; i++) movers.push(await makeProject({ client, lead, stage: "first_stocking", title: `Mover ${i}` }));
    const crowd: { id: string }[] = [];
    for (let i = 0; i < 6; i++) crowd.push(await makeProject({ client, lead, stage: "first_stocking", title: `Crowd ${i}` }));
    const sessions = await Promise.all([...movers, ...crowd].map(() => signedIn(lead)));
    // Lead override lets these through the in-service gate without stocking records.
    const overrideReason = "Concurrent placement check";
    const res = await Promise.all([
      ...movers.map((m, i) => sessions[i].post(`/api/projects/${m.id}/move`, { toStage: "in_service", version: 1, afterId: anchors[i].id, overrideReason })),
      ...crowd.map((c, i) => sessions[movers.length + i].post(`/api/projects/${c.id}/move`, { toStage: "in_service", version: 1, beforeId: anchors[3].id, overrideReason })),
    ]);
    expect(res.map((r) => r.status)).toEqual(Array(10).fill(200));
    const ids = [...anchors, ...movers, ...crowd].map((p) => p.id);
    const rows = (await db().select({ id: projects.id, position: projects.position, stage: projects.stage }).from(projects).where(inArray(projects.id, ids))).sort(byKey);
    expect(new Set(rows.map((r) => r.position)).size).toBe(rows.length);
    const order = rows.map((r) => r.id);
    // Each mover right after its anchor; the crowd between mover 2 and anchor 3, in any order.
    expect(order.slice(0, 6)).toEqual([anchors[0].id, movers[0].id, anchors[1].id, movers[1].id, anchors[2].id, movers[2].id]);
    expect(new Set(order.slice(6, 12))).toEqual(new Set(crowd.map((c) => c.id)));
    expect(order.slice(12)).toEqual([anchors[3].id, movers[3].id]);
  });

  it("reads the whole board with the same number of queries for few cards or many", async () => {
    const t = await makeTeam("cycling");
    const p = pool();
    let count = 0;
    const original = p.query.bind(p);
    p.query = ((...args: Parameters<typeof original>) => {
      count++;
      return original(...args);
    }) as typeof p.query;
    try {
      await getBoard(t.crew);
      const few = count;
      count = 0;
      await getBoard(t.lead);
      const many = count;
      expect(few).toBe(many);
      // The cards, their gate records, the cycling cards' inputs (rules, starts, readings, doses) and
      // the company's stage durations: seven round trips, run side by side, however many cards.
      expect(many).toBeLessThanOrEqual(7);
    } finally {
      p.query = original;
    }
  });
});
