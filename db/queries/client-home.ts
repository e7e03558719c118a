import "server-only";
import { desc, eq, and, isNull } from "drizzle-orm";
import { db } from "../index";
import { projects, waterTests } from "../schema";
import type { SessionUser } from "../../server/session";
import { getProjectPeople } from "./project-page";
import type { ProjectRow } from "./project-access";
import { getCycleEvaluation, getCycleInputs } from "./cycle-state";
import { nextVisits } from "./visits";
import { readyPhotos } from "./client-timeline";
import { describeCycleForClient } from "../../lib/cycling/summary";
import { whatHappensNext, testInWords } from "../../lib/portal/next-steps";

/** The latest water test in plain words and, during cycling, where the cycle stands. */
export async function waterInWords(projectId: string, stage: string, now = new Date()) {
  const [latest] = await db()
    .select({ takenAt: waterTests.takenAt, ammoniaMgL: waterTests.ammoniaMgL, nitriteMgL: waterTests.nitriteMgL, nitrateMgL: waterTests.nitrateMgL })
    .from(waterTests)
    .where(and(eq(waterTests.projectId, projectId), isNull(waterTests.voidedAt)))
    .orderBy(desc(waterTests.takenAt))
    .limit(1);
  let summary: string | null = null;
  if (stage === "cycling") {
    const [evaluation, inputs] = await Promise.all([getCycleEvaluation(projectId, now), getCycleInputs(projectId)]);
    summary = describeCycleForClient(evaluation, inputs.readings);
  }
  return { latest: latest ? { takenAt: latest.takenAt, words: testInWords(latest) } : null, summary };
}

export type ClientProjectSummary = Awaited<ReturnType<typeof summarizeForClient>>;

/** What a client needs at a glance about one project: next step, water in words, photos, people. */
export async function summarizeForClient(project: ProjectRow, now = new Date(), nextVisit?: { kind: string; startsAt: Date } | null) {
  const visit = nextVisit === undefined ? ((await nextVisits([project.id], now)).get(project.id) ?? null) : nextVisit;
  const [people, water, photos] = await Promise.all([getProjectPeople(project), waterInWords(project.id, project.stage, now), readyPhotos(project.id, 4)]);
  const next = whatHappensNext({
    stage: project.stage,
    targetInstallDate: project.targetInstallDate,
    targetHandoverDate: project.targetHandoverDate,
    nextVisit: visit,
    now,
  });
  return { project, people: { lead: people.lead, crew: people.crew }, water, photos, next };
}

/** The client's short list: one line per project (name, stage, what happens next), light enough for many tanks. */
export async function listClientProjects(user: Pick<SessionUser, "id">, now = new Date()) {
  const own = await db()
    .select({ id: projects.id, title: projects.title, stage: projects.stage, targetInstallDate: projects.targetInstallDate, targetHandoverDate: projects.targetHandoverDate })
    .from(projects)
    .where(eq(projects.clientId, user.id))
    .orderBy(desc(projects.updatedAt));
  const upcoming = await nextVisits(
    own.map((p) => p.id),
    now,
  );
  return own.map((p) => ({
    ...p,
    next: whatHappensNext({ stage: p.stage, targetInstallDate: p.targetInstallDate, targetHandoverDate: p.targetHandoverDate, nextVisit: upcoming.get(p.id) ?? null, now }),
  }));
}
