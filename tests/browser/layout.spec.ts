/**
 * The screens at the sizes people use them: a 1024 × 768 tablet in the viewer, a 1366 px laptop header for a
 * role with a long name, and a phone. Screenshots land in the test output folder for a person to look at.
 */
import { expect, test, type Page } from "@playwright/test";
import { seedBidWorld } from "./bid-world";
import { openProject, openSheetFromPlans, runId, signIn } from "./helpers";

const id = runId();
let world: Awaited<ReturnType<typeof seedBidWorld>>;
test.beforeAll(async () => {
  world = await seedBidWorld(`lay${id}`);
});

/** Rows the visible children of an element sit on: vertical centres more than 12 px apart start a new row. */
const rowsOf = (page: Page, selector: string) =>
  page.locator(selector).evaluate((el) => {
    const centres = [...el.children]
      .map((c) => c.getBoundingClientRect())
      .filter((r) => r.width > 0 && r.height > 0)
      .map((r) => (r.top + r.bottom) / 2)
      .sort((a, b) => a - b);
    return centres.filter((c, i) => i === 0 || c - centres[i - 1]! > 12).length;
  });

test("tablet 1024 × 768: one toolbar row, a side panel that folds away, tags no bigger than the windows", async ({ page }, info) => {
  test.setTimeout(150_000);
  await page.setViewportSize({ width: 1024, height: 768 });
  await signIn(page, world.estimator.email, world.password);
  await expect(page).toHaveURL(/\/projects$/);
  await openProject(page, world.projectName);
  await openSheetFromPlans(page, "A-201");
  await expect(page.locator("[data-sheet-page] canvas").first()).toBeVisible({ timeout: 60_000 });
  await expect(page.getByRole("button", { name: /^Tag W\d/ }).first()).toBeVisible();

  const toolbar = page.getByRole("toolbar", { name: "Sheet tools" });
  await page.screenshot({ path: info.outputPath("viewer-1024.png") });
  expect(await rowsOf(page, '[role="toolbar"][aria-label="Sheet tools"]')).toBe(1);
  expect(await toolbar.evaluate((el) => el.scrollWidth <= el.clientWidth + 1)).toBe(true);
  // At fit zoom the chips are the compact ones, smaller than a drawn window (10–20 px here).
  const chip = (await page.getByRole("button", { name: /^Tag W\d/ }).first().boundingBox())!;
  expect(chip.width).toBeLessThanOrEqual(18);

  const surface = page.getByRole("application", { name: "Sheet drawing" });
  const before = (await surface.boundingBox())!.width;
  await toolbar.getByRole("button", { name: "Hide side panel" }).click();
  await expect(page.getByRole("complementary", { name: "Sheet details" })).toBeHidden();
  await expect.poll(async () => (await surface.boundingBox())!.width).toBeGreaterThan(before + 200);
  await toolbar.getByRole("button", { name: "Show side panel" }).click();
  await expect(page.getByRole("heading", { name: "Counts" })).toBeVisible();
});

test("1366 px laptop: the header is one row for a project manager", async ({ page }, info) => {
  await page.setViewportSize({ width: 1366, height: 768 });
  await signIn(page, world.manager.email, world.password);
  await expect(page).toHaveURL(/\/projects$/);
  await page.screenshot({ path: info.outputPath("header-1366-pm.png") });
  expect(await rowsOf(page, "header > div")).toBe(1);
});

test("phone: nothing runs off the side of the page", async ({ page }, info) => {
  await page.setViewportSize({ width: 390, height: 844 });
  await signIn(page, world.estimator.email, world.password);
  await expect(page).toHaveURL(/\/projects$/);
  await openProject(page, world.projectName);
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Settings" }).scrollIntoViewIfNeeded();
  await expect(page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Settings" })).toBeInViewport();
  await page.screenshot({ path: info.outputPath("phone-project.png"), fullPage: true });
});
