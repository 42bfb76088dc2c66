/**
 * Getting to a sheet the way people do: from the project list, through Plans, into the viewer by a click,
 * and on to the neighbouring sheets; and back in from a link after signing in. Every move after the first
 * page is a click, so the client-side cache is shared between pages exactly as it is for a person.
 */
import { expect, test, type Page } from "@playwright/test";
import { seedBidWorld } from "./bid-world";
import { openProject, recordPageErrors, openSheetFromPlans, runId, signIn, signOut } from "./helpers";

const id = runId();
let world: Awaited<ReturnType<typeof seedBidWorld>>;
test.beforeAll(async () => {
  world = await seedBidWorld(`nav${id}`);
});

async function expectViewerOf(page: Page, label: string) {
  await expect(page.getByRole("heading", { level: 1, name: label })).toBeVisible();
  await expect(page.getByRole("toolbar", { name: "Sheet tools" })).toBeVisible();
  await expect(page.locator("[data-sheet-page] canvas").first()).toBeVisible({ timeout: 60_000 });
  await expect(page.getByRole("heading", { name: "Counts" })).toBeVisible();
}

test("every role opens a sheet from the Plans page by clicking, and the viewer renders", async ({ page }) => {
  test.setTimeout(240_000);
  const errors = recordPageErrors(page);
  for (const who of [world.estimator, world.manager, world.admin]) {
    await test.step(`${who.email}: projects → project → Plans → sheet`, async () => {
      await signIn(page, who.email, world.password);
      await expect(page).toHaveURL(/\/projects$/);
      await openProject(page, world.projectName);
      await openSheetFromPlans(page, "A-201");
      await expectViewerOf(page, "A-201");
      // The plans page had the window list and the counts cached: the viewer reads the same entries.
      await expect(page.getByRole("button", { name: /^Tag W\d/ }).first()).toBeVisible();
      await expect(page.getByText("This page couldn’t load")).toHaveCount(0);
      expect(errors).toEqual([]);
      await signOut(page);
    });
  }
});

test("previous and next sheet follow sheet-number order, as the Plans page lists them", async ({ page }) => {
  test.setTimeout(180_000);
  const errors = recordPageErrors(page);
  await signIn(page, world.estimator.email, world.password);
  await expect(page).toHaveURL(/\/projects$/);
  // Numbers a string sort gets wrong: "A-10" < "A-101" < "A-2" as text; by number it is.
  const api = `/api/orgs/${world.orgSlug}/projects/${world.projectId}`;
  const sheets = (await (await page.request.get(`${api}/sheets`)).json()).sheets as { id: string; label: string; version: number }[];
  const rename = { "A-201": "A-10", "A-202": "A-2" } as Record<string, string>;
  for (const s of sheets.filter((s) => rename[s.label])) {
    expect((await page.request.patch(`${api}/sheets/${s.id}`, { data: { version: s.version, label: rename[s.label] } })).status()).toBe(200);
  }

  await openProject(page, world.projectName);
  await page.getByRole("navigation", { name: "Project sections" }).getByRole("link", { name: "Plans" }).click();
  const sheetLinks = page.getByRole("main").getByRole("link", { name: /^A-\d+$/ });
  await expect(sheetLinks).toHaveCount(3);
  expect(await sheetLinks.allTextContents()).toEqual(["A-2", "A-10", "A-101"]);

  await sheetLinks.first().click();
  await expectViewerOf(page, "A-2");
  const sheetNav = page.getByRole("navigation", { name: "Sheets" });
  await expect(sheetNav.getByText("Sheet 1 of 3")).toBeVisible();
  await expect(sheetNav.getByRole("link", { name: /Previous sheet/ })).toHaveCount(0);
  await sheetNav.getByRole("link", { name: "Next sheet: A-10" }).click();
  await expectViewerOf(page, "A-10");
  await expect(sheetNav.getByText("Sheet 2 of 3")).toBeVisible();
  await sheetNav.getByRole("link", { name: "Next sheet: A-101" }).click();
  await expectViewerOf(page, "A-101");
  await expect(sheetNav.getByRole("link", { name: /Next sheet/ })).toHaveCount(0);
  await sheetNav.getByRole("link", { name: "Previous sheet: A-10" }).click();
  await expectViewerOf(page, "A-10");
  expect(errors).toEqual([]);
});

test("a link opened while signed out comes back to the page asked for after sign-in", async ({ page }) => {
  const errors = recordPageErrors(page);
  const deep = `/${world.orgSlug}/projects/${world.projectId}/takeoffs`;
  await page.goto(deep);
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=/);
  await expect(page.getByRole("heading", { name: "Sign in" })).toBeVisible();
  await page.getByLabel("E-mail").fill(world.manager.email);
  await page.getByLabel("Password").fill(world.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(deep);
  await expect(page.getByRole("heading", { name: "Takeoffs", level: 1 })).toBeVisible();
  expect(errors).toEqual([]);
});

test("sign-in never sends anyone to another site", async ({ page }) => {
  for (const hostile of ["https://evil.example/steal", "//evil.example/steal", "/\\evil.example/steal", "javascript:alert(1)"]) {
    await page.context().clearCookies();
    await page.goto(`/sign-in?callbackUrl=${encodeURIComponent(hostile)}`);
    await page.getByLabel("E-mail").fill(world.manager.email);
    await page.getByLabel("Password").fill(world.password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page).toHaveURL(`/${world.orgSlug}/projects`);
  }
});

test("a page that is not there says so in the app's own words, with a way back", async ({ page }) => {
  await signIn(page, world.estimator.email, world.password);
  await expect(page).toHaveURL(/\/projects$/);
  const res = await page.goto(`/${world.orgSlug}/projects/00000000-0000-4000-8000-000000000000`);
  expect(res?.status()).toBe(404);
  await expect(page.getByRole("heading", { name: "Nothing here" })).toBeVisible();
  await expect(page.getByText("This page could not be found.")).toHaveCount(0); // the framework's own page
  await page.getByRole("link", { name: "Go to your projects" }).click();
  await expect(page).toHaveURL(`/${world.orgSlug}/projects`);
  // The sheet page shows a loading state while it opens; an unknown sheet must still answer 404, not 200.
  const sheet = await page.goto(`/${world.orgSlug}/projects/${world.projectId}/sheets/00000000-0000-4000-8000-000000000000`);
  expect(sheet?.status()).toBe(404);
  await expect(page.getByRole("heading", { name: "Nothing here" })).toBeVisible();
});
