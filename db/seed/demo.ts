import { sql } from "drizzle-orm";
import { generateNKeysBetween } from "fractional-indexing";
import { hashPassword } from "../../lib/auth/passwords";
import type { Db } from "../index";
import { company, projectCrew, projects, stageEvents, stockingBatches, users, waterTests } from "../schema";
import { STAGES, type Stage } from "../../lib/stages/stages";
import { DEMO_COMPANY, DEMO_PASSWORD, DEMO_PEOPLE } from "./demo-people";
import { DEMO_PROJECTS } from "./demo-projects";
import { cycleSeries } from "./demo-readings";
import { DEMO_FEATURE_SEEDS } from "./demo-features";

const DAY = 24 * 3600 * 1000;

/**
 * Seeds the invented demo scenario into an empty database. Returns false, touching nothing, when
 * any account already exists: real data is never overwritten.
 */
export async function seedDemo(db: Db, now = new Date()): Promise<boolean> {
  return db.transaction(async (tx) => {
    // Serialise concurrent first starts.
    await tx.execute(sql`select pg_advisory_xact_lock(727001)`);
    const [{ count }] = await tx.select({ count: sql<number>`count(*)::int` }).from(users);
    if (count > 0) return false;

    await tx.insert(company).values({ id: 1, ...DEMO_COMPANY }).onConflictDoNothing();
    const passwordHash = await hashPassword(DEMO_PASSWORD);
    const people = await tx
      .insert(users)
      .values(DEMO_PEOPLE.map((p) => ({ name: p.name, email: p.email, role: p.role, phone: p.phone, passwordHash })))
      .returning({ id: users.id, email: users.email });
    const idOf = (key: string) => people.find((p) => p.email === DEMO_PEOPLE.find((d) => d.key === key)!.email)!.id;
    const leadId = idOf("lead");

    const positions = new Map<Stage, string[]>();
    for (const stage of STAGES) {
      const n = DEMO_PROJECTS.filter((p) => p.stage === stage).length;
      positions.set(stage, generateNKeysBetween(null, null, n));
    }

    const projectIds: Record<string, string> = {};
    for (const p of DEMO_PROJECTS) {
      const stageEnteredAt = new Date(now.getTime() - p.stageDaysAgo * DAY);
      const install = new Date(now.getTime() + p.installInDays * DAY);
      const [row] = await tx
        .insert(projects)
        .values({
          title: p.title,
          clientId: idOf(p.client),
          leadId,
          siteAddress: `${p.address}, ${p.town}`,
          siteTown: p.town,
          stage: p.stage,
          position: positions.get(p.stage)!.shift()!,
          stageEnteredAt,
          targetInstallDate: install.toISOString().slice(0, 10),
          targetHandoverDate: new Date(install.getTime() + 42 * DAY).toISOString().slice(0, 10),
          tankSummary: p.tank,
          createdAt: new Date(stageEnteredAt.getTime() - 20 * DAY),
        })
        .returning({ id: projects.id });
      projectIds[p.key] = row.id;
      await tx.insert(projectCrew).values(p.crew.map((c) => ({ projectId: row.id, userId: idOf(c) })));

      // A plausible history: one event per stage passed, spaced out before the current stage.
      const reached = STAGES.indexOf(p.stage);
      const created = new Date(stageEnteredAt.getTime() - (reached + 1) * 5 * DAY);
      await tx.insert(stageEvents).values({ projectId: row.id, fromStage: null, toStage: "site_survey", byUserId: leadId, at: created, reason: "Project created" });
      for (let i = 1; i <= reached; i++) {
        const at = i === reached ? stageEnteredAt : new Date(created.getTime() + i * 5 * DAY);
        await tx.insert(stageEvents).values({ projectId: row.id, fromStage: STAGES[i - 1], toStage: STAGES[i], byUserId: i % 2 ? leadId : idOf(p.crew[0]), at });
      }

      const crewId = idOf(p.crew[0]);
      const clientId = idOf(p.client);
      if (reached >= STAGES.indexOf("cycling")) {
        const cycleStart = reached === STAGES.indexOf("cycling") ? stageEnteredAt : new Date(stageEnteredAt.getTime() - 30 * DAY);
        const days = Math.min(30, Math.floor((now.getTime() - cycleStart.getTime()) / DAY));
        const series = cycleSeries(days);
        await tx.insert(waterTests).values(
          series.map((r, i) => ({
            projectId: row.id,
            takenAt: new Date(cycleStart.getTime() + r.day * DAY + 9 * 3600 * 1000),
            ammoniaMgL: r.ammonia,
            nitriteMgL: r.nitrite,
            nitrateMgL: r.nitrate,
            pH: r.pH,
            tempC: 25,
            takenBy: i % 3 === 2 ? clientId : crewId,
          })),
        );
      }
      if (reached >= STAGES.indexOf("first_stocking")) {
        await tx.insert(stockingBatches).values({
          projectId: row.id,
          addedAt: new Date(stageEnteredAt.getTime() + DAY),
          description: "First batch: six small schooling fish after two weeks' quarantine",
          fishCount: 6,
          quarantineDays: 14,
          byUserId: crewId,
        });
      }
    }
    const peopleIds = Object.fromEntries(DEMO_PEOPLE.map((p) => [p.key, idOf(p.key)])) as Record<string, string>;
    for (const seedFeature of DEMO_FEATURE_SEEDS) await seedFeature(tx, { now, projectIds, peopleIds });
    return true;
  });
}
