/**
 * Adds tanks handed over long ago to the benchmark database: the portfolio a company builds up
 * over years of service. Each has its history (stage events, a survey, leak checks, water tests and
 * a few messages), so the tables the board reads grow with it. Called by scripts/bench-board.ts.
 */
import { generateNKeysBetween } from "fractional-indexing";
import { and, eq, sql } from "drizzle-orm";
import { db } from "../db";
import { leakChecks, messages, projectCrew, projects, siteSurveys, stageEvents, users, waterTests } from "../db/schema";
import { STAGES } from "../lib/stages/stages";
import { RECENT_HANDOVER_DAYS } from "../lib/stages/in-service-attention";

const DAY = 86_400_000;

async function insertChunked<T>(rows: T[], insert: (chunk: T[]) => Promise<unknown>) {
  for (let i = 0; i < rows.length; i += 1000) await insert(rows.slice(i, i + 1000));
}

/** `count` tanks in service, handed over between RECENT_HANDOVER_DAYS + 1 days and about six years ago. */
export async function seedInService(count: number, now = Date.now()) {
  const d = db();
  const [lead] = await d.select().from(users).where(eq(users.role, "lead")).limit(1);
  const crew = await d.select().from(users).where(eq(users.role, "crew"));
  const clients = await d.select().from(users).where(eq(users.role, "client"));
  // After the column's current last key, so the seeded order is stable.
  const [last] = await d.select({ p: sql<string | null>`max(${projects.position} collate "C")` }).from(projects).where(eq(projects.stage, "in_service"));
  const keys = generateNKeysBetween(last?.p ?? null, null, count);
  const rows = Array.from({ length: count }, (_, i) => {
    const client = clients[i % clients.length];
    const handedOver = now - (RECENT_HANDOVER_DAYS + 1 + ((i * 37) % (6 * 365))) * DAY;
    return {
      title: `${client.name.split(" ")[1]} serviced tank ${i}`,
      clientId: client.id,
      leadId: lead.id,
      siteAddress: `${1 + (i % 90)} Invented Lane, Portfolio Reach`,
      siteTown: ["Quillhaven", "Orrowfen", "Fennick", "Tessling Bay"][i % 4],
      stage: "in_service" as const,
      position: keys[i],
      stageEnteredAt: new Date(handedOver),
      targetInstallDate: new Date(handedOver - 60 * DAY).toISOString().slice(0, 10),
      tankSummary: "1500 × 600 × 600 mm planted",
    };
  });
  const created: { id: string; stageEnteredAt: Date; clientId: string }[] = [];
  await insertChunked(rows, async (chunk) => {
    created.push(...(await d.insert(projects).values(chunk).returning({ id: projects.id, stageEnteredAt: projects.stageEnteredAt, clientId: projects.clientId })));
  });
  await insertChunked(created.map((p, i) => ({ projectId: p.id, userId: crew[i % crew.length].id })), (c) => d.insert(projectCrew).values(c));
  const events = created.flatMap((p) =>
    STAGES.slice(1).map((to, k) => ({ projectId: p.id, fromStage: STAGES[k], toStage: to, byUserId: lead.id, at: new Date(p.stageEnteredAt.getTime() - (6 - k) * 10 * DAY), reason: null })),
  );
  await insertChunked(events, (c) => d.insert(stageEvents).values(c));
  await insertChunked(created.map((p) => ({ projectId: p.id, data: { floor: "concrete slab" }, complete: true, updatedBy: lead.id })), (c) => d.insert(siteSurveys).values(c));
  await insertChunked(
    created.flatMap((p) => [
      { projectId: p.id, kind: "filled" as const, passed: true, byUserId: lead.id, at: new Date(p.stageEnteredAt.getTime() - 40 * DAY) },
      { projectId: p.id, kind: "after 24 hours" as const, passed: true, byUserId: lead.id, at: new Date(p.stageEnteredAt.getTime() - 39 * DAY) },
    ]),
    (c) => d.insert(leakChecks).values(c),
  );
  // Ten readings from the cycle and the months after: water_tests grows with the portfolio.
  const tests = created.flatMap((p) =>
    Array.from({ length: 10 }, (_, k) => ({ projectId: p.id, takenAt: new Date(p.stageEnteredAt.getTime() + (k - 5) * 7 * DAY), ammoniaMgL: 0, nitriteMgL: 0, nitrateMgL: 15, pH: 7.4, tempC: 25, takenBy: lead.id })),
  );
  await insertChunked(tests, (c) => d.insert(waterTests).values(c));
  const notes = created.flatMap((p) => Array.from({ length: 3 }, (_, k) => ({ projectId: p.id, authorId: p.clientId, body: "The fish are doing well, thank you.", createdAt: new Date(p.stageEnteredAt.getTime() + k * 30 * DAY) })));
  await insertChunked(notes, (c) => d.insert(messages).values(c));
  await d.execute(sql`analyze`);
  const [{ n }] = await d.select({ n: sql<number>`count(*)::int` }).from(projects).where(and(eq(projects.stage, "in_service")));
  return { added: created.length, inServiceNow: n, waterTests: tests.length, messages: notes.length, stageEvents: events.length };
}
