import { expect, type Page } from "@playwright/test";

export const DEMO = {
  lead: "maren@saltmarsh-stone.test",
  crew: "teo@saltmarsh-stone.test",
  crew2: "priya@saltmarsh-stone.test",
  client: "hollis@client.test",
  otherClient: "amara@client.test",
  password: "demo-tank-2026",
};

/** Waits for React to hydrate, so clicks and keys aren't lost. */
export async function ready(page: Page) {
  await expect(page.locator("html[data-hydrated=true]")).toHaveCount(1);
}

export async function signIn(page: Page, email: string, password = DEMO.password) {
  await page.goto("/sign-in");
  await ready(page);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}
