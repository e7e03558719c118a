import { expect, test, type Page } from "@playwright/test";
import { PASSWORD, makeTeam } from "../support/fixtures";
import { ready, signIn } from "../pages/sign-in-page";

const exact = { exact: true } as const;

async function fill(page: Page, values: Record<string, string>) {
  for (const [label, value] of Object.entries(values)) await page.getByLabel(label, exact).fill(value);
}

async function choose(page: Page, values: Record<string, string>) {
  for (const [label, option] of Object.entries(values)) await page.getByLabel(label, exact).selectOption({ label: option });
}

test("the lead surveys a site, designs the tank, sees the load check, approves it and opens the sheet", async ({ page }) => {
  const t = await makeTeam("site_survey");
  await signIn(page, t.lead.email, PASSWORD);
  await expect(page).toHaveURL(/\/board$/);

  await page.goto(`/projects/${t.project.id}/survey`);
  await ready(page);
  await expect(page.getByRole("heading", { name: "Site survey" })).toBeVisible();
  await expect(page.getByRole("radio", { name: "mm · kg · L" })).toHaveAttribute("aria-checked", "true");

  // A first save with only some answers is kept as a draft, naming what is still needed.
  await choose(page, { "Room use (required)": "Living area", "Floor type (required)": "Concrete slab on the ground" });
  await page.getByRole("button", { name: "Save survey" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Draft saved" })).toContainText("Narrowest door width");

  await choose(page, {
    "Floor level (required)": "Ground floor",
    "Stairs on the way in (required)": "No",
    "Ground-fault protection (required)": "Yes",
    "Dedicated circuit (required)": "No",
    "Direct sun (required)": "None",
  });
  await fill(page, {
    "Room length (mm) (required)": "5000",
    "Room width (mm) (required)": "4000",
    "Narrowest door width (mm) (required)": "820",
    "Narrowest door height (mm) (required)": "2040",
    "Outlets within reach (required)": "2",
    "Distance to a water supply (mm) (required)": "5000",
    "Distance to a drain (mm) (required)": "6000",
  });
  await page.getByRole("button", { name: "Save survey" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Survey saved and complete" })).toBeVisible();

  // The design, in millimetres, kilograms and litres; the results follow as it is typed.
  await choose(page, { Substrate: "Aqua soil", "How is the top edge of the walls held?": "A top frame or brace holds the top edge all round" });
  await fill(page, {
    "Length (mm)": "600",
    "Depth, front to back (mm)": "300",
    "Height (mm)": "300",
    "Panel thickness (mm)": "6",
    "Water level below the rim (mm)": "30",
    "Water temperature (°C)": "24",
    "Substrate depth (mm)": "40",
    "Rock (kg)": "3",
    "Sump water (L)": "0",
    "Stand weight (kg)": "30",
    "Stand length (mm)": "1200",
    "Stand depth (mm)": "600",
    "Stand height (mm, optional)": "700",
    "Base length (mm)": "1200",
    "Base depth (mm)": "600",
  });
  const results = page.getByTestId("load-results");
  await expect(results.getByTestId("net-volume")).toHaveText(/^40 L \(11 gal\)$/);
  await expect(results.getByTestId("floor-verdict")).toHaveText("Within the screening allowance");
  await expect(results.getByTestId("access-tank")).toContainText("Fits upright");
  await expect(results.getByTestId("load-cautions")).toContainText("licensed professionals");

  await page.getByRole("button", { name: "Save design" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Design saved." })).toBeVisible();

  await page.getByRole("button", { name: "Approve the load check" }).click();
  await expect(page.getByTestId("approval-state")).toHaveText("Approved for this design");
  await expect(page.getByText(`Approved by ${t.lead.name}`)).toBeVisible();

  // In inches, pounds and gallons the same design reads differently; saving it unchanged keeps it
  // exactly as approved (no rounding drift), so the approval stays current.
  await page.getByRole("radio", { name: "in · lb · gal" }).click();
  await expect(page.getByLabel("Length (in)", exact)).toHaveValue("23.6");
  await expect(results.getByTestId("net-volume")).toHaveText(/^11 gal \(40 L\)$/);
  const saved = page.waitForResponse((r) => r.url().endsWith(`/api/projects/${t.project.id}/design`) && r.request().method() === "PUT");
  await page.getByRole("button", { name: "Save design" }).click();
  expect((await saved).status()).toBe(200);
  await page.reload();
  await ready(page);
  await expect(page.getByLabel("Length (in)", exact)).toHaveValue("23.6");
  await expect(page.getByTestId("approval-state")).toHaveText("Approved for this design");

  await page.getByRole("link", { name: "Load-check sheet" }).click();
  await expect(page).toHaveURL(new RegExp(`/projects/${t.project.id}/load-sheet$`));
  await ready(page);
  await expect(page.getByRole("heading", { name: "Load-check sheet" })).toBeVisible();
  await expect(page.getByRole("button", { name: "Print" })).toBeVisible();
  await expect(page.getByTestId("sheet-approval")).toContainText("Approved for this design");
  await expect(page.getByTestId("net-volume")).toHaveText(/^11 gal \(40 L\)$/);
  await expect(page.getByTestId("floor-verdict")).toHaveText("Within the screening allowance");
});
