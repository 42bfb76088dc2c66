/**
 * Leaving the Plans page the moment its thumbnails start loading: the plan set's PDF is then destroyed while
 * pdf.js is still loading it, which used to throw pdf.js's "Worker was terminated" as an uncaught error.
 */
import { expect, test } from "@playwright/test";
import { seedBidWorld } from "./bid-world";
import { openProject, recordPageErrors, runId, signIn } from "./helpers";

const id = runId();
let world: Awaited<ReturnType<typeof seedBidWorld>>;
test.beforeAll(async () => {
  world = await seedBidWorld(`lv${id}`);
});

test("leaving the Plans page while its thumbnails are still loading throws nothing in the page", async ({ page }) => {
  // Before the fix every quick exit from Plans threw pdf.js's "Worker was terminated" as an uncaught error:
  // react-pdf destroyed the thumbnails' document mid-load. Eight quick round trips, at growing delays.
  test.setTimeout(180_000);
  const errors = recordPageErrors(page);
  await signIn(page, world.estimator.email, world.password);
  await openProject(page, world.projectName);
  const sections = page.getByRole("navigation", { name: "Project sections" });
  for (let i = 0; i < 8; i++) {
    await sections.getByRole("link", { name: "Plans", exact: true }).click();
    await page.getByRole("main").getByRole("link", { name: /A-201/ }).first().waitFor();
    await page.waitForTimeout(i * 60);
    await sections.getByRole("link", { name: "Window list" }).click();
    await expect(page.getByRole("heading", { name: "Window list" })).toBeVisible();
  }
  await page.waitForTimeout(1000);
  expect(errors).toEqual([]);
  // The thumbnails still load when one stays.
  await sections.getByRole("link", { name: "Plans", exact: true }).click();
  await expect(page.getByRole("main").locator("img").first()).toBeVisible({ timeout: 60_000 });
});
