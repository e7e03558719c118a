import { expect, test } from "@playwright/test";
import { db, closeDb } from "@/db";
import { stageEvents, waterTests } from "@/db/schema";
import { makeTeam, PASSWORD } from "../support/fixtures";
import { ready, signIn } from "../pages/sign-in-page";

test.afterAll(async () => {
  await closeDb();
});

/** A client's project in cycling with four days of readings: ammonia falling while nitrite rises. */
async function cyclingTeam() {
  const t = await makeTeam("cycling");
  const now = Date.now();
  await db().insert(stageEvents).values({ projectId: t.project.id, fromStage: "fill_leak_test", toStage: "cycling", byUserId: t.lead.id, at: new Date(now - 8 * 86_400_000) });
  const series = [
    [2, 0],
    [1.5, 0.25],
    [1, 0.5],
    [0.5, 1],
  ];
  await db()
    .insert(waterTests)
    .values(series.map(([a, n], i) => ({ projectId: t.project.id, takenAt: new Date(now - (4 - i) * 86_400_000), ammoniaMgL: a, nitriteMgL: n, nitrateMgL: 5, pH: 7.8, tempC: 25, takenBy: t.crew.id })));
  return t;
}

test("a client follows their cycling tank and writes to the lead, who sees it on the project", async ({ page, browser }) => {
  const t = await cyclingTeam();
  await signIn(page, t.client.email, PASSWORD);
  await expect(page).toHaveURL(/\/portal$/);
  await ready(page);

  // The portal lists each project on one line; the project's own page carries the detail.
  const line = page.getByRole("article", { name: t.project.title });
  await expect(line).toContainText("Cycling");
  await expect(line).toContainText("Next: ");
  await line.getByRole("link", { name: t.project.title }).click();
  await expect(page).toHaveURL(new RegExp(`/projects/${t.project.id}$`));
  await ready(page);
  const card = page.getByRole("main");
  await expect(card.getByRole("list", { name: "Progress: Cycling, stage 5 of 7" })).toBeVisible();
  await expect(card.getByTestId("water-words")).toContainText("Ammonia is falling, nitrite is rising: the bacteria are establishing.");
  await expect(card.getByTestId("water-words")).toContainText("ammonia 0.5 mg/L, nitrite 1 mg/L, nitrate 5 mg/L");
  await expect(card.getByText(t.lead.email)).toBeVisible();

  await card.getByRole("link", { name: "Send a message" }).click();
  await expect(page).toHaveURL(new RegExp(`/projects/${t.project.id}/talk`));
  await ready(page);
  const text = "The pump hums louder since this morning. Should I worry?";
  await page.getByRole("button", { name: "Send message" }).click();
  await expect(page.getByText("Write a message first.")).toBeVisible();
  await page.getByRole("textbox", { name: "Message" }).fill(text);
  await page.getByRole("button", { name: "Send message" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Sent." })).toBeVisible();
  await expect(page.getByTestId("message-list")).toContainText(text);

  const leadContext = await browser.newContext();
  const lead = await leadContext.newPage();
  await signIn(lead, t.lead.email, PASSWORD);
  await expect(lead).toHaveURL(/\/board$/);
  await lead.goto(`/projects/${t.project.id}/talk`);
  await ready(lead);
  const item = lead.getByTestId("message-list").getByRole("listitem").filter({ hasText: text });
  await expect(item).toContainText(t.client.name);
  await expect(item).toContainText("Client");
  await leadContext.close();
});
