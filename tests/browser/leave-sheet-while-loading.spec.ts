/**
 * Leaving a sheet the moment its drawing starts loading: the viewer's PDF is then destroyed while pdf.js is
 * still loading it, which used to throw pdf.js's "Worker was terminated" as an uncaught error in the page
 * (the viewer loaded through react-pdf's <Document>, which destroys on unmount).
 */
import { expect, test } from "@playwright/test";
import { seedBidWorld } from "./bid-world";
import { openProject, openProjectSection, recordPageErrors, runId, signIn } from "./helpers";

const id = runId();
let world: Awaited<ReturnType<typeof seedBidWorld>>;
test.beforeAll(async () => {
  world = await seedBidWorld(`ls${id}`);
});

test("leaving a sheet while its drawing is still loading throws nothing in the page", async ({ page }) => {
  test.setTimeout(180_000);
  const errors = recordPageErrors(page);
  await signIn(page, world.estimator.email, world.password);
  await openProject(page, world.projectName);
  const sections = page.getByRole("navigation", { name: "Project sections" });
  // Hold the PDF's bytes a moment, so that leaving happens while pdf.js is still loading the document.
  await page.route(/\/plan-sets\/[^/]+\/file/, async (route) => {
    await new Promise((r) => setTimeout(r, 400));
    await route.continue().catch(() => undefined);
  });
  for (let i = 0; i < 8; i++) {
    await openProjectSection(page, "Plans");
    await page.getByRole("main").getByRole("link", { name: /A-201/ }).first().click();
    await page.waitForURL(/\/sheets\//);
    await page.waitForTimeout(150 + i * 60);
    await sections.getByRole("link", { name: "Window list" }).click();
    await expect(page.getByRole("heading", { name: "Window list" })).toBeVisible();
  }
  await page.waitForTimeout(1000);
  expect(errors).toEqual([]);
  // The drawing still renders when one stays on the sheet.
  await page.unrouteAll({ behavior: "ignoreErrors" });
  await openProjectSection(page, "Plans");
  await page.getByRole("main").getByRole("link", { name: /A-201/ }).first().click();
  await expect(page.locator("[data-sheet-page] canvas").first()).toBeVisible({ timeout: 60_000 });
  expect(errors).toEqual([]);
});
