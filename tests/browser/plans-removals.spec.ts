/**
 * What the plans and window-list pages say before work is lost or doubled: a repeated unit plan is
 * flagged and fixed by marking a sheet as a reference view; deleting a sheet or an opening type names
 * the tags and counted openings that go with it; a price-book gap shows on the window list; uploading
 * the same file twice asks first.
 */
import { expect, test, type Page } from "@playwright/test";
import { db } from "@/db/client";
import { memberships, users } from "@/db/schema";
import { createProject } from "@/lib/server/projects/projects";
import { addOpeningType as createOpeningType } from "@/lib/server/plans/opening-types";
import { addPlanSet as createPlanSet } from "@/lib/server/plans/plan-sets";
import { sheetsOf as listSheets, editSheet as updateSheet } from "@/lib/server/plans/sheets";
import { addTag as createTag } from "@/lib/server/plans/tags";
import { addUnitType as createUnitType } from "@/lib/server/plans/unit-types";
import { signUp as signUpUser } from "@/lib/server/accounts/sign-up";
import { seedDemoPriceBook } from "@/scripts/seed/demo-price-book";
import { hashPassword } from "@/lib/auth/password";
import { generatePlanSet } from "@/scripts/demo-plan";
import { runId, signIn } from "./helpers";

const id = runId();
const password = "return-miter-6666";

/**
 * A company with an estimator; a project whose plan set has A-201 (Type A, 6 units) and A-401, a
 * repeat of the same unit plan that was also counted; W1 ×2, W2 ×1 and M ×1 tagged on each, M being a
 * window with a 9" setback the demo price book has no stool or extension stock for.
 */
async function seed() {
  const { user: admin, organisation } = await signUpUser({ name: "Ines Calder", email: `ines.${id}@calder-trim.test`, password, organisationName: `Calder Trim ${id}` });
  const [estimator] = await db.insert(users).values({ name: "Tobin Vale", email: `tobin.${id}@calder-trim.test`, passwordHash: await hashPassword(password) }).returning();
  await db.insert(memberships).values({ orgId: organisation.id, userId: estimator!.id, role: "estimator" });
  const projectName = `Wrenfield Court ${id}`;
  const project = await createProject({ orgId: organisation.id, userId: admin.id, input: { name: projectName } });
  const scope = { orgId: organisation.id, projectId: project.id, userId: admin.id };
  const page = { width: 2592, height: 1728, rotation: 0, userUnit: 1 };
  await createPlanSet(scope, { key: `removals-${id}`, name: "Wrenfield unit plans.pdf", size: 1 }, [
    { pageNumber: 1, label: "A-201", ...page },
    { pageNumber: 2, label: "A-401", ...page },
  ]);
  const typeA = await createUnitType(scope, { name: "Type A", count: 6 });
  const w1 = await createOpeningType(scope, { mark: "W1", width: 36, height: 60, setback: 0.5 });
  const w2 = await createOpeningType(scope, { mark: "W2", width: 30, height: 48, setback: 0.5 });
  const m = await createOpeningType(scope, { mark: "M", width: 40, height: 60, setback: 9 });
  for (const sheet of await listSheets(scope)) {
    await updateSheet(scope, sheet.id, { version: sheet.version, unitTypeId: typeA.id, countRole: "counted" });
    for (const [ot, x, y] of [[w1.id, 400, 300], [w1.id, 520, 300], [w2.id, 900, 700], [m.id, 1200, 300]] as const) await createTag(scope, { sheetId: sheet.id, openingTypeId: ot, x, y });
  }
  await seedDemoPriceBook(organisation.id, admin.id);
  // The pool stays open: later spec files in this worker seed through it too.
  return { email: estimator!.email, projectName };
}

async function openProjectTab(page: Page, projectName: string, tab: "Plans" | "Window list") {
  await page.getByRole("link", { name: projectName }).click();
  await page.getByRole("navigation", { name: "Project sections" }).getByRole("link", { name: tab }).click();
}

test("repeated layouts, delete questions, price-book gaps and a second upload of one file", async ({ page }) => {
  test.setTimeout(240_000);
  const world = await seed();
  await signIn(page, world.email, password);
  await expect(page).toHaveURL(/\/projects$/);
  await openProjectTab(page, world.projectName, "Plans");

  await test.step("two counted sheets of Type A with the same tags are flagged; marking one a reference view clears it", async () => {
    const warnings = page.getByRole("region", { name: "Count warnings" });
    await expect(warnings).toContainText("A-201 and A-401 carry the same tags for Type A, and each counts × 6");
    await page.getByLabel("Counting of A-401").selectOption("reference");
    await expect(warnings).toHaveCount(0);
    // The job now counts one unit plan × 6 units: M 6, W1 12, W2 6, all 24 (it was 12, 24, 12 and 48).
    await expect(page.getByRole("row", { name: /^Job/ })).toHaveText(/^Job\s*6\s*12\s*6\s*24$/);
  });

  await test.step("deleting a sheet names its tags and openings; Keep it changes nothing", async () => {
    await page.getByRole("button", { name: "Delete sheet A-201" }).click();
    const dialog = page.getByRole("dialog", { name: "Delete sheet A-201?" });
    await expect(dialog).toContainText("This also deletes 4 tags placed on the drawings, which the job counts as 24 openings.");
    await dialog.getByRole("button", { name: "Keep it" }).click();
    await expect(dialog).toBeHidden();
    await expect(page.getByRole("link", { name: "A-201", exact: true })).toBeVisible();

    await page.getByRole("button", { name: "Delete sheet A-401" }).click();
    const reference = page.getByRole("dialog", { name: "Delete sheet A-401?" });
    await expect(reference).toContainText("This also deletes 4 tags placed on the drawings (on reference views: they count no openings).");
    await reference.getByRole("button", { name: "Delete sheet" }).click();
    await expect(reference).toBeHidden();
    await expect(page.getByRole("link", { name: "A-401", exact: true })).toHaveCount(0);
  });

  await test.step("the window list shows the price-book gap as soon as the type exists", async () => {
    await page.getByRole("navigation", { name: "Project sections" }).getByRole("link", { name: "Window list" }).click();
    await expect(page.getByText(/gaps? in Alder Bend Millwork.* for M/)).toBeVisible();
    const gapRows = page.locator('tr[data-gap="M"]');
    await expect(gapRows.first()).toContainText('M needs stool at least 10" wide: the price book has none that wide.');
    await expect(page.locator('tr[data-gap="W1"]')).toHaveCount(0);
  });

  await test.step("deleting an opening type names the tags and openings it takes", async () => {
    await page.getByRole("button", { name: "Delete W1" }).click();
    const dialog = page.getByRole("dialog", { name: "Delete opening type W1 from the window list?" });
    await expect(dialog).toContainText("This also deletes 2 tags placed on the drawings, which the job counts as 12 openings.");
    await dialog.getByRole("button", { name: "Delete W1 and its tags" }).click();
    await expect(dialog).toBeHidden();
    await expect(page.getByRole("button", { name: "Delete W1" })).toHaveCount(0);
    await expect(page.getByRole("button", { name: "Delete W2" })).toBeVisible();
  });

  await test.step("the same file uploaded twice: asked, skipped, then kept on purpose", async () => {
    await page.getByRole("navigation", { name: "Project sections" }).getByRole("link", { name: "Plans" }).click();
    const { bytes } = await generatePlanSet({ unitTypes: ["B"] });
    const file = { name: "Wrenfield-B.pdf", mimeType: "application/pdf", buffer: Buffer.from(bytes) };
    const input = page.locator('input[type="file"]');
    await input.setInputFiles(file);
    await expect(page.getByText("2 sheets added.")).toBeVisible({ timeout: 60_000 });

    await input.setInputFiles({ ...file, name: "Wrenfield-B (1).pdf" });
    const question = page.getByRole("group", { name: "Wrenfield-B (1).pdf is already in this project" });
    await expect(question).toContainText("This file is byte for byte the same as Wrenfield-B.pdf");
    await question.getByRole("button", { name: "Skip this file" }).click();
    await expect(page.getByText("Skipped: Wrenfield-B.pdf already holds this file. Nothing was added.")).toBeVisible();
    await expect(page.getByRole("heading", { name: "Wrenfield-B (1).pdf" })).toHaveCount(0);

    await input.setInputFiles({ ...file, name: "Wrenfield-B again.pdf" });
    await page.getByRole("group", { name: "Wrenfield-B again.pdf is already in this project" }).getByRole("button", { name: "Upload anyway (keep both)" }).click();
    await expect(page.getByText("2 sheets added.")).toHaveCount(2, { timeout: 60_000 });
    await expect(page.getByRole("heading", { name: "Wrenfield-B again.pdf" })).toBeVisible();
  });

  await test.step("an empty file is refused at once, with no NaN%", async () => {
    await page.locator('input[type="file"]').setInputFiles({ name: "empty.pdf", mimeType: "application/pdf", buffer: Buffer.alloc(0) });
    await expect(page.getByText("empty.pdf is empty (0 bytes): there is nothing to upload.")).toBeVisible();
    await expect(page.getByText(/NaN/)).toHaveCount(0);
  });
});
