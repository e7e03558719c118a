import { expect, type Page } from "@playwright/test";
import { ready } from "./sign-in-page";

/** A project's Money section, as the client uses it. */
export class ProjectMoneyPage {
  constructor(
    readonly page: Page,
    readonly projectId: string,
  ) {}

  async open() {
    await this.page.goto(`/projects/${this.projectId}/money`);
    await ready(this.page);
  }

  async accept(name: string) {
    await this.page.getByLabel("Your full name").fill(name);
    await this.page.getByRole("button", { name: "Accept this quote" }).click();
    await expect(this.page.getByTestId("quote-accepted")).toBeVisible();
  }

  invoice(kind: "deposit" | "progress" | "balance" | "monthly") {
    return this.page.getByTestId(`invoice-${kind}`);
  }
}
