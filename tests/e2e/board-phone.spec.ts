import { randomUUID } from "node:crypto";
import { expect, test } from "@playwright/test";
import { PASSWORD, getProject, makeProject, makeUser } from "../support/fixtures";
import { completeSurvey, recordLeakChecks } from "../integration/board-support";
import { signIn } from "../pages/sign-in-page";
import { BoardPage } from "../pages/board-page";

// A common phone's screen in CSS pixels (common practice for phone layouts).
test.use({ viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true });

test("on a phone the board shows one stage at a time, and a card dragged by touch onto a stage's tank stays there after a reload", async ({ page }) => {
  const tag = `Thumb${randomUUID().slice(0, 6)}`;
  const lead = await makeUser("lead", `Lead ${tag}`);
  const client = await makeUser("client");
  const card = await makeProject({ client, lead, stage: "fill_leak_test", title: `${tag} basement tank` });
  await recordLeakChecks(card, lead, true);

  await signIn(page, lead.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  const board = new BoardPage(page);
  await board.open(`?q=${tag}`);
  await expect(board.column("fill_leak_test")).toBeVisible();
  await expect(board.column("cycling")).toBeHidden();
  await expect(board.switcher("fill_leak_test")).toHaveAttribute("aria-pressed", "true");
  await expect(board.switcher("fill_leak_test")).toHaveAccessibleName("Fill & leak test: 1 install");
  // Nothing scrolls sideways on a phone.
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);

  const target = (await board.switcher("cycling").boundingBox())!;
  await board.dragByTouch(card.title, { x: target.x + target.width / 2, y: target.y + target.height / 2 });
  await expect(page.getByTestId("board-status")).toContainText(`${card.title} is now in Cycling`);
  await expect.poll(async () => (await getProject(card.id)).stage).toBe("cycling");

  await page.reload();
  await board.open(`?q=${tag}`);
  await expect(board.switcher("cycling")).toHaveAttribute("aria-pressed", "true");
  await board.expectIn(card.title, "cycling");
});

test("on a phone \"Move to…\" moves a card, asks before skipping a stage, and the move stays after a reload", async ({ page }) => {
  const tag = `MoveTo${randomUUID().slice(0, 6)}`;
  const lead = await makeUser("lead", `Lead ${tag}`);
  const client = await makeUser("client");
  const card = await makeProject({ client, lead, stage: "site_survey", title: `${tag} hall tank` });
  await completeSurvey(card, lead);

  await signIn(page, lead.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  const board = new BoardPage(page);
  await board.open(`?q=${tag}`);

  await board.moveTo(card.title, "Aquascape");
  const skip = page.getByRole("dialog", { name: "Skip a stage?" });
  await expect(skip).toContainText("past Stand & load check");
  await skip.getByRole("button", { name: "Keep it in Site survey" }).click();
  await expect(page.getByTestId("board-status")).toContainText(`${card.title} stayed in Site survey`);
  expect((await getProject(card.id)).stage).toBe("site_survey");

  await board.moveTo(card.title, "Stand & load check");
  await expect(page.getByTestId("board-status")).toContainText(`${card.title} is now in Stand & load check`);
  await page.reload();
  await board.open(`?q=${tag}`);
  await board.switcher("stand_load_check").click();
  await board.expectIn(card.title, "stand_load_check");
  expect((await getProject(card.id)).stage).toBe("stand_load_check");
});
