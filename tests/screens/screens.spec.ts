import { expect, test, type Page } from "@playwright/test";
import { DEMO, ready, signIn } from "../pages/sign-in-page";

// Desktop and phone sizes the screens are checked at (common practice: a laptop and a common phone).
const SIZES = [
  { name: "desktop", viewport: { width: 1440, height: 900 }, touch: false },
  { name: "phone", viewport: { width: 390, height: 844 }, touch: true },
] as const;

const DEMO_PROJECT = "Quist living-room bow-front";

async function shot(page: Page, file: string) {
  await page.evaluate(() => document.fonts.ready);
  await page.screenshot({ path: `docs/screens/${file}.png` });
}

for (const size of SIZES) {
  test.describe(size.name, () => {
    test.use({ viewport: size.viewport, hasTouch: size.touch, isMobile: size.touch });

    test(`board, project and water pages (${size.name})`, async ({ page }) => {
      await signIn(page, DEMO.lead);
      await expect(page).toHaveURL(/\/board$/);
      await ready(page);
      if (size.name === "phone") await page.getByTestId("switch-cycling").click();
      await expect(page.getByTestId("board-card").filter({ hasText: DEMO_PROJECT })).toBeVisible();
      await shot(page, `board-${size.name}`);

      const href = await page.getByRole("link", { name: DEMO_PROJECT }).getAttribute("href");
      await page.goto(href!);
      await ready(page);
      await expect(page.getByTestId("stage-track")).toBeVisible();
      await shot(page, `project-${size.name}`);

      await page.goto(`${href}/water`);
      await ready(page);
      await expect(page.getByRole("heading", { name: "Kits for this tank" })).toBeVisible();
      // The kits and the form with their quick picks, just below the sticky header.
      await page.evaluate(() => {
        const kits = document.querySelector("[data-testid=kit-choice]")!;
        window.scrollTo(0, kits.getBoundingClientRect().top + window.scrollY - 72);
      });
      await shot(page, `water-${size.name}`);
    });
  });
}
