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
    return this.page.getByRole("button", { name: `Move ${title}`, exact: true });
  }

  /** A stage's tank in the phone's stage switcher. */
  switcher(stage: Stage) {
    return this.page.getByTestId(`switch-${stage}`);
  }

  /** Moves a card without dragging: "Move to…", then the stage. */
  async moveTo(title: string, stageLabel: string) {
    await this.card(title).getByRole("button", { name: `Move to… ${title}` }).click();
    const dialog = this.page.getByRole("dialog", { name: `Move ${title} to…` });
    await dialog.getByRole("button", { name: stageLabel }).click();
  }

  /**
   * Drags a card by touch: a long press on the card, then a finger moving in small steps to `to`,
   * through the browser's own touch events (Chrome DevTools Protocol), as a phone sends them.
   */
  async dragByTouch(title: string, to: { x: number; y: number }) {
    const from = (await this.card(title).getByTestId("card-people").boundingBox())!;
    const start = { x: from.x + 20, y: from.y + from.height / 2 };
    const cdp = await this.page.context().newCDPSession(this.page);
    const touch = (type: "touchStart" | "touchMove" | "touchEnd", p?: { x: number; y: number }) => cdp.send("Input.dispatchTouchEvent", { type, touchPoints: p ? [{ x: Math.round(p.x), y: Math.round(p.y) }] : [] });
    await touch("touchStart", start);
    // Hold past the board's long-press delay, as a thumb does before dragging.
    await this.page.waitForTimeout(450);
    await expect(this.card(title).first()).toHaveCSS("opacity", "0.5");
    const steps = 12;
    for (let i = 1; i <= steps; i++) await touch("touchMove", { x: start.x + ((to.x - start.x) * i) / steps, y: start.y + ((to.y - start.y) * i) / steps });
    await touch("touchEnd");
    await cdp.detach();
  }

  async expectIn(title: string, stage: Stage) {
    await expect(this.column(stage).getByTestId("board-card").filter({ hasText: title })).toHaveCount(1);
  }

  /** Drags a card (held by its people line, not its link) onto a column with the mouse, in small steps as a hand would. */
  async dragWithMouse(title: string, stage: Stage) {
    const grip = this.card(title).getByTestId("card-people");
    await grip.scrollIntoViewIfNeeded();
    const from = (await grip.boundingBox())!;
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
