import { expect, test, type Page } from "@playwright/test";
import { and, eq } from "drizzle-orm";
import sharp from "sharp";
import { db } from "@/db";
import { checklistItems, checklistTicks } from "@/db/schema";
import { makeTeam, PASSWORD } from "../support/fixtures";
import { ready, signIn } from "../pages/sign-in-page";

// Traces off: several runs share test-results/, and another run clearing it fails the trace write.
// No service worker here: these tests drop the connection with page.route, which a worker would bypass
// (install-offline.spec.ts covers the worker).
test.use({ viewport: { width: 390, height: 844 }, trace: "off", serviceWorkers: "block" });

const item = (page: Page, label: string) => page.locator(`[data-testid="checklist-item"][data-item="${label}"]`);

test("crew tick the day's checklist on a phone, attach a photo, and keep ticks through a dropped connection", async ({ page }) => {
  const t = await makeTeam("aquascape");
  await signIn(page, t.crew.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  await page.goto(`/projects/${t.project.id}/install`);
  await ready(page);

  // A plain item: one press.
  const steady = item(page, "Stand sits on the floor with no rocking");
  const press = steady.getByRole("button", { name: /Mark done/ });
  const box = await press.boundingBox();
  expect(box!.height).toBeGreaterThanOrEqual(44);
  await press.click();
  await expect(steady.getByTestId("item-status")).toContainText("Saved");
  await expect(steady).toHaveAttribute("data-done", "true");

  // A measured item refuses a value out of range, then takes one within it.
  const level = item(page, "Stand level along its length");
  await level.getByLabel(/Measured value/).fill("3");
  await level.getByRole("button", { name: /Mark done/ }).click();
  await expect(level.getByRole("alert")).toContainText("outside the allowed");
  await level.getByLabel(/Measured value/).fill("0.5");
  await level.getByRole("button", { name: /Mark done/ }).click();
  await expect(level.getByTestId("item-status")).toContainText("0.5 mm per m");
  await expect(page.getByTestId("progress-stand_load_check")).toContainText("2 of");

  // A photo item: refused without a photo, then ticked with one.
  const scape = item(page, "Photo of the finished aquascape");
  await scape.getByRole("button", { name: /Mark done/ }).click();
  await expect(scape.getByRole("alert")).toContainText("Attach a photo first");
  const png = await sharp({ create: { width: 120, height: 90, channels: 3, background: "#58697a" } }).png().toBuffer();
  await scape.locator('input[type="file"]').setInputFiles({ name: "finished scape.png", mimeType: "image/png", buffer: png });
  await expect(scape).toContainText("Photo attached: finished scape.png");
  await scape.getByRole("button", { name: /Mark done/ }).click();
  await expect(scape.getByTestId("item-status")).toContainText("Saved");
  await expect(scape.getByRole("img", { name: /Taken for/ })).toBeVisible();
  await expect(page.getByTestId("progress-aquascape")).toContainText("1 of");

  // The connection drops: the tick stays on the phone, marked as not saved.
  await page.route("**/api/projects/*/checklist/**", (r) => r.abort());
  const plumbing = item(page, "Overflow and plumbing dry-fitted");
  await plumbing.getByRole("button", { name: /Mark done/ }).click();
  await expect(plumbing.getByTestId("item-status")).toContainText("Not saved yet");
  await expect(page.getByTestId("pending-ticks")).toContainText("Waiting to save — 1 tick");
  await expect(page.getByTestId("progress-aquascape")).toContainText("2 of");
  const queued = await page.evaluate((id) => localStorage.getItem(`tankwright:ticks:${id}`), t.project.id);
  expect(JSON.parse(queued!)).toHaveLength(1);

  // The signal returns: the queued tick is sent and saved once.
  await page.unroute("**/api/projects/*/checklist/**");
  await page.getByTestId("pending-ticks").getByRole("button", { name: "Try now" }).click();
  await expect(page.getByTestId("pending-ticks")).toHaveCount(0);
  await expect(plumbing.getByTestId("item-status")).toContainText("Saved");

  const [plumbingItem] = await db().select().from(checklistItems).where(eq(checklistItems.label, "Overflow and plumbing dry-fitted"));
  const rows = await db()
    .select()
    .from(checklistTicks)
    .where(and(eq(checklistTicks.projectId, t.project.id), eq(checklistTicks.itemId, plumbingItem.id)));
  expect(rows).toHaveLength(1);
  expect(rows[0].done).toBe(true);
  expect(rows[0].byUserId).toBe(t.crew.id);

  // After a reload the saved state comes from the server and nothing waits on the phone.
  await page.reload();
  await ready(page);
  await expect(item(page, "Overflow and plumbing dry-fitted")).toHaveAttribute("data-done", "true");
  await expect(page.getByTestId("pending-ticks")).toHaveCount(0);
});

test("the project's people see its photos by stage", async ({ page }) => {
  const t = await makeTeam("aquascape");
  await signIn(page, t.crew.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  await page.goto(`/projects/${t.project.id}/photos`);
  await ready(page);
  await expect(page.getByText("No photos yet")).toBeVisible();
  await page.getByLabel("Caption (optional)").fill("Hardscape before planting");
  const jpeg = await sharp({ create: { width: 160, height: 120, channels: 3, background: "#2f82c4" } }).jpeg().toBuffer();
  await page.locator('input[type="file"]').setInputFiles({ name: "hardscape.jpg", mimeType: "image/jpeg", buffer: jpeg });
  await expect(page.getByRole("status").filter({ hasText: "hardscape.jpg was added" })).toBeVisible();
  const gallery = page.getByTestId("gallery-aquascape");
  await expect(gallery.getByRole("img", { name: "Hardscape before planting" })).toBeVisible();
  // The thumbnail really loaded from the object store through a signed link.
  await expect.poll(() => gallery.getByRole("img").first().evaluate((img: HTMLImageElement) => img.naturalWidth)).toBeGreaterThan(0);
});

test("the lead adds, reorders by keyboard and retires checklist items", async ({ page }) => {
  const t = await makeTeam("site_survey");
  await signIn(page, t.lead.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  await page.goto("/checklists");
  await ready(page);
  // A stage no gate reads, so other tests aren't affected by these items.
  const stage = page.getByTestId("template-in_service");
  const tag = Math.random().toString(36).slice(2, 6);
  for (const label of [`Filter sponge rinsed ${tag}`, `Lid fitted ${tag}`]) {
    await stage.getByRole("button", { name: "+ Add an item" }).click();
    await stage.getByLabel("What to check").fill(label);
    await stage.getByRole("button", { name: "Add item" }).click();
    await expect(stage.getByText(label)).toBeVisible();
  }
  const handle = stage.getByRole("button", { name: `Move “Lid fitted ${tag}”` });
  await handle.focus();
  await page.keyboard.press("Space");
  await expect(handle).toHaveAttribute("aria-pressed", "true");
  await page.keyboard.press("ArrowUp");
  // dnd-kit announces each item it passes over by id; wait until it is over the item above.
  const [target] = await db().select().from(checklistItems).where(eq(checklistItems.label, `Filter sponge rinsed ${tag}`));
  await expect(page.locator('[id^="DndLiveRegion"]').filter({ hasText: `was moved over droppable area ${target.id}` })).toHaveCount(1);
  await page.keyboard.press("Space");
  await expect(page.getByRole("status").filter({ hasText: `Moved “Lid fitted ${tag}”` })).toBeVisible();
  const labels = await stage.getByTestId("template-item").allTextContents();
  const mine = labels.filter((l) => l.includes(tag));
  expect(mine[0]).toContain("Lid fitted");

  await page.reload();
  await ready(page);
  const after = (await page.getByTestId("template-in_service").getByTestId("template-item").allTextContents()).filter((l) => l.includes(tag));
  expect(after[0]).toContain("Lid fitted");

  for (const label of [`Lid fitted ${tag}`, `Filter sponge rinsed ${tag}`]) {
    const row = page.getByTestId("template-in_service").getByTestId("template-item").filter({ hasText: label });
    await row.getByRole("button", { name: "Retire" }).click();
    await row.getByRole("button", { name: "Retire it" }).click();
    await expect(page.getByTestId("template-in_service").getByTestId("template-item").filter({ hasText: label })).toHaveCount(0);
  }
  const rows = await db().select().from(checklistItems).where(eq(checklistItems.label, `Lid fitted ${tag}`));
  expect(rows[0].retiredAt).not.toBeNull();
});

test("the crew plan the fill, record it and the check at fill, and load the van", async ({ page }) => {
  const t = await makeTeam("fill_leak_test");
  await signIn(page, t.crew.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  await page.goto(`/projects/${t.project.id}/install`);
  await ready(page);

  // No saved design here: 400 L entered, a 10 L bucket in 40 s is 15 L/min, so about 27 minutes;
  // a label of 5 mL per 100 L gives 20 mL.
  await page.getByLabel("Water to add (L)").fill("400");
  await page.getByLabel("Bucket size (L)").fill("10");
  await page.getByLabel("Seconds to fill it").fill("40");
  await page.getByLabel("Dose (mL)").fill("5");
  await page.getByLabel("treats (L)").fill("100");
  await expect(page.getByTestId("fill-plan")).toContainText("27 minutes");
  await expect(page.getByTestId("fill-plan")).toContainText("20 mL");

  await page.getByRole("button", { name: "Record the fill" }).click();
  await expect(page.getByTestId("leak-checks")).toContainText("Filled");
  await expect(page.getByTestId("leak-checks")).toContainText("20 mL conditioner");
  await page.getByRole("button", { name: "At fill: dry" }).click();
  await expect(page.getByTestId("leak-checks")).toContainText("Check at fill · dry");
  await page.getByRole("button", { name: "After 24 h: dry" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "at least 20 hours" })).toBeVisible();

  await page.getByLabel("Material", { exact: true }).fill("Sand, 10 kg bags");
  await page.getByLabel("Quantity", { exact: true }).fill("4");
  await page.getByLabel("Unit", { exact: true }).fill("bags");
  await page.getByRole("button", { name: "Add material" }).click();
  const list = page.getByTestId("materials-list");
  await expect(list).toContainText("Sand, 10 kg bags");
  await list.getByRole("button", { name: "Load" }).click();
  await expect(list.getByRole("button", { name: "Loaded" })).toHaveAttribute("aria-pressed", "true");
});
