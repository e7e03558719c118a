import { expect, test } from "@playwright/test";
import { closeDb } from "@/db";
import { makeTeam, PASSWORD } from "../support/fixtures";
import { approveLoad } from "../integration/board-support";
import { issuedQuote } from "../integration/money-support";
import { ready, signIn } from "../pages/sign-in-page";
import { BoardPage } from "../pages/board-page";
import { ProjectMoneyPage } from "../pages/money-page";

test.afterAll(async () => {
  await closeDb();
});

test("the client accepts the quote and pays the deposit on the payment page; the lead sees the gate open", async ({ page, browser }) => {
  const t = await makeTeam("stand_load_check");
  await approveLoad(t.project, t.lead);
  await issuedQuote(t.project, t.lead);

  // The lead's card first says what is missing.
  const leadContext = await browser.newContext();
  const lead = await leadContext.newPage();
  await signIn(lead, t.lead.email, PASSWORD);
  await expect(lead).toHaveURL(/\/board$/);
  const board = new BoardPage(lead);
  await board.open();
  await expect(board.card(t.project.title).getByTestId("next-needs")).toHaveText("Before Aquascape: The deposit isn't paid yet: the client hasn't accepted a quote.");

  await signIn(page, t.client.email, PASSWORD);
  await expect(page).toHaveURL(/\/portal$/);
  const money = new ProjectMoneyPage(page, t.project.id);
  await money.open();
  // 1,000.00 + 20 % tax, from the fixture quote.
  await expect(page.getByTestId("quote-total")).toHaveText("1,200.00 GBP");
  await money.accept(t.client.name);
  await expect(money.invoice("deposit")).toContainText("600.00 GBP");

  await board.open();
  await expect(board.card(t.project.title).getByTestId("next-needs")).toHaveText("Before Aquascape: The deposit isn't paid yet: glass is ordered and install day booked once it is.");

  await money.invoice("deposit").getByRole("button", { name: "Pay by card" }).click();
  await expect(page).toHaveURL(/\/pay\/cs_test_/);
  await expect(page.getByTestId("fake-pay-amount")).toHaveText("600.00 GBP");
  await page.getByRole("button", { name: "Pay now" }).click();
  await expect(page).toHaveURL(new RegExp(`/projects/${t.project.id}/money\\?payment=returned`));
  await ready(page);
  await expect(money.invoice("deposit").getByTestId("invoice-status")).toHaveText("Paid");
  await expect(page.getByTestId("payment-returned")).toContainText("confirmed");

  await board.open();
  await expect(board.card(t.project.title).getByTestId("next-needs")).toHaveText("Ready for Aquascape");
  await leadContext.close();
});
