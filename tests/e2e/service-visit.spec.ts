import { expect, test } from "@playwright/test";
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { notices, servicePlans, visitTaskTicks, visits } from "@/db/schema";
import { makeTeam, PASSWORD } from "../support/fixtures";
import { ready, signIn } from "../pages/sign-in-page";

// Traces off: several runs share test-results/, and another run clearing it fails the trace write.
test.use({ viewport: { width: 390, height: 844 }, trace: "off" });

test("crew complete a visit report on a phone through a dropped connection, and sign it off once", async ({ page, context }) => {
  const t = await makeTeam("in_service");
  const startsAt = new Date(Date.now() - 3600_000);
  const [plan] = await db()
    .insert(servicePlans)
    .values({ projectId: t.project.id, rule: "FREQ=WEEKLY;INTERVAL=2;BYDAY=TU", startsOn: startsAt.toISOString().slice(0, 10), tasks: ["Glass cleaned", "Water changed", "Filter rinsed"], usualAssigneeId: t.crew.id, createdBy: t.lead.id })
    .returning();
  const [visit] = await db()
    .insert(visits)
    .values({ projectId: t.project.id, kind: "service visit", startsAt, assignedTo: t.crew.id, servicePlanId: plan.id, occurrenceOn: startsAt.toISOString().slice(0, 10), createdBy: t.lead.id })
    .returning();

  await signIn(page, t.crew.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  await page.goto(`/projects/${t.project.id}/service/visits/${visit.id}`);
  await ready(page);

  await page.getByRole("checkbox", { name: "Glass cleaned" }).check();
  await expect(page.getByTestId("pending-ticks")).toHaveCount(0);

  // The signal drops: the tick waits on the phone.
  await context.setOffline(true);
  await page.getByRole("checkbox", { name: "Water changed" }).check();
  await expect(page.getByTestId("pending-ticks")).toContainText("Waiting to save — 1 tick");
  const queued = await page.evaluate((id) => localStorage.getItem(`tankwright:visit-ticks:${id}`), visit.id);
  expect(JSON.parse(queued!)).toHaveLength(1);

  // Back online: the browser's online event sends it, once.
  await context.setOffline(false);
  await expect(page.getByTestId("pending-ticks")).toHaveCount(0);
  const ticks = await db().select().from(visitTaskTicks).where(eq(visitTaskTicks.visitId, visit.id));
  expect(ticks.map((r) => r.taskIndex).sort()).toEqual([0, 1]);

  await page.getByLabel("Notes for the client").fill("Glass and water done; the filter next time.");
  await page.getByLabel(/Internal notes/).fill("Bring a longer hose.");
  await page.getByRole("button", { name: "Sign off and send to the client" }).click();
  await expect(page.getByTestId("visit-report")).toContainText("Glass and water done");
  await expect(page.getByText(/signed off by/)).toBeVisible();

  const [done] = await db().select().from(visits).where(eq(visits.id, visit.id));
  expect(done.completedAt).not.toBeNull();
  const mail = await db().select().from(notices).where(and(eq(notices.projectId, t.project.id), eq(notices.kind, "visit_report")));
  expect(mail).toHaveLength(1);
});
