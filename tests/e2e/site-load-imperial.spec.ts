import { expect, test, type Locator } from "@playwright/test";
import { PASSWORD, makeTeam } from "../support/fixtures";
import { ready, signIn } from "../pages/sign-in-page";
import { joistSurvey, lightDesign } from "../unit/survey/fixtures";

const exact = { exact: true } as const;

/** Metric units left in a text once the other system's figures in brackets are set aside. */
async function metricLeft(locator: Locator): Promise<string[]> {
  const text = (await locator.innerText()).replace(/\([^()]*\)/g, "");
  return text.match(/\d[\d,.]*\s*(mm|cm|kPa|MPa|kg\/m³|kg|kN·m|kN|m²|L\b|L\/min|°C)/g) ?? [];
}

test("in inches, pounds and gallons every figure on Site & load and the sheet reads in imperial", async ({ page }) => {
  const t = await makeTeam("stand_load_check");
  await signIn(page, t.lead.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);
  const api = `/api/projects/${t.project.id}`;
  expect((await page.request.put(`${api}/survey`, { data: joistSurvey() })).status()).toBe(200);
  // 1200 × 500 × 600 mm with a top frame, 10 mm glass, on the joists across them.
  const design = { ...lightDesign(), lengthMm: 1200, widthMm: 500, heightMm: 600, panelThicknessMm: 10, stand: { ...lightDesign().stand, lengthMm: 1200, widthMm: 500, footprint: { kind: "solid", lengthMm: 1200, widthMm: 500 } } };
  expect((await page.request.put(`${api}/design`, { data: design })).status()).toBe(200);

  await page.goto(`/projects/${t.project.id}/survey`);
  await ready(page);
  await page.getByRole("radio", { name: "in · lb · gal" }).click();
  await expect(page.getByLabel("Length (in)", exact)).toHaveValue("47.2");
  await expect(page.getByLabel("Panel thickness (in)", exact)).toHaveValue("0.39");
  await expect(page.getByLabel("Joist span (in) (required)", exact)).toHaveValue("141.7");

  const results = page.getByTestId("load-results");
  await expect(results.getByTestId("net-volume")).toHaveText(/^\d+ gal \(\d+ L\)$/);
  await expect(results.getByTestId("total-mass")).toHaveText(/^[\d,]+ lb \([\d,]+ kg\)$/);
  await expect(results.getByTestId("floor-pressure")).toHaveText(/^[\d,]+ psf$/);
  await expect(results.getByTestId("floor-live-load")).toHaveText(/^40 psf live load/);
  await expect(results.getByTestId("joist-load")).toHaveText(/^[\d,]+ lbf at [\d.]+ in from the support$/);
  await expect(results.getByTestId("joist-moment")).toHaveText(/^[\d,]+ lbf·ft \/ [\d,]+ lbf·ft \(\d+ %\)$/);
  await expect(results.getByTestId("joist-shear")).toHaveText(/^[\d,]+ lbf \/ [\d,]+ lbf \(\d+ %\)$/);
  await expect(results.getByTestId("panel-front and back")).toContainText("0.39 in");
  await expect(results.getByTestId("access-tank")).toHaveText(/^Fits upright with [\d.]+ in to spare\.$/);
  await expect(results.getByTestId("top-edge")).toContainText("top frame or brace");
  await expect(results.getByTestId("glass-sources")).toContainText("psi");
  await expect(results.getByTestId("floor-cautions")).toContainText("structural engineer");
  await expect(results.getByTestId("glass-cautions")).toContainText("panel maker");
  expect(await metricLeft(results)).toEqual([]);

  // Switching back shows whole millimetres, never round-trip digits.
  await page.getByRole("radio", { name: "mm · kg · L" }).click();
  await expect(page.getByLabel("Length (mm)", exact)).toHaveValue("1200");
  await expect(page.getByLabel("Joist span (mm) (required)", exact)).toHaveValue("3600");
  await page.getByRole("radio", { name: "in · lb · gal" }).click();
  await expect(page.getByLabel("Length (in)", exact)).toHaveValue("47.2");

  await page.goto(`/projects/${t.project.id}/load-sheet`);
  await ready(page);
  const sheet = page.locator("article");
  await expect(sheet.getByTestId("sheet-parties")).toContainText(t.project.siteAddress ?? "");
  await expect(sheet.getByTestId("sheet-signatures")).toContainText("Structural engineer");
  await expect(sheet.getByTestId("joist-moment")).toHaveText(/lbf·ft/);
  expect(await metricLeft(sheet)).toEqual([]);

  // Printed, the sheet fits one or two pages on A4 and on Letter.
  for (const format of ["A4", "Letter"] as const) {
    const pdf = (await page.pdf({ format, printBackground: false })).toString("latin1");
    const pages = pdf.match(/\/Type\s*\/Page(?!s)/g)?.length ?? 0;
    expect(pages, `${format} pages`).toBeGreaterThanOrEqual(1);
    expect(pages, `${format} pages`).toBeLessThanOrEqual(2);
  }
});
