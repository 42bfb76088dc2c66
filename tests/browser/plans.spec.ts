/**
 * The estimator's working surface end to end: upload a generated plan set through the real upload
 * path (SDK → app → upload stand-in → PDF check), calibrate a sheet from a dimension, tag four
 * openings of two types, read the counts, then reload and find everything where it was.
 */
import { expect, test, type Page } from "@playwright/test";
import { generatePlanSet } from "@/scripts/demo-plan";
import { openProjectSection, openSheetFromPlans, runId } from "./helpers";

const id = runId();
const owner = { name: "Odile Fenn", email: `odile.${id}@alderbend-trim.test`, password: "stool-horn-4444" };

async function signUp(page: Page) {
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill(owner.name);
  await page.getByLabel("Company name").fill(`Fenn Interior Trim ${id}`);
  await page.getByLabel("E-mail").fill(owner.email);
  await page.getByLabel("Password").fill(owner.password);
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page).toHaveURL(/\/projects$/);
  return new URL(page.url()).pathname.split("/")[1]!;
}

/** Chips' screen boxes, keyed by position in the list: equal before and after a reload means same spot on the drawing. */
const chipBoxes = async (page: Page) =>
  Promise.all((await page.getByRole("button", { name: /^Tag W\d/ }).all()).map(async (c) => ({ label: await c.getAttribute("aria-label"), box: await c.boundingBox() })));

test("upload, calibrate, tag four openings of two types, count, reload", async ({ page }) => {
  test.setTimeout(240_000);
  const slug = await signUp(page);
  const api = (path: string) => `/api/orgs/${slug}/${path}`;

  const projectName = `Larkspur Commons ${id}`;
  await page.getByLabel("Project name").fill(projectName);
  await page.getByRole("button", { name: "Create project" }).click();
  await page.getByRole("table").getByRole("link", { name: projectName }).click();
  await expect(page.getByRole("navigation", { name: "Project sections" })).toBeVisible();
  const projectId = new URL(page.url()).pathname.split("/").pop()!;
  for (const ot of [
    { mark: "W1", width: "3'-0\"", height: "5'-0\"", setback: "1 7/16" },
    { mark: "W2", width: "2'-6\"", height: "4'-0\"", setback: "1 7/16" },
  ]) {
    expect((await page.request.post(api(`projects/${projectId}/opening-types`), { data: ot })).status()).toBe(201);
  }
  expect((await page.request.post(api(`projects/${projectId}/unit-types`), { data: { name: "Type A", count: 12 } })).status()).toBe(201);

  await test.step("upload a generated plan set; the server reads it and makes one sheet per page", async () => {
    const { bytes } = await generatePlanSet({ unitTypes: ["A"] });
    await openProjectSection(page, "Plans");
    await page.locator('input[type="file"]').setInputFiles({ name: "Larkspur-C.pdf", mimeType: "application/pdf", buffer: Buffer.from(bytes) });
    await expect(page.getByText("2 sheets added.")).toBeVisible({ timeout: 60_000 });
    await expect(page.getByText("A-101", { exact: true })).toBeVisible();
    await expect(page.getByText("A-201", { exact: true })).toBeVisible();
  });

  await test.step("rename a sheet in place: an empty label is refused beside it, a new one is saved", async () => {
    await page.getByRole("button", { name: "Rename A-101" }).click();
    const input = page.getByLabel("Sheet label");
    const form = page.locator("form").filter({ has: input });
    await input.fill("");
    await form.getByRole("button", { name: "Save" }).click();
    await expect(input).toHaveAttribute("aria-invalid", "true");
    await input.fill("A-101R");
    await form.getByRole("button", { name: "Save" }).click();
    await expect(page.getByText("A-101R", { exact: true })).toBeVisible();
    // And back, through the server again, so the later steps find the sheet by its drawn number.
    await page.getByRole("button", { name: "Rename A-101R" }).click();
    await page.getByLabel("Sheet label").fill("A-101");
    await page.locator("form").filter({ has: page.getByLabel("Sheet label") }).getByRole("button", { name: "Save" }).click();
    await expect(page.getByLabel("Sheet label")).toHaveCount(0);
    await expect(page.getByText("A-101", { exact: true })).toBeVisible();
  });

  await test.step("mark A-201 as a Type A plan on the Plans page", async () => {
    await page.getByLabel("Unit type of A-201").selectOption({ label: "Type A (× 12)" });
    await expect(page.getByLabel("Unit type of A-201")).toHaveValue(/[0-9a-f-]{36}/);
  });

  const surface = page.getByRole("application", { name: "Sheet drawing" });
  await test.step("calibrate from a dimension of known length", async () => {
    await openSheetFromPlans(page, "A-201");
    await expect(page.locator("[data-sheet-page] canvas").first()).toBeVisible({ timeout: 60_000 });
    await page.getByRole("toolbar", { name: "Sheet tools" }).getByRole("button", { name: /^Calibrate/ }).click();
    const box = (await surface.boundingBox())!;
    await surface.click({ position: { x: box.width * 0.2, y: box.height * 0.6 } });
    await surface.click({ position: { x: box.width * 0.7, y: box.height * 0.6 } });
    await page.getByLabel(/Known length between the points/).fill(`30'-0"`);
    await page.getByRole("button", { name: "Save", exact: true }).click();
    await expect(page.getByText("two picked points", { exact: true })).toBeVisible();
  });

  await test.step("tag two W1 and two W2", async () => {
    const box = (await surface.boundingBox())!;
    const spots = [0.3, 0.4, 0.55, 0.65].map((f) => ({ x: box.width * f, y: box.height * 0.45 }));
    await page.getByRole("option").filter({ hasText: "W1" }).getByRole("button").click();
    for (const position of spots.slice(0, 2)) await surface.click({ position });
    await page.getByRole("option").filter({ hasText: "W2" }).getByRole("button").click();
    for (const position of spots.slice(2)) await surface.click({ position });
    await expect(page.getByRole("button", { name: /^Tag W\d$/ })).toHaveCount(4); // none still "saving"
  });

  const counts = page.locator("section", { has: page.getByRole("heading", { name: "Counts" }) });
  const expectCounts = async () => {
    // This sheet, Type A one unit, all 12 units, Job: two of each type on the sheet and per unit, 24 of each in the job.
    await expect(counts.getByRole("columnheader", { name: "This sheet" })).toBeVisible();
    await expect(counts.getByRole("row", { name: /W1/ })).toContainText(/2\s*2\s*24\s*24/);
    await expect(counts.getByRole("row", { name: /W2/ })).toContainText(/2\s*2\s*24\s*24/);
    await expect(counts.getByRole("row", { name: /Total/ })).toContainText(/4\s*4\s*48\s*48/);
  };
  await test.step("counts per sheet, per unit type and for the job", expectCounts);

  await test.step("reload: the calibration, the tags (same spots) and the counts are still there", async () => {
    const before = await chipBoxes(page);
    await page.reload();
    await expect(page.locator("[data-sheet-page] canvas").first()).toBeVisible({ timeout: 60_000 });
    await expect(page.getByRole("button", { name: /^Tag W\d$/ })).toHaveCount(4);
    await expect(page.getByText("two picked points", { exact: true })).toBeVisible();
    const after = await chipBoxes(page);
    expect(after.map((c) => c.label).sort()).toEqual(before.map((c) => c.label).sort());
    for (const b of before) {
      const match = after.find((a) => a.label === b.label && Math.abs(a.box!.x - b.box!.x) < 1.5 && Math.abs(a.box!.y - b.box!.y) < 1.5);
      expect(match, `a ${b.label} chip at ${b.box!.x},${b.box!.y}`).toBeTruthy();
    }
    await expectCounts();
  });
});
