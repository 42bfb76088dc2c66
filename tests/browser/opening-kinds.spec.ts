/**
 * An estimator adds a mulled unit and a door through the window list, tags them on a sheet, runs a
 * takeoff and finds both in the crew's cut list — every step by clicking after signing in.
 */
import { expect, test } from "@playwright/test";
import { seedBidWorld } from "./bid-world";
import { openProject, openProjectSection, recordPageErrors, runId, signIn } from "./helpers";

const id = runId();
let world: Awaited<ReturnType<typeof seedBidWorld>>;
test.beforeAll(async () => {
  world = await seedBidWorld(`ok${id}`);
});

test("a mulled unit and a door go from the window list to the cut list", async ({ page }) => {
  test.setTimeout(180_000);
  const errors = recordPageErrors(page);
  await signIn(page, world.estimator.email, world.password);
  await openProject(page, world.projectName);
  await openProjectSection(page, "Window list");

  await page.getByLabel("Mark", { exact: true }).fill("MU2");
  await page.getByLabel("Kind", { exact: true }).selectOption("mulled");
  await expect(page.getByLabel("Width", { exact: true })).toHaveCount(0);
  await page.getByLabel("Unit widths").fill("35 1/2, 35 1/2");
  await page.getByLabel("Mull gap").fill("1 1/2");
  await page.getByLabel("Height", { exact: true }).fill(`4'-6"`);
  await page.getByLabel("Setback", { exact: true }).fill("1 7/16");
  await page.getByRole("button", { name: "Add to window list" }).click();
  await expect(page.getByText(/Added MU2: 6'-0 1\/2" × 4'-6"/)).toBeVisible();

  await page.getByLabel("Mark", { exact: true }).fill("DR1");
  await page.getByLabel("Kind", { exact: true }).selectOption("door");
  await expect(page.getByLabel("Setback", { exact: true })).toHaveCount(0);
  await page.getByLabel("Width", { exact: true }).fill("30");
  await page.getByLabel("Height", { exact: true }).fill("81");
  await page.getByRole("button", { name: "Add to window list" }).click();
  await expect(page.getByText(/Added DR1/)).toBeVisible();
  // The list says what each line is.
  await expect(page.getByRole("row", { name: /MU2/ })).toContainText(/Mulled unit\s*2 units 2'-11 1\/2" \+ 2'-11 1\/2"/);
  await expect(page.getByRole("row", { name: /DR1/ })).toContainText(/cased both sides/);

  // Tag one of each on the first unit plan.
  await openProjectSection(page, "Plans");
  await page.getByRole("main").getByRole("link", { name: /A-201/ }).first().click();
  await expect(page.locator("[data-sheet-page] canvas").first()).toBeVisible({ timeout: 60_000 });
  const surface = page.getByRole("application", { name: "Sheet drawing" });
  const box = (await surface.boundingBox())!;
  await page.getByRole("option").filter({ hasText: "MU2" }).getByRole("button").click();
  await surface.click({ position: { x: box.width * 0.35, y: box.height * 0.5 } });
  await page.getByRole("option").filter({ hasText: "DR1" }).getByRole("button").click();
  await surface.click({ position: { x: box.width * 0.55, y: box.height * 0.5 } });
  await expect(page.getByRole("button", { name: /^Tag (MU2|DR1)$/ })).toHaveCount(2);

  await openProjectSection(page, "Takeoffs");
  await page.getByLabel("Name", { exact: true }).fill("With a mulled unit and a door");
  await page.getByLabel(/placeholder prices/).check();
  await page.getByRole("button", { name: "Run takeoff" }).click();
  await page.waitForURL(/takeoffs\/[0-9a-f-]{36}/, { timeout: 60_000 });
  await page.getByRole("main").getByRole("link", { name: /Crew cut list/ }).click();
  const main = page.getByRole("main");
  await expect(main.getByText(/MU2/).first()).toBeVisible();
  await expect(main.getByText(/Mullion casing/i).first()).toBeVisible();
  await expect(main.getByText(/DR1/).first()).toBeVisible();
  expect(errors).toEqual([]);
});
