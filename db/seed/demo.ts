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

/** Typical days a demo project spent in each stage before moving on (survey, load check, aquascape, fill, cycling, stocking). */
const DEMO_DAYS_IN_STAGE = [7, 10, 5, 2, 30, 30];

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
      // Accounts predate every demo project (the oldest goes back about 250 days).
      .values(DEMO_PEOPLE.map((p) => ({ name: p.name, email: p.email, role: p.role, phone: p.phone, passwordHash, createdAt: new Date(now.getTime() - 365 * DAY) })))
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
      // The timeline, worked back from when the card entered its stage: one event per stage passed,
      // each stage taking a typical time, so created dates, events and readings agree.
      const reached = STAGES.indexOf(p.stage);
      const eventAt: Date[] = [];
      eventAt[reached] = stageEnteredAt;
      for (let i = reached - 1; i >= 0; i--) eventAt[i] = new Date(eventAt[i + 1].getTime() - DEMO_DAYS_IN_STAGE[i] * DAY);
      const cyclingIndex = STAGES.indexOf("cycling");
      const cycleStart = reached >= cyclingIndex ? eventAt[cyclingIndex] : null;
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
          cycleStartedAt: cycleStart,
          targetInstallDate: install.toISOString().slice(0, 10),
          targetHandoverDate: new Date(install.getTime() + 42 * DAY).toISOString().slice(0, 10),
          tankSummary: p.tank,
          createdAt: eventAt[0],
          updatedAt: stageEnteredAt,
        })
        .returning({ id: projects.id });
      projectIds[p.key] = row.id;
      await tx.insert(projectCrew).values(p.crew.map((c) => ({ projectId: row.id, userId: idOf(c) })));

      await tx.insert(stageEvents).values({ projectId: row.id, fromStage: null, toStage: "site_survey", byUserId: leadId, at: eventAt[0], reason: "Project created" });
      for (let i = 1; i <= reached; i++) {
        await tx.insert(stageEvents).values({ projectId: row.id, fromStage: STAGES[i - 1], toStage: STAGES[i], byUserId: i % 2 ? leadId : idOf(p.crew[0]), at: eventAt[i] });
      }

      const crewId = idOf(p.crew[0]);
      const clientId = idOf(p.client);
      if (cycleStart) {
        const cycleEnd = reached > cyclingIndex ? eventAt[cyclingIndex + 1] : now;
        const days = Math.min(30, Math.floor((cycleEnd.getTime() - cycleStart.getTime()) / DAY));
        // Tests at 09:00 on their day; never one later than an hour ago, so nothing is dated in the future.
        const series = cycleSeries(days)
          .map((r) => ({ r, takenAt: new Date(cycleStart.getTime() + r.day * DAY + 9 * 3600 * 1000) }))
          .filter(({ takenAt }) => takenAt.getTime() <= Math.min(cycleEnd.getTime(), now.getTime() - 3600 * 1000));
        await tx.insert(waterTests).values(
          series.map(({ r, takenAt }, i) => ({
            projectId: row.id,
            takenAt,
            ammoniaMgL: r.ammonia,
            nitriteMgL: r.nitrite,
            nitrateMgL: r.nitrate,
            pH: r.pH,
            tempC: 25,
            takenBy: i % 3 === 2 ? clientId : crewId,
            createdAt: takenAt,
          })),
        );
      }
      // A tank in first stocking still has its first batch in quarantine (see demo-livestock.ts).
      if (reached >= STAGES.indexOf("in_service")) {
        await tx.insert(stockingBatches).values({
          projectId: row.id,
          // A day after first stocking began (and before in service, whose gate asks for it).
          addedAt: new Date(eventAt[STAGES.indexOf("first_stocking")].getTime() + DAY),
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
