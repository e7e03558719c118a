import { expect, test } from "@playwright/test";
import { closeDb } from "@/db";
import { makeTeam, PASSWORD } from "../support/fixtures";
import { ready, signIn } from "../pages/sign-in-page";
import { cycled, giveDesign, makeHoldingTank } from "../integration/livestock-support";

test.afterAll(async () => {
  await closeDb();
});

test("the lead plans two batches, quarantines one, adds it to the display and moves a fish to a holding tank", async ({ page }) => {
  // A long journey on a shared two-core machine; the limit is generous, nothing here is timed.
  test.setTimeout(150_000);
  const t = await makeTeam("first_stocking");
  await giveDesign(t.project, t.lead);
  await cycled(t.project, t.crew);
  const holding = await makeHoldingTank();
  await signIn(page, t.lead.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  await page.goto(`/projects/${t.project.id}/fish`);
  await ready(page);
  await expect(page.getByText("Rules of thumb", { exact: true })).toBeVisible();

  const planForm = page.getByRole("form", { name: "Plan a batch" });
  await planForm.getByLabel("Species 1", { exact: true }).selectOption({ label: "Harlequin rasbora (Trigonostigma heteromorpha) · fresh" });
  await planForm.getByLabel("How many (species 1)").fill("8");
  await planForm.getByRole("button", { name: "Add batch to the plan" }).click();
  await expect(page.getByTestId("batch-1")).toContainText("Harlequin rasbora");

  await planForm.getByLabel("Species 1", { exact: true }).selectOption({ label: "Bronze corydoras (Corydoras aeneus) · fresh" });
  await planForm.getByLabel("How many (species 1)").fill("4");
  await planForm.getByRole("button", { name: "Add batch to the plan" }).click();
  const second = page.getByTestId("batch-2");
  await expect(second).toContainText("Bronze corydoras");
  // Four corydoras is below their group: the check says so beside the plan.
  await expect(page.getByTestId("plan-warnings")).toContainText("Bronze corydoras is kept in groups of 6 or more; the plan has 4.");

  const first = page.getByTestId("batch-1");
  await first.getByLabel("Holding tank").selectOption({ label: `${holding.name} (150 L, Workshop)` });
  await first.getByRole("button", { name: "Start quarantine" }).click();
  await expect(first.getByTestId("batch-status")).toHaveText("In quarantine");
  await expect(first.getByTestId("days-left")).toContainText("28 days left");

  await first.getByLabel("What was seen or given").fill("All eight feeding, fins clear");
  await first.getByRole("button", { name: "Add note" }).click();
  await expect(first.getByRole("list", { name: "Quarantine log" })).toContainText("All eight feeding, fins clear");

  await first.getByLabel(/Release early: your reason/).fill("Same supplier batch already clean for three weeks in our rack");
  await first.getByRole("button", { name: "Release early" }).click();
  await expect(first).toContainText("Released early by the lead");

  await first.getByRole("button", { name: "Add to the display" }).click();
  await expect(first.getByTestId("batch-status")).toHaveText("In the display");
  const row = page.getByTestId("census-Harlequin rasbora");
  await expect(row.getByTestId("in-display")).toHaveText("8");

  const event = page.getByRole("form", { name: "Record what happened" });
  await event.getByLabel("What happened").selectOption("to_holding");
  await event.getByLabel("How many fish").fill("1");
  await event.getByLabel("Holding tank").selectOption({ label: `${holding.name} (150 L, Workshop)` });
  await event.getByLabel(/Note/).fill("Chased by the others; resting");
  await event.getByRole("button", { name: "Record" }).click();
  await expect(row.getByTestId("in-display")).toHaveText("7");
  await expect(row.getByTestId("in-holding")).toHaveText("1");
  await expect(page.getByTestId("livestock-history")).toContainText(`1 moved to ${holding.name}`);
  await expect(second.getByTestId("batch-status")).toHaveText("Planned");
});
