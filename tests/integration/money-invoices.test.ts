import { describe, expect, it } from "vitest";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { getProject, makeTeam } from "../support/fixtures";
import { signedIn } from "../support/http";
import { approveLoad } from "./board-support";
import { invoicesOf, issuedQuote } from "./money-support";

type Team = Awaited<ReturnType<typeof makeTeam>>;

async function accept(t: Team) {
  const q = await issuedQuote(t.project, t.lead);
  const client = await signedIn(t.client);
  const { hash } = (await client.get(`/api/projects/${t.project.id}/quotes`)).json.current;
  return { client, res: await client.post(`/api/projects/${t.project.id}/quotes/${q.id}/accept`, { typedName: t.client.name, seenHash: hash }) };
}

async function allNumbers(): Promise<number[]> {
  const res = await db().execute(sql`select number from invoices order by number`);
  return (res.rows as { number: number }[]).map((r) => Number(r.number));
}

describe("invoice numbers", () => {
  it("are sequential with no gaps or repeats when many invoices are created at once", async () => {
    const teams = await Promise.all(Array.from({ length: 12 }, () => makeTeam("stand_load_check")));
    const prepared = await Promise.all(
      teams.map(async (t) => {
        const q = await issuedQuote(t.project, t.lead);
        const client = await signedIn(t.client);
        const { hash } = (await client.get(`/api/projects/${t.project.id}/quotes`)).json.current;
        return { t, q, client, hash };
      }),
    );
    // Twelve acceptances at once, each issuing a deposit invoice, with a refused one (wrong name) in the mix.
    const results = await Promise.all([
      ...prepared.map(({ t, q, client, hash }) => client.post(`/api/projects/${t.project.id}/quotes/${q.id}/accept`, { typedName: t.client.name, seenHash: hash })),
      prepared[0].client.post(`/api/projects/${prepared[0].t.project.id}/quotes/${prepared[0].q.id}/accept`, { typedName: "Nobody Here", seenHash: prepared[0].hash }),
    ]);
    expect(results.slice(0, 12).map((r) => r.status)).toEqual(Array(12).fill(201));
    const mine = (await Promise.all(teams.map((t) => invoicesOf(t.project)))).flat().map((i) => i.number);
    expect(mine).toHaveLength(12);
    expect(new Set(mine).size).toBe(12);
    const sorted = [...mine].sort((a, b) => a - b);
    expect(sorted[11] - sorted[0]).toBe(11);
    // And across the whole company: 1, 2, 3… with nothing skipped.
    const all = await allNumbers();
    expect(all).toEqual(all.map((_, i) => i + 1));
  });
});

describe("the deposit gate into aquascape", () => {
  it("holds until the deposit is paid, says so on the card, and opens once the lead records the transfer", async () => {
    const t = await makeTeam("stand_load_check");
    await approveLoad(t.project, t.lead);
    const lead = await signedIn(t.lead);
    const move = async () => lead.post(`/api/projects/${t.project.id}/move`, { toStage: "aquascape", version: (await getProject(t.project.id)).version });
    let res = await move();
    expect(res.status).toBe(422);
    expect(res.json.reasons).toEqual(["The deposit isn't paid yet: the client hasn't accepted a quote."]);

    expect((await accept(t)).res.status).toBe(201);
    res = await move();
    expect(res.status).toBe(422);
    expect(res.json.reasons).toEqual(["The deposit isn't paid yet: glass is ordered and install day booked once it is."]);
    const board = await lead.get("/board");
    expect(board.text).toContain("Before Aquascape: The deposit isn");

    const [deposit] = await invoicesOf(t.project);
    expect((await lead.post(`/api/invoices/${deposit.id}/transfer`, { amountMinor: deposit.totalMinor, receivedOn: "2026-12-01", reference: "BANK-1" })).status).toBe(201);
    res = await move();
    expect(res.status).toBe(200);
    // Install day bills its share (30 % of 1,200.00) with the move.
    const after = await invoicesOf(t.project);
    expect(after.map((i) => [i.kind, i.totalMinor, i.status])).toEqual([
      ["deposit", 60_000, "paid"],
      ["progress", 36_000, "open"],
    ]);
  });

  it("the lead may pass it with a written reason; crew may not", async () => {
    const t = await makeTeam("stand_load_check");
    await approveLoad(t.project, t.lead);
    await accept(t);
    const version = (await getProject(t.project.id)).version;
    const crew = await (await signedIn(t.crew)).post(`/api/projects/${t.project.id}/move`, { toStage: "aquascape", version, overrideReason: "Client says it's paid" });
    expect(crew.status).toBe(403);
    const res = await (await signedIn(t.lead)).post(`/api/projects/${t.project.id}/move`, { toStage: "aquascape", version, overrideReason: "Deposit paid in cash at the showroom; receipt 118" });
    expect(res.status).toBe(200);
    expect(res.json.override).toBe(true);
  });
});

describe("the schedule and monthly plans", () => {
  it("sets shares per project, refuses bad ones, and bills a month once however often it is run", async () => {
    const t = await makeTeam("in_service");
    const lead = await signedIn(t.lead);
    const put = (body: Record<string, unknown>) => lead.request("PUT", `/api/projects/${t.project.id}/schedule`, body);
    expect((await put({ depositBp: 8000, progressBp: 3000, monthlyPlanMinor: null, monthlyPlanTaxBp: 0 })).status).toBe(400);
    expect((await put({ depositBp: 5000, progressBp: 3000, monthlyPlanMinor: -100, monthlyPlanTaxBp: 0 })).status).toBe(400);
    expect((await put({ depositBp: 5000, progressBp: 3000, monthlyPlanMinor: 5400, monthlyPlanTaxBp: 10_500 })).status).toBe(400);
    expect((await (await signedIn(t.client)).request("PUT", `/api/projects/${t.project.id}/schedule`, { depositBp: 0, progressBp: 0, monthlyPlanMinor: null, monthlyPlanTaxBp: 0 })).status).toBe(403);
    expect((await put({ depositBp: 4000, progressBp: 4000, monthlyPlanMinor: 5400, monthlyPlanTaxBp: 2000 })).status).toBe(200);

    const period = "2031-07";
    const runs = await Promise.all([lead.post("/api/money/monthly", { period }), lead.post("/api/money/monthly", { period })]);
    expect(runs.map((r) => r.status)).toEqual([200, 200]);
    const monthly = (await invoicesOf(t.project)).filter((i) => i.kind === "monthly");
    expect(monthly).toHaveLength(1);
    // 54.00 including 20 % tax: 45.00 + 9.00.
    expect(monthly[0]).toMatchObject({ period, totalMinor: 5400, taxMinor: 900, netMinor: 4500 });
    expect((await lead.post("/api/money/monthly", { period: "2031-13" })).status).toBe(400);
    expect((await (await signedIn(t.client)).post("/api/money/monthly", { period })).status).toBe(403);
    const all = await allNumbers();
    expect(all).toEqual(all.map((_, i) => i + 1));
  });
});
