import { expect, test } from "@playwright/test";
import { eq } from "drizzle-orm";
import { closeDb, db } from "@/db";
import { projects } from "@/db/schema";
import { ready, signIn } from "../pages/sign-in-page";

test.afterAll(async () => {
  await closeDb();
});

test("the owning client opens trends and water changes for their tank in service and sees where nitrate settles", async ({ page }) => {
  const [project] = await db().select({ id: projects.id }).from(projects).where(eq(projects.title, "Ashdown surgery corridor"));
  await signIn(page, "rafe@client.test");
  await expect(page).not.toHaveURL(/sign-in/);
  await page.goto(`/projects/${project.id}/water`);
  await ready(page);
  await page.getByRole("link", { name: "Trends & water changes" }).click();
  await expect(page.getByRole("heading", { name: "Nitrate, pH and temperature over time" })).toBeVisible();
  await expect(page.getByText("Temperature (°C)")).toBeVisible();
  await ready(page);

  // The demo tank's weekly tests before and after each change give a measured rise.
  const rise = page.getByLabel("Nitrate rise (mg/L a day)");
  await expect(rise).not.toHaveValue("");
  await expect(page.getByText(/^Measured: the median rise between \d+ pairs of tests/)).toBeVisible();

  // 1 mg/L a day, 25 % every 7 days, nitrate-free tap: R·T/f = 28 before, R·T·(1 − f)/f = 21 after
  // (the steady state of repeated dilution, derived in lib/service/water-change.ts).
  await rise.fill("1");
  await page.getByLabel("Tap water nitrate (mg/L)").fill("0");
  const result = page.getByTestId("planner-result");
  await expect(result).toContainText("Settles at about 28 mg/L just before each change and 21 mg/L just after it.");
  // Limit 40 (common practice): T = 0.25 × 40 / 1 = 10 days; f = 7 / 40 = 17.5 %, so 18 %.
  await expect(result).toContainText("stay under the limit by changing at least every 10 days");
  await expect(result).toContainText("change at least 18 %");
});
