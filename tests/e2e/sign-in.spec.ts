import { expect, test } from "@playwright/test";
import { DEMO, ready, signIn } from "../pages/sign-in-page";
import { PASSWORD, makeUser } from "../support/fixtures";

test("the lead lands on the board", async ({ page }) => {
  await signIn(page, DEMO.lead);
  await expect(page).toHaveURL(/\/board$/);
  await expect(page.getByTestId("signed-in-as")).toContainText("Project lead");
  await expect(page.getByRole("link", { name: "People" })).toBeVisible();
});

test("crew land on the board, without lead pages in the navigation", async ({ page }) => {
  await signIn(page, DEMO.crew);
  await expect(page).toHaveURL(/\/board$/);
  await expect(page.getByTestId("signed-in-as")).toContainText("Crew");
  await expect(page.getByRole("link", { name: "People" })).toHaveCount(0);
});

test("a client lands on their projects", async ({ page }) => {
  await signIn(page, DEMO.client);
  await expect(page).toHaveURL(/\/portal$/);
  await expect(page.getByRole("heading", { name: "Your aquarium projects" })).toBeVisible();
  await expect(page.getByText("Brandt lounge reef").first()).toBeVisible();
});

test("a wrong password says so plainly", async ({ page }) => {
  await signIn(page, DEMO.lead, "not-the-password");
  await expect(page.getByRole("alert").filter({ hasText: "don't match an account" })).toBeVisible();
  await expect(page).toHaveURL(/\/sign-in/);
});

test("a client opening another client's project is refused", async ({ page }) => {
  await signIn(page, DEMO.otherClient);
  await expect(page).toHaveURL(/\/portal$/);
  const own = await page.getByRole("link", { name: "Quist study nano-planted" }).getAttribute("href");
  expect(own).toBeTruthy();

  // Find one of Hollis's projects as the lead, then try it as Amara.
  const lead = await page.context().browser()!.newContext();
  const leadPage = await lead.newPage();
  await signIn(leadPage, DEMO.lead);
  await expect(leadPage).toHaveURL(/\/board$/);
  const other = await leadPage.getByRole("link", { name: "Brandt lounge reef" }).getAttribute("href");
  await lead.close();

  const res = await page.goto(other!);
  expect(res?.status()).toBe(404);
  await expect(page.getByRole("heading", { name: "Nothing here, or not for you" })).toBeVisible();
  await expect(page.getByText("Brandt lounge reef")).toHaveCount(0);
  await ready(page);
});

test("signing out ends the session and returns to the sign-in page", async ({ page }) => {
  const crew = await makeUser("crew");
  await signIn(page, crew.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  await ready(page);
  await page.getByRole("button", { name: "Sign out" }).first().click();
  await expect(page).toHaveURL(/\/sign-in/);
  await page.goto("/board");
  await expect(page).toHaveURL(/\/sign-in/);
});
