import { expect, test, type Page } from "@playwright/test";
import { format } from "date-fns";
import { eq } from "drizzle-orm";
import { db, closeDb } from "@/db";
import { stageEvents, waterTests } from "@/db/schema";
import { makeTeam, PASSWORD } from "../support/fixtures";
import { ready, signIn } from "../pages/sign-in-page";

const HOUR = 3_600_000;

test.afterAll(async () => {
  await closeDb();
});

/** A project four days into cycling: ammonia has fallen and nitrite peaked, but nothing reads zero yet. */
async function cyclingProject() {
  const t = await makeTeam("cycling");
  const now = Date.now();
  await db().insert(stageEvents).values({ projectId: t.project.id, fromStage: "fill_leak_test", toStage: "cycling", byUserId: t.lead.id, at: new Date(now - 96 * HOUR) });
  await db()
    .insert(waterTests)
    .values([
      { projectId: t.project.id, takenAt: new Date(now - 84 * HOUR), ammoniaMgL: 2, nitriteMgL: 0, nitrateMgL: 0, pH: 7.8, tempC: 25, takenBy: t.crew.id },
      { projectId: t.project.id, takenAt: new Date(now - 60 * HOUR), ammoniaMgL: 0.5, nitriteMgL: 1, nitrateMgL: 10, pH: 7.7, tempC: 25, takenBy: t.crew.id },
    ]);
  return t;
}

async function logTest(page: Page, opts: { takenAt?: Date; nitrite: string; nitrate: string }) {
  const form = page.getByRole("form", { name: "Log a water test" });
  if (opts.takenAt) await form.getByLabel("Taken at").fill(format(opts.takenAt, "yyyy-MM-dd'T'HH:mm"));
  // One value from the kit's quick picks, the others typed.
  await form.getByRole("button", { name: "Ammonia below detection (0 mg/L)" }).click();
  await expect(form.getByLabel("Ammonia (mg/L)", { exact: true })).toHaveValue("0");
  await form.getByLabel("Nitrite (mg/L)", { exact: true }).fill(opts.nitrite);
  await form.getByLabel("Nitrate (mg/L)", { exact: true }).fill(opts.nitrate);
  await form.getByLabel("pH", { exact: true }).fill("7.6");
  await form.getByLabel("Temperature (°C)").fill("25");
  await form.getByRole("button", { name: "Save water test" }).click();
}

test("crew log zero readings a day apart and see the cycle gate open", async ({ page }) => {
  // A long journey on a shared two-core machine; the limit is generous, nothing here is timed.
  test.setTimeout(120_000);
  const t = await cyclingProject();
  await signIn(page, t.crew.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  await page.goto(`/projects/${t.project.id}/water`);
  await ready(page);

  await expect(page.getByTestId("gate-reasons")).toContainText("Ammonia and nitrite must both read zero");
  await expect(page.getByTestId("cycle-summary")).toContainText("Day 4 since the cycle began");
  await expect(page.getByTestId("reading-row")).toHaveCount(2);
  await expect(page.getByRole("img", { name: /Chart of ammonia, nitrite and nitrate/ })).toBeVisible();

  // A typo is refused field by field and nothing is lost from the form.
  const form = page.getByRole("form", { name: "Log a water test" });
  await form.getByLabel("pH", { exact: true }).fill("15");
  await form.getByLabel("Nitrite (mg/L)", { exact: true }).fill("0");
  await form.getByRole("button", { name: "Save water test" }).click();
  await expect(form.getByText("pH must be a number between 0 and 14.")).toBeVisible();
  await expect(page.getByTestId("reading-row")).toHaveCount(2);

  await logTest(page, { takenAt: new Date(Date.now() - 30 * HOUR), nitrite: "0", nitrate: "20" });
  await expect(form.getByRole("status")).toHaveText("Saved.");
  await expect(page.getByTestId("reading-row")).toHaveCount(3);
  await expect(page.getByTestId("gate-reasons")).toContainText("there is only one so far");

  await logTest(page, { nitrite: "0", nitrate: "20" });
  await expect(form.getByRole("status")).toContainText("opened the cycle gate");
  await expect(page.getByTestId("reading-row")).toHaveCount(4);
  await expect(page.getByTestId("cycle-phase")).toContainText("cycled");
  await expect(page.getByTestId("gate-ready")).toContainText("Ready for fish");
});

test("the lead corrects a mistyped reading; the old one stays on record, voided with the reason", async ({ page }) => {
  test.setTimeout(120_000);
  const t = await cyclingProject();
  await signIn(page, t.lead.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  await page.goto(`/projects/${t.project.id}/water`);
  await ready(page);

  const newest = page.getByTestId("reading-row").first();
  await newest.getByRole("button", { name: "Correct" }).click();
  const fix = page.getByRole("form", { name: "Correct a water test" });
  await expect(fix.getByLabel("Nitrite (mg/L)", { exact: true })).toHaveValue("1");
  await fix.getByLabel("Nitrite (mg/L)", { exact: true }).fill("2");
  await fix.getByLabel("Why the old reading was wrong").fill("Read the nitrite card in poor light");
  await fix.getByRole("button", { name: "Save correction" }).click();

  await expect(page.getByTestId("reading-row")).toHaveCount(3);
  const voided = page.locator('[data-testid="reading-row"][data-voided="true"]');
  await expect(voided).toHaveCount(1);
  await expect(voided).toContainText("Read the nitrite card in poor light");
  await expect(page.getByTestId("reading-row").first()).toContainText("Correction");
});

test("the lead restarts a cycle on purpose, with a reason the timeline shows", async ({ page }) => {
  test.setTimeout(90_000);
  const t = await cyclingProject();
  await signIn(page, t.lead.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  await page.goto(`/projects/${t.project.id}/water`);
  await ready(page);
  await page.getByRole("button", { name: "Restart the cycle…" }).click();
  await page.getByRole("button", { name: "Restart the cycle", exact: true }).click();
  await expect(page.getByRole("alert").filter({ hasText: /why/i })).toBeVisible();
  await page.getByLabel("Why start the cycle again?").fill("Filter media washed in tap water");
  await page.getByRole("button", { name: "Restart the cycle", exact: true }).click();
  await expect(page.getByRole("button", { name: "Restart the cycle…" })).toBeVisible();

  const events = await db().select().from(stageEvents).where(eq(stageEvents.projectId, t.project.id));
  const restart = events.find((e) => e.cycleRestarted);
  expect(restart?.reason).toBe("Filter media washed in tap water");
  expect(restart?.byUserId).toBe(t.lead.id);
  await page.goto(`/projects/${t.project.id}`);
  await expect(page.getByText("Filter media washed in tap water")).toBeVisible();
});
