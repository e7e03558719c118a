import { randomUUID } from "node:crypto";
import { expect, test } from "@playwright/test";
import { db } from "@/db";
import { equipment, visits } from "@/db/schema";
import { PASSWORD, makeProject, makeUser } from "../support/fixtures";
import { ready, signIn } from "../pages/sign-in-page";

// A common phone's screen in CSS pixels (common practice for phone layouts).
test.use({ viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true });

test("on a phone, crew open the due list from the menu and see their week: their visit and their tank's overdue filter", async ({ page }) => {
  const tag = `Due${randomUUID().slice(0, 6)}`;
  const [lead, crew, client] = await Promise.all([makeUser("lead"), makeUser("crew", `Crew ${tag}`), makeUser("client")]);
  const tank = await makeProject({ client, lead, crew: [crew], stage: "in_service", title: `${tag} hall tank` });
  await db().insert(visits).values({ projectId: tank.id, kind: "service visit", startsAt: new Date(Date.now() - 60_000), assignedTo: crew.id, createdBy: lead.id });
  await db().insert(equipment).values({ projectId: tank.id, kind: "canister filter", makeModel: `Canister ${tag} (house brand)`, installedOn: "2025-01-06", createdBy: lead.id });

  await signIn(page, crew.email, PASSWORD);
  await ready(page);
  await page.getByRole("button", { name: "Menu" }).click();
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Due" }).click();
  await expect(page).toHaveURL(/\/due$/);
  await expect(page.getByRole("link", { name: "My week" })).toHaveAttribute("aria-current", "page");
  const items = page.getByTestId("due-item");
  await expect(items).toHaveCount(2);
  await expect(page.getByRole("heading", { name: /Overdue/ })).toBeVisible();
  await expect(items.filter({ hasText: `Canister ${tag}` })).toContainText("overdue by");
  await expect(items.filter({ hasText: "service visit" })).toContainText(tank.title);
  // Nothing scrolls sideways on a phone.
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);

  await items.filter({ hasText: `Canister ${tag}` }).click();
  await expect(page).toHaveURL(new RegExp(`/projects/${tank.id}/equipment#piece-`));
  await expect(page.getByTestId("equipment-piece")).toContainText(`Canister ${tag} (house brand)`);
});
