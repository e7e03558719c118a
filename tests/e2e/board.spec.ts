import { randomUUID } from "node:crypto";
import { expect, test } from "@playwright/test";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { projects, stageEvents } from "@/db/schema";
import { PASSWORD, getProject, makeProject, makeUser } from "../support/fixtures";
import { completeSurvey, recordLeakChecks } from "../integration/board-support";
import { ready, signIn } from "../pages/sign-in-page";
import { BoardPage } from "../pages/board-page";

test("the lead moves one card with the mouse and one with the keyboard, and both stay after a reload", async ({ page }) => {
  const tag = `Mover${randomUUID().slice(0, 6)}`;
  const lead = await makeUser("lead", `Lead ${tag}`);
  const client = await makeUser("client", `Client ${tag}`);
  const mouseCard = await makeProject({ client, lead, stage: "site_survey", title: `${tag} mouse tank` });
  const keyCard = await makeProject({ client, lead, stage: "fill_leak_test", title: `${tag} keyboard tank` });
  await completeSurvey(mouseCard, lead);
  await recordLeakChecks(keyCard, lead, true);

  await signIn(page, lead.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  const board = new BoardPage(page);
  await board.open(`?q=${tag}`);
  await board.expectIn(mouseCard.title, "site_survey");
  await expect(board.card(mouseCard.title).getByTestId("next-needs")).toContainText("Ready for Stand & load check");

  await board.dragWithMouse(mouseCard.title, "stand_load_check");
  await board.expectIn(mouseCard.title, "stand_load_check");
  await expect(page.getByTestId("board-status")).toContainText(`${mouseCard.title} is now in Stand & load check`);

  await board.dragWithKeyboard(keyCard.title, ["ArrowRight"], /is over Cycling/);
  await board.expectIn(keyCard.title, "cycling");
  await expect(page.getByTestId("board-status")).toContainText(`${keyCard.title} is now in Cycling`);

  await page.reload();
  await board.open(`?q=${tag}`);
  await board.expectIn(mouseCard.title, "stand_load_check");
  await board.expectIn(keyCard.title, "cycling");
  expect((await getProject(mouseCard.id)).stage).toBe("stand_load_check");
  expect((await getProject(keyCard.id)).stage).toBe("cycling");
  expect(await db().select().from(stageEvents).where(eq(stageEvents.projectId, keyCard.id))).toHaveLength(1);
});

test("a gate's refusal shows its reason on the card, and the card goes back", async ({ page }) => {
  const tag = `Refused${randomUUID().slice(0, 6)}`;
  const lead = await makeUser("lead");
  const crew = await makeUser("crew", `Crew ${tag}`);
  const client = await makeUser("client");
  const card = await makeProject({ client, lead, crew: [crew], stage: "site_survey", title: `${tag} unsurveyed tank` });

  await signIn(page, crew.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  const board = new BoardPage(page);
  await board.open(`?q=${tag}`);
  await board.dragWithMouse(card.title, "stand_load_check");
  const alert = board.card(card.title).getByRole("alert");
  await expect(alert).toContainText("The site survey isn't complete");
  await board.expectIn(card.title, "site_survey");
  expect((await getProject(card.id)).stage).toBe("site_survey");
});

test("filters live in the address and survive a reload", async ({ page }) => {
  const tag = `Filter${randomUUID().slice(0, 6)}`;
  const lead = await makeUser("lead");
  const client = await makeUser("client");
  await makeProject({ client, lead, title: `${tag} alpha` });
  await makeProject({ client, lead, title: `${tag} beta` });
  await signIn(page, lead.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  const board = new BoardPage(page);
  await board.open();
  await page.getByLabel("Search title, client or town").fill(`${tag} beta`);
  await expect(board.card(`${tag} alpha`)).toHaveCount(0);
  await expect(board.card(`${tag} beta`)).toHaveCount(1);
  await expect(page).toHaveURL(/q=/);
  await page.reload();
  await expect(page.getByLabel("Search title, client or town")).toHaveValue(`${tag} beta`);
  await expect(board.card(`${tag} alpha`)).toHaveCount(0);
});

test("the lead passes a closed gate with a reason, and the timeline shows it", async ({ page }) => {
  const tag = `Override${randomUUID().slice(0, 6)}`;
  const lead = await makeUser("lead");
  const client = await makeUser("client");
  const card = await makeProject({ client, lead, stage: "site_survey", title: `${tag} paper-survey tank` });

  await signIn(page, lead.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  const board = new BoardPage(page);
  await board.open(`?q=${tag}`);
  await board.dragWithMouse(card.title, "stand_load_check");
  const dialog = page.getByRole("dialog", { name: "Pass the gate into Stand & load check?" });
  await expect(dialog).toBeVisible();
  await expect(dialog).toContainText("The site survey isn't complete");
  await dialog.getByLabel("Reason").fill("Survey taken on paper; typing it up on Monday");
  await dialog.getByRole("button", { name: "Pass the gate and move" }).click();
  await board.expectIn(card.title, "stand_load_check");
  await expect(page.getByTestId("board-status")).toContainText(`${card.title} is now in Stand & load check`);

  await page.goto(`/projects/${card.id}`);
  const timeline = page.getByTestId("stage-timeline");
  await expect(timeline).toContainText("Gate passed by the lead");
  await expect(timeline).toContainText("Survey taken on paper; typing it up on Monday");
  await expect(page.getByTestId("next-stage-needs")).toContainText("The load check hasn't been approved by the lead.");
});

test("the lead creates a project for a new client from the board", async ({ page }) => {
  const tag = `Created${randomUUID().slice(0, 6)}`;
  const lead = await makeUser("lead");
  await signIn(page, lead.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  await ready(page);
  await page.getByRole("link", { name: "New project" }).click();
  await expect(page).toHaveURL(/\/projects\/new$/);
  await ready(page);
  await page.getByLabel("A new client (we e-mail them an invitation)").check();
  await page.getByRole("button", { name: "Create project" }).click();
  await expect(page.getByText("Enter the client's name.")).toBeVisible();
  await page.getByLabel("Client's name").fill(`Client ${tag}`);
  await page.getByLabel("Client's e-mail").fill(`${tag.toLowerCase()}@fixture.test`);
  await page.getByLabel("Project title").fill(`${tag} conservatory tank`);
  await page.getByLabel("Site address").fill("4 Invented Mews");
  await page.getByLabel("Town").fill("Fennick");
  await page.getByRole("button", { name: "Create project" }).click();
  await expect(page.getByRole("heading", { name: `${tag} conservatory tank` })).toBeVisible();
  await expect(page.getByTestId("stage-timeline")).toContainText("Project created in Site survey");
  const board = new BoardPage(page);
  await board.open(`?q=${tag}`);
  await board.expectIn(`${tag} conservatory tank`, "site_survey");
});

test("the in-service column counts the tanks it doesn't show and opens the full list", async ({ page }) => {
  const tag = `Kept${randomUUID().slice(0, 6)}`;
  const lead = await makeUser("lead", `Lead ${tag}`);
  const crew = await makeUser("crew", `Crew ${tag}`);
  const client = await makeUser("client", `Client ${tag}`);
  const recent = await makeProject({ client, lead, crew: [crew], stage: "in_service", title: `${tag} just handed over` });
  const old: { id: string; title: string }[] = [];
  for (const [title, days] of [[`${tag} serviced since spring`, 200], [`${tag} serviced for years`, 1500]] as const) {
    const p = await makeProject({ client, lead, crew: [crew], stage: "in_service", title });
    await db().update(projects).set({ stageEnteredAt: new Date(Date.now() - days * 86_400_000) }).where(eq(projects.id, p.id));
    old.push(p);
  }

  await signIn(page, crew.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  const column = page.getByTestId("column-in_service");
  await expect(column.getByTestId("in-service-count")).toHaveText("1 needing attention (handed over in the last 14 days or a service visit overdue); 2 more in service");
  await expect(column.getByRole("link", { name: recent.title })).toBeVisible();
  await expect(column.getByRole("link", { name: old[0].title })).toHaveCount(0);

  await column.getByTestId("in-service-all").click();
  await expect(page).toHaveURL(/\/board\/in-service$/);
  await expect(page.getByTestId("in-service-total")).toContainText("3 tanks in service");
  await expect(page.getByTestId("in-service-list").getByRole("link")).toHaveText([recent.title, old[0].title, old[1].title]);
  await page.getByTestId("in-service-search").fill("for years");
  await page.getByRole("button", { name: "Search" }).click();
  await expect(page.getByTestId("in-service-list").getByRole("link")).toHaveText([old[1].title]);
});
