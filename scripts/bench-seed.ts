/**
 * Seeds the benchmark database with 500 invented active projects (those in service handed over in
 * the last two weeks), their clients and crew, stage
 * events, some surveys, checklist ticks, leak checks and water tests. Run only against a fresh database.
 */
import { hashPassword } from "../lib/auth/passwords";
import { generateNKeysBetween } from "fractional-indexing";
import { closeDb, db } from "../db";
import { checklistItems, checklistTicks, company, leakChecks, projectCrew, projects, siteSurveys, stageEvents, users, waterTests } from "../db/schema";
import { STAGES, type Stage } from "../lib/stages/stages";

export const BENCH_LEAD = { email: "bench-lead@bench.test", password: "bench-password-1" };
const PROJECTS = 500;
const DAY = 86_400_000;
const now = Date.now();

// Seeded PRNG (mulberry32) so every run benchmarks the same invented data.
let seed = 20261202;
const random = () => {
  seed = (seed + 0x6d2b79f5) >>> 0;
  let t = seed;
  t = Math.imul(t ^ (t >>> 15), t | 1);
  t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
  return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
};
const pick = <T>(list: readonly T[]) => list[Math.floor(random() * list.length)];
const TOWNS = ["Quillhaven", "Larkwhistle", "Tessling Bay", "Orrowfen", "Brackenfold Cross", "Fennick", "Dunnaby Vale", "Wickerly Fen"];
const ROOMS = ["lounge", "hallway", "office", "kitchen", "reception", "study", "dining-room", "waiting-room"];
const KINDS = ["reef", "planted", "cichlid", "community", "shrimp", "paludarium"];
const FIRST = ["Ada", "Bram", "Cleo", "Dov", "Esme", "Finn", "Gala", "Hugo", "Ines", "Jory", "Kit", "Lune"];
const LAST = ["Arden", "Bexley", "Corrow", "Dunmore", "Elsby", "Farrow", "Gresham", "Holt", "Inchley", "Jessop"];

const hash = await hashPassword(BENCH_LEAD.password);
const d = db();
await d.insert(company).values({ id: 1, name: "Invented Bench Aquaria", email: "office@bench.test" }).onConflictDoNothing();
const [lead] = await d.insert(users).values({ name: "Bench Lead", email: BENCH_LEAD.email, role: "lead", passwordHash: hash }).returning();
const crew = await d
  .insert(users)
  .values(Array.from({ length: 12 }, (_, i) => ({ name: `${pick(FIRST)} ${pick(LAST)} ${i}`, email: `crew-${i}@bench.test`, role: "crew" as const, passwordHash: hash })))
  .returning();
const clients = await d
  .insert(users)
  .values(Array.from({ length: 200 }, (_, i) => ({ name: `${pick(FIRST)} ${pick(LAST)}`, email: `client-${i}@bench.test`, role: "client" as const })))
  .returning();

const stageOf = (i: number): Stage => STAGES[i % STAGES.length];
const keys = new Map<Stage, string[]>(STAGES.map((s) => [s, generateNKeysBetween(null, null, Math.ceil(PROJECTS / STAGES.length))]));
const rows = Array.from({ length: PROJECTS }, (_, i) => {
  const stage = stageOf(i);
  const town = pick(TOWNS);
  const client = pick(clients);
  return {
    title: `${client.name.split(" ")[1]} ${pick(ROOMS)} ${pick(KINDS)} ${i}`,
    clientId: client.id,
    leadId: lead.id,
    siteAddress: `${1 + Math.floor(random() * 90)} Invented Road, ${town}`,
    siteTown: town,
    stage,
    position: keys.get(stage)!.shift()!,
    // Tanks in service among the active work were handed over recently (the board shows those).
    stageEnteredAt: new Date(now - Math.floor(random() * (stage === "in_service" ? 13 : 30)) * DAY),
    targetInstallDate: new Date(now + Math.floor(random() * 120 - 40) * DAY).toISOString().slice(0, 10),
    tankSummary: `${pick([900, 1200, 1500, 1800])} × 500 × 600 mm ${pick(KINDS)}`,
  };
});
const created = await d.insert(projects).values(rows).returning({ id: projects.id, stage: projects.stage, stageEnteredAt: projects.stageEnteredAt });

await d.insert(projectCrew).values(
  created.flatMap((p, i) => {
    const a = crew[i % crew.length];
    const b = crew[(i * 7 + 3) % crew.length];
    return a.id === b.id || i % 3 ? [{ projectId: p.id, userId: a.id }] : [{ projectId: p.id, userId: a.id }, { projectId: p.id, userId: b.id }];
  }),
);

const events = created.flatMap((p) => {
  const reached = STAGES.indexOf(p.stage);
  const start = p.stageEnteredAt.getTime() - (reached + 1) * 5 * DAY;
  return [
    { projectId: p.id, fromStage: null, toStage: "site_survey" as Stage, byUserId: lead.id, at: new Date(start), reason: "Project created" },
    ...Array.from({ length: reached }, (_, k) => ({
      projectId: p.id,
      fromStage: STAGES[k],
      toStage: STAGES[k + 1],
      byUserId: lead.id,
      at: k + 1 === reached ? p.stageEnteredAt : new Date(start + (k + 1) * 5 * DAY),
      reason: null,
    })),
  ];
});
for (let i = 0; i < events.length; i += 1000) await d.insert(stageEvents).values(events.slice(i, i + 1000));

await d.insert(siteSurveys).values(created.filter((_, i) => i % 2 === 0).map((p) => ({ projectId: p.id, data: { floor: "suspended timber" }, complete: STAGES.indexOf(p.stage) > 0 || random() > 0.5, updatedBy: lead.id })));

const items = await d
  .insert(checklistItems)
  .values(["Stand levelled", "Base layer spread", "Rockwork bedded", "Hardscape photographed", "Plants placed", "Pipework dry-fitted"].map((label, i) => ({ stage: "aquascape" as Stage, label, position: `a${i}` })))
  .returning();
const aquascape = created.filter((p) => p.stage === "aquascape");
await d.insert(checklistTicks).values(aquascape.flatMap((p, j) => items.slice(0, j % (items.length + 1)).map((it) => ({ projectId: p.id, itemId: it.id, done: true, byUserId: lead.id }))));

const filling = created.filter((p) => STAGES.indexOf(p.stage) >= STAGES.indexOf("fill_leak_test"));
await d.insert(leakChecks).values(filling.flatMap((p, j) => (j % 4 === 0 ? [] : [
  { projectId: p.id, kind: "filled" as const, passed: true, byUserId: lead.id, at: new Date(p.stageEnteredAt.getTime() - 2 * DAY) },
  { projectId: p.id, kind: "after 24 hours" as const, passed: j % 5 !== 0, byUserId: lead.id, at: new Date(p.stageEnteredAt.getTime() - DAY) },
])));

// Cycling tanks get a reading every two days since they entered cycling: ammonia, then nitrite, then zeros.
const cycling = created.filter((p) => p.stage === "cycling" || p.stage === "first_stocking");
const tests = cycling.flatMap((p) => {
  const days = Math.max(1, Math.round((now - p.stageEnteredAt.getTime()) / DAY));
  return Array.from({ length: Math.ceil(days / 2) }, (_, k) => {
    const day = k * 2;
    return {
      projectId: p.id,
      takenAt: new Date(p.stageEnteredAt.getTime() + day * DAY + 3600_000),
      ammoniaMgL: day < 10 ? 2 - day * 0.2 : 0,
      nitriteMgL: day < 5 ? 0.5 : day < 20 ? 1 : 0,
      nitrateMgL: day < 8 ? 0 : 10 + day,
      pH: 7.4,
      tempC: 25,
      takenBy: lead.id,
    };
  });
});
for (let i = 0; i < tests.length; i += 1000) await d.insert(waterTests).values(tests.slice(i, i + 1000));

await closeDb();
console.log(`bench seed: ${created.length} projects, ${clients.length} clients, ${crew.length} crew, ${events.length} stage events, ${tests.length} water tests`);
