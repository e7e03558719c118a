import { expect, type Page } from "@playwright/test";
import { ready } from "./sign-in-page";
import type { Stage } from "@/lib/stages/stages";

/** The install board, as a person uses it. */
export class BoardPage {
  constructor(readonly page: Page) {}

  async open(query = "") {
    await this.page.goto(`/board${query}`);
    await ready(this.page);
  }

  column(stage: Stage) {
    return this.page.getByTestId(`column-${stage}`);
  }

  card(title: string) {
    return this.page.getByTestId("board-card").filter({ hasText: title });
  }

  handle(title: string) {
    return this.page.getByRole("button", { name: `Move ${title}` });
  }

  async expectIn(title: string, stage: Stage) {
    await expect(this.column(stage).getByTestId("board-card").filter({ hasText: title })).toHaveCount(1);
  }

  /** Drags a card's handle onto a column with the mouse, in small steps as a hand would. */
  async dragWithMouse(title: string, stage: Stage) {
    const handle = this.handle(title);
    await handle.scrollIntoViewIfNeeded();
    const from = (await handle.boundingBox())!;
    const target = this.column(stage);
    const to = (await target.boundingBox())!;
    await this.page.mouse.move(from.x + from.width / 2, from.y + from.height / 2);
    await this.page.mouse.down();
    await this.page.mouse.move(from.x + from.width / 2 + 10, from.y + from.height / 2, { steps: 3 });
    await this.page.mouse.move(to.x + to.width / 2, to.y + 80, { steps: 15 });
    await this.page.mouse.move(to.x + to.width / 2, to.y + 90, { steps: 2 });
    await this.page.mouse.up();
  }

  /** Picks a card up with Space, moves it with arrow keys, drops it with Space, waiting on the announcements. */
  async dragWithKeyboard(title: string, keys: string[], overText: RegExp) {
    const handle = this.handle(title);
    await handle.focus();
    await this.page.keyboard.press("Space");
    await expect(handle).toHaveAttribute("aria-pressed", "true");
    // The pick-up announcement is replaced at once by where the card is hovering.
    await expect(this.page.getByText(new RegExp(`^${title} is over `))).toHaveCount(1);
    for (const key of keys) await this.page.keyboard.press(key);
    await expect(this.page.getByText(overText)).toHaveCount(1);
    await this.page.keyboard.press("Space");
  }
}
