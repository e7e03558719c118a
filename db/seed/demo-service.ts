import { servicePlans, serviceTaskTemplate, visitReports, visitTaskTicks, visits, waterTests } from "../schema";
import type { FeatureSeed } from "./demo-features";
import { DEFAULT_SERVICE_TASKS } from "../../lib/service/default-tasks";
import { occurrencesBetween, ruleBody } from "../../lib/service/recurrence";
import { materialisePlan } from "../queries/service-plans";

const DAY = 24 * 3600 * 1000;

/**
 * Invented service plans for the two demo tanks in service, their coming visits, and two signed-off
 * reports on the dining-room divider. The company's zone is the seed's default (UTC).
 */
export const seedDemoService: FeatureSeed = async (tx, { now, projectIds: p, peopleIds: u }) => {
  await tx.insert(serviceTaskTemplate).values(DEFAULT_SERVICE_TASKS.map((label, position) => ({ label, position })));
  const startsOn = new Date(now.getTime() - 50 * DAY).toISOString().slice(0, 10);
  const [dining] = await tx
    .insert(servicePlans)
    .values({
      projectId: p["marchetti-dining"],
      rule: ruleBody({ kind: "weekly", everyWeeks: 2, weekday: "TU" }),
      startsOn,
      startTime: "09:30",
      waterChangePercent: 20,
      tasks: [...DEFAULT_SERVICE_TASKS],
      usualAssigneeId: u.crew1,
      createdBy: u.lead,
    })
    .returning();
  const [surgery] = await tx
    .insert(servicePlans)
    .values({
      projectId: p["ashdown-surgery"],
      rule: ruleBody({ kind: "monthly", dayOfMonth: 31 }),
      startsOn,
      startTime: "14:00",
      durationMinutes: 120,
      waterChangePercent: 25,
      tasks: DEFAULT_SERVICE_TASKS.slice(0, 5),
      usualAssigneeId: u.crew2,
      createdBy: u.lead,
    })
    .returning();

  // The last two fortnightly visits on the divider, done and signed off.
  const past = occurrencesBetween({ rule: dining.rule, startsOn, startTime: dining.startTime, timeZone: "UTC" }, new Date(now.getTime() - 30 * DAY), new Date(now.getTime() - DAY)).slice(-2);
  const notes = [
    { client: "Water clear, fish eating well. Trimmed the tall stems at the back.", livestock: "All twelve tetras and both loaches seen and active.", internal: "Hose connector at the tap is worn; bring a spare next time.", nitrate: 15 },
    { client: "Small patch of algae on the left glass, cleaned off. Light timer left as it was.", livestock: "Everyone accounted for; one loach hiding behind the wood as usual.", internal: "Client asked about adding more fish; lead to call.", nitrate: 20 },
  ];
  for (const [i, o] of past.entries()) {
    const done = new Date(o.startsAt.getTime() + 80 * 60 * 1000);
    const [visit] = await tx
      .insert(visits)
      .values({ projectId: dining.projectId, kind: "service visit", startsAt: o.startsAt, durationMinutes: 90, assignedTo: u.crew1, servicePlanId: dining.id, occurrenceOn: o.occurrenceOn, completedAt: done, createdBy: u.lead, createdAt: new Date(o.startsAt.getTime() - 20 * DAY) })
      .returning();
    const [test] = await tx
      .insert(waterTests)
      .values({ projectId: dining.projectId, takenAt: new Date(o.startsAt.getTime() + 30 * 60 * 1000), ammoniaMgL: 0, nitriteMgL: 0, nitrateMgL: notes[i].nitrate, pH: 7.2, tempC: 25, takenBy: u.crew1 })
      .returning();
    await tx.insert(visitReports).values({
      visitId: visit.id,
      projectId: dining.projectId,
      tasks: [...DEFAULT_SERVICE_TASKS],
      waterChangeL: 90,
      waterTestId: test.id,
      livestockNote: notes[i].livestock,
      clientNotes: notes[i].client,
      internalNotes: notes[i].internal,
      signedOffBy: u.crew1,
      clientNotifiedAt: done,
      createdAt: o.startsAt,
      updatedAt: done,
    });
    await tx.insert(visitTaskTicks).values(
      DEFAULT_SERVICE_TASKS.map((_, taskIndex) => ({ visitId: visit.id, taskIndex, done: true, clientKey: `demo-${visit.id}-${taskIndex}`, byUserId: u.crew1, at: new Date(o.startsAt.getTime() + (taskIndex + 1) * 8 * 60 * 1000) })),
    );
  }
  await materialisePlan(tx, dining, "UTC", now);
  await materialisePlan(tx, surgery, "UTC", now);
};
