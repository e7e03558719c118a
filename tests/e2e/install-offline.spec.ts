import { readFileSync } from "node:fs";
import { expect, test, type Page } from "@playwright/test";
import { and, eq } from "drizzle-orm";
import sharp from "sharp";
import { db } from "@/db";
import { attachments, checklistItems, checklistTicks } from "@/db/schema";
import { makeTeam, PASSWORD } from "../support/fixtures";
import { ready, signIn } from "../pages/sign-in-page";

// A phone, with the service worker on (it is what keeps the page for a basement without signal).
// The phone's clock reads UTC, so a camera time without a zone is read as UTC.
test.use({ viewport: { width: 390, height: 844 }, trace: "off", serviceWorkers: "allow", timezoneId: "UTC" });

/** A 160 × 120 HEIC photo made with libheif's heif-enc, as an iPhone sends it. */
const HEIC = readFileSync(new URL("../fixtures/tank-160x120.heic", import.meta.url));

/**
 * A crew member on a project in aquascape opens install day for the first time, which registers
 * the worker and saves the page and its built files.
 */
async function openInstallDay(page: Page) {
  const t = await makeTeam("aquascape");
  await signIn(page, t.crew.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  await page.goto(`/projects/${t.project.id}/install`);
  await ready(page);
  await expect(page.locator("html[data-offline-ready=true]")).toHaveCount(1, { timeout: 30_000 });
  return t;
}

test("install day on a phone: HEIC and JPEG photos, a photo taken without signal, and the page opening offline", async ({ page, context }) => {
  const t = await openInstallDay(page);

  const photos = page.getByTestId("day-photos");
  const picker = photos.locator('input[type="file"]');
  const jpeg = await sharp({ create: { width: 3000, height: 2000, channels: 3, background: "#4a6b5d" } }).jpeg().toBuffer();
  await picker.setInputFiles([
    { name: "IMG_0101.HEIC", mimeType: "image/heic", buffer: HEIC },
    { name: "stand front.jpg", mimeType: "image/jpeg", buffer: jpeg },
  ]);
  const sent = photos.locator('[data-testid="photo"][data-state="sent"]');
  await expect(sent).toHaveCount(2);
  // Both show their thumbnails, drawn (a broken image has no natural width).
  for (const img of await sent.locator("img").all()) {
    await expect.poll(() => img.evaluate((el: HTMLImageElement) => el.complete && el.naturalWidth > 0)).toBe(true);
  }
  const stored = await db().select().from(attachments).where(eq(attachments.projectId, t.project.id));
  expect(stored.map((a) => a.contentType).sort()).toEqual(["image/jpeg", "image/jpeg"]);
  expect(stored.map((a) => a.fileName).sort()).toEqual(["IMG_0101.jpg", "stand front.jpg"]);
  // The 3000 × 2000 photo was shrunk on the phone to 2500 px on its long side before sending.
  const big = stored.find((a) => a.fileName === "stand front.jpg")!;
  const res = await page.request.get(`/api/attachments/${big.id}?variant=full`);
  const shrunk = await sharp(await res.body()).metadata();
  expect(shrunk.width).toBe(2500);
  expect(Math.abs(shrunk.height! - 1667)).toBeLessThanOrEqual(1);

  // No signal: the photo waits on the phone.
  await context.setOffline(true);
  const small = await sharp({ create: { width: 200, height: 150, channels: 3, background: "#8a6d3b" } })
    .withExif({ IFD2: { DateTimeOriginal: "2026:11:30 09:15:00" } })
    .jpeg()
    .toBuffer();
  await picker.setInputFiles({ name: "sump offline.jpg", mimeType: "image/jpeg", buffer: small });
  await expect(photos.locator('[data-testid="photo"][data-state="waiting"]')).toHaveCount(1);
  await expect(photos.getByTestId("waiting-photos")).toContainText("Waiting to send — 1 photo");

  // Reloaded with no signal: the worker serves the saved page, which says so, and the photo still waits.
  await page.reload();
  await ready(page);
  await expect(page.getByTestId("saved-copy")).toContainText("No signal — showing the page as it was at");
  await expect(page.getByTestId("saved-copy")).toContainText("Ticks and photos wait and send when you're back online.");
  await expect(photos.locator('[data-testid="photo"][data-state="waiting"]')).toHaveCount(1);
  await expect(photos.locator('[data-testid="photo"][data-state="waiting"]')).toContainText("sump offline.jpg");

  // The signal returns: it is sent, once.
  await context.setOffline(false);
  await expect(photos.locator('[data-testid="photo"][data-state="waiting"]')).toHaveCount(0);
  // (The saved copy is the page as first visited, before the first two photos: it lists only this one.)
  await expect(photos.locator('[data-testid="photo"][data-state="sent"]').filter({ hasText: "sump offline.jpg" })).toHaveCount(1);
  await expect(page.getByTestId("saved-copy")).toHaveCount(0);
  expect(await db().select().from(attachments).where(eq(attachments.projectId, t.project.id))).toHaveLength(3);
  const offline = await db()
    .select()
    .from(attachments)
    .where(and(eq(attachments.projectId, t.project.id), eq(attachments.fileName, "sump offline.jpg")));
  expect(offline).toHaveLength(1);
  expect(offline[0].clientKey).toMatch(/^p-[0-9a-f]{32}$/);
  expect(offline[0].status).toBe("ready");
  // The camera's time came with it, though the shrunk copy carries no metadata.
  expect(offline[0].takenAt?.toISOString()).toBe("2026-11-30T09:15:00.000Z");

  // Signing out forgets the saved pages, so the next person on this phone can't open them offline.
  await page.getByRole("button", { name: "Sign out" }).first().click();
  await expect(page).toHaveURL(/\/sign-in/);
  const keys = await page.evaluate(() => caches.keys());
  expect(keys).not.toContain("tankwright-pages-v1");
});

test("a checklist item's photo taken without signal: the tick waits for the photo, survives a reload, and each reaches the server once", async ({ page, context }) => {
  const t = await openInstallDay(page);

  const label = "Photo of the finished aquascape";
  const scape = page.locator(`[data-testid="checklist-item"][data-item="${label}"]`);
  await context.setOffline(true);
  const jpeg = await sharp({ create: { width: 300, height: 200, channels: 3, background: "#3d5c4f" } }).jpeg().toBuffer();
  await scape.locator('input[type="file"]').setInputFiles({ name: "scape basement.jpg", mimeType: "image/jpeg", buffer: jpeg });
  await expect(scape.getByTestId("item-photo")).toHaveAttribute("data-state", "waiting");
  await expect(scape.getByTestId("item-photo")).toContainText("Photo kept on this phone: scape basement.jpg");
  // The photo is the item's, and the day's photo panel counts it as waiting too.
  await expect(page.getByTestId("waiting-photos")).toContainText("Waiting to send — 1 photo");

  // Marked done with the photo still on the phone: the tick waits for it, shown as not saved.
  await scape.getByPlaceholder("Note (optional)").fill("rock work settled");
  await scape.getByRole("button", { name: /Mark done/ }).click();
  await expect(scape).toHaveAttribute("data-done", "true");
  await expect(scape.getByTestId("item-status")).toContainText("Not saved yet: waiting for its photo");

  // A reload with no signal keeps both.
  await page.reload();
  await ready(page);
  await expect(page.getByTestId("saved-copy")).toContainText("No signal");
  await expect(scape.getByTestId("item-status")).toContainText("Not saved yet: waiting for its photo");
  await expect(page.getByTestId("waiting-photos")).toContainText("Waiting to send — 1 photo");

  // The signal returns: the photo goes, then the tick with the photo's id.
  await context.setOffline(false);
  await expect(scape.getByTestId("item-status")).toContainText("Saved", { timeout: 20_000 });
  await expect(scape.getByTestId("item-status")).toContainText("rock work settled");
  await expect(scape.getByRole("img", { name: `Taken for: ${label}` })).toBeVisible();
  await expect(page.getByTestId("waiting-photos")).toHaveCount(0);

  const sent = await db().select().from(attachments).where(eq(attachments.projectId, t.project.id));
  expect(sent).toHaveLength(1);
  expect(sent[0].caption).toBe(label);
  const [scapeItem] = await db().select().from(checklistItems).where(eq(checklistItems.label, label));
  const ticks = await db()
    .select()
    .from(checklistTicks)
    .where(and(eq(checklistTicks.projectId, t.project.id), eq(checklistTicks.itemId, scapeItem.id)));
  expect(ticks).toHaveLength(1);
  expect(ticks[0].done).toBe(true);
  expect(ticks[0].attachmentId).toBe(sent[0].id);
  expect(ticks[0].note).toBe("rock work settled");
  expect(ticks[0].clientKey).toBe(`t-${sent[0].clientKey}`);
});
