/**
 * The two tables edited in place, reached by clicks: the window list and a price book's items. Enter
 * and leaving a cell save; Escape cancels and saves nothing; a refused value keeps the editor open with
 * what was typed and the message under the cell (the browser's check and the server's); someone else's
 * save in between (409) shows the server's current row and says so.
 */
import { expect, test, type Locator, type Page } from "@playwright/test";
import { db } from "@/db/client";
import { memberships, users } from "@/db/schema";
import { addOpeningType as createOpeningType } from "@/lib/server/plans/opening-types";
import { createProject } from "@/lib/server/projects/projects";
import { signUp as signUpUser } from "@/lib/server/accounts/sign-up";
import { seedDemoPriceBook } from "@/scripts/seed/demo-price-book";
import { hashPassword } from "@/lib/auth/password";
import { openNav, openProject, openProjectSection, runId, signIn } from "./helpers";

const id = runId();
const password = "coped-stool-7777";
const ITEM = "Casing 2 1/2 colonial — FJ pine";

/** A company (`tag` keeps each test's apart) with an admin and a project manager, who reads both tables. */
async function seed(tag: string) {
  const { user: admin, organisation } = await signUpUser({ name: "Reva Lindqvist", email: `reva.${tag}.${id}@lindqvist-trim.test`, password, organisationName: `Lindqvist Trim ${tag} ${id}` });
  const [manager] = await db.insert(users).values({ name: "Oskar Brandt", email: `oskar.${tag}.${id}@lindqvist-trim.test`, passwordHash: await hashPassword(password) }).returning();
  await db.insert(memberships).values({ orgId: organisation.id, userId: manager!.id, role: "project_manager" });
  const projectName = `Birchmoor Lofts ${tag} ${id}`;
  const project = await createProject({ orgId: organisation.id, userId: admin.id, input: { name: projectName } });
  const scope = { orgId: organisation.id, projectId: project.id, userId: admin.id };
  await createOpeningType(scope, { mark: "W1", width: 36, height: 60, setback: 0.5 });
  await createOpeningType(scope, { mark: "W2", width: 30, height: 48, setback: 0.5 });
  await seedDemoPriceBook(organisation.id, admin.id);
  // The pool stays open: later spec files in this worker seed through it too.
  return { email: admin.email, managerEmail: manager!.email, slug: organisation.slug, projectName, projectId: project.id };
}

/** The cell's button (shown value) and, once open, its editor field. */
const cell = (page: Page, label: string) => ({
  button: page.getByRole("button", { name: new RegExp(`^${label.replace(/[.*+?^${}()|[\]\\/]/g, "\\$&")}: `) }),
  field: page.getByLabel(label, { exact: true }),
});

/** The message box under an open editor: named by the field, inside the same table cell, and not spilling out of its box. */
async function expectFieldError(page: Page, field: Locator, text: RegExp) {
  await expect(field).toHaveAttribute("aria-invalid", "true");
  const box = page.locator(`[id="${await field.getAttribute("aria-describedby")}"]`);
  await expect(box).toHaveRole("alert");
  await expect(box).toContainText(text);
  await expect(page.getByRole("cell").filter({ has: field }).getByRole("alert")).toHaveCount(1);
  expect(await box.evaluate((el) => el.scrollWidth <= el.clientWidth)).toBe(true);
}

test("window list and price book cells: save, Escape, field errors, someone else's save", async ({ page }) => {
  test.setTimeout(180_000);
  const world = await seed("edit");
  const api = (path: string) => `/api/orgs/${world.slug}/${path}`;
  const w1 = async () => {
    const { openingTypes } = await (await page.request.get(api(`projects/${world.projectId}/opening-types`))).json();
    return openingTypes.find((t: { mark: string }) => t.mark === "W1") as { id: string; version: number; width: number; notes: string | null };
  };

  await signIn(page, world.email, password);
  await expect(page).toHaveURL(/\/projects$/);
  await openProject(page, world.projectName);
  await openProjectSection(page, "Window list");

  const width = cell(page, "Width of W1");
  await test.step("window list: a value the browser refuses keeps the editor and says why under the cell", async () => {
    await expect(width.button).toHaveAccessibleName(`Width of W1: 3'-0". Edit`);
    await width.button.click();
    await width.field.fill("wide");
    await width.field.press("Enter");
    await expectFieldError(page, width.field, /Width: write a length such as/);
    await expect(width.field).toHaveValue("wide");
  });

  await test.step("window list: Escape closes the editor and saves nothing", async () => {
    const before = await w1();
    await width.field.press("Escape");
    await expect(width.field).toHaveCount(0);
    await expect(width.button).toHaveAccessibleName(`Width of W1: 3'-0". Edit`);
    await expect(page.getByRole("alert").filter({ hasText: "Width:" })).toHaveCount(0);
    expect(await w1()).toEqual(before);
  });

  await test.step("window list: Enter saves", async () => {
    await width.button.click();
    await width.field.fill("40");
    await width.field.press("Enter");
    await expect(width.button).toHaveAccessibleName(`Width of W1: 3'-4". Edit`);
    expect((await w1()).width).toBe(40);
  });

  await test.step("window list: the server's refusal (a mark already used) shows under the cell", async () => {
    const mark = cell(page, "Mark of W1");
    await mark.button.click();
    await mark.field.fill("W2");
    await mark.field.press("Enter");
    await expectFieldError(page, mark.field, /Mark already used in this project/);
    await mark.field.press("Escape");
    await expect(mark.button).toHaveAccessibleName("Mark of W1: W1. Edit");
  });

  const notes = cell(page, "Notes of W1");
  await test.step("window list: leaving the cell saves", async () => {
    await notes.button.click();
    await notes.field.fill("Kitchen");
    await page.getByRole("heading", { name: "Window list", level: 1 }).click();
    await expect(notes.button).toHaveAccessibleName("Notes of W1: Kitchen. Edit");
    expect((await w1()).notes).toBe("Kitchen");
  });

  await test.step("window list: someone else's save in between shows their row and says so", async () => {
    const { id: typeId, version } = await w1();
    const theirs = await page.request.patch(api(`projects/${world.projectId}/opening-types/${typeId}`), { data: { version, notes: "Changed in the office" } });
    expect(theirs.status()).toBe(200);
    const height = cell(page, "Height of W1");
    await height.button.click();
    await height.field.fill("62");
    await height.field.press("Enter");
    const notice = page.getByRole("alert").filter({ hasText: /^⚠ W1: Someone else changed this since you loaded it/ });
    await expect(notice).toBeVisible();
    await expect(notes.button).toHaveAccessibleName("Notes of W1: Changed in the office. Edit");
    await expect(height.button).toHaveAccessibleName(`Height of W1: 5'-0". Edit`);
    await notice.getByRole("button", { name: "Dismiss" }).click();
    await expect(notice).toHaveCount(0);
  });

  await openNav(page, "Price books");
  await page.getByRole("link", { name: /Alder Bend Millwork/ }).click();
  await expect(page).toHaveURL(/\/price-books\/[0-9a-f-]{36}$/);
  const bookId = new URL(page.url()).pathname.split("/").pop()!;
  const item = async () => {
    const { priceBook } = await (await page.request.get(api(`price-books/${bookId}`))).json();
    return priceBook.items.find((i: { name: string }) => i.name === ITEM) as { id: string; version: number; species: string; stock: { length: number; price: number }[] };
  };

  const price = cell(page, `12' price of ${ITEM}`);
  await test.step("price book: a price the browser refuses keeps the editor; Escape then saves nothing", async () => {
    const before = await item();
    const shown = await price.button.getAttribute("aria-label");
    await price.button.click();
    const field = page.getByLabel(`12' price of ${ITEM} (dollars; empty to stop selling this length)`);
    await field.fill("lots");
    await field.press("Enter");
    await expectFieldError(page, field, /Price: write a number/);
    await field.press("Escape");
    await expect(field).toHaveCount(0);
    await expect(price.button).toHaveAttribute("aria-label", shown!);
    expect(await item()).toEqual(before);
  });

  await test.step("price book: leaving a price cell saves it", async () => {
    await price.button.click();
    await page.getByLabel(`12' price of ${ITEM} (dollars; empty to stop selling this length)`).fill("11.25");
    await page.getByRole("heading", { level: 1 }).click();
    await expect(price.button).toHaveAccessibleName(`12' price of ${ITEM}: $11.25. Edit`);
    expect((await item()).stock.find((s) => s.length === 144)?.price).toBe(11.25);
  });

  await test.step("price book: someone else's save in between shows their item and says so", async () => {
    const { id: itemId, version } = await item();
    const theirs = await page.request.patch(api(`price-books/${bookId}/items/${itemId}`), { data: { version, species: "Primed FJ pine" } });
    expect(theirs.status()).toBe(200);
    const face = cell(page, `Face of ${ITEM}`);
    await face.button.click();
    await face.field.fill("2 5/8");
    await face.field.press("Enter");
    const notice = page.getByRole("alert").filter({ hasText: new RegExp(`^⚠ ${ITEM}: Someone else changed this since you loaded it`) });
    await expect(notice).toBeVisible();
    await expect(cell(page, `Species / finish of ${ITEM}`).button).toHaveAccessibleName(`Species / finish of ${ITEM}: Primed FJ pine. Edit`);
    await expect(face.button).toHaveAccessibleName(new RegExp(`^Face of ${ITEM}: 2 1/2"?\\. Edit$`));
  });

  await test.step("price book: the text filter and the kind choice narrow the list, and say so", async () => {
    const status = page.getByRole("status").filter({ hasText: /^Showing/ });
    // The filter bar is the innermost block holding the count (the new-item form has a Kind field too).
    const bar = page.locator("div").filter({ has: status }).last();
    await expect(status).toHaveText("Showing 10 of 10");
    await bar.getByRole("searchbox", { name: /^Filter/ }).fill("c250-fj");
    await expect(status).toHaveText("Showing 1 of 10");
    await expect(price.button).toBeVisible();
    await bar.getByRole("combobox", { name: /^Kind/ }).selectOption({ label: "Stool" });
    await expect(status).toHaveText("Showing 0 of 10");
    await expect(page.getByRole("cell", { name: "No items match the filter." })).toBeVisible();
    await bar.getByRole("searchbox", { name: /^Filter/ }).fill("");
    await expect(status).toHaveText("Showing 1 of 10");
    await expect(page.getByRole("button", { name: /^Name of Stool 5 1\/4 bullnose/ })).toBeVisible();
    await bar.getByRole("combobox", { name: /^Kind/ }).selectOption({ label: "All kinds" });
    await expect(status).toHaveText("Showing 10 of 10");
  });
});

test("a reader sees both tables without edit or delete buttons, empty and default values said in words", async ({ page }) => {
  test.setTimeout(120_000);
  const world = await seed("read");
  await signIn(page, world.managerEmail, password);
  await expect(page).toHaveURL(/\/projects$/);
  await openProject(page, world.projectName);
  await openProjectSection(page, "Window list");
  const w2 = page.getByRole("row").filter({ hasText: /^W2/ });
  await expect(w2).toBeVisible();
  await expect(w2).toContainText("(default)");
  // The empty notes cell: a dash to the eye, "none" to a screen reader.
  await expect(w2.getByRole("cell").filter({ hasText: /^—none$/ })).toHaveCount(1);
  await expect(page.getByRole("button", { name: /\. Edit$/ })).toHaveCount(0);
  await expect(page.getByRole("button", { name: /^Delete / })).toHaveCount(0);
  await expect(page.getByRole("columnheader", { name: "Actions" })).toHaveCount(0);
  await expect(page.getByText("Your role can read the window list; estimators and admins edit it.")).toBeVisible();

  await openNav(page, "Price books");
  await page.getByRole("link", { name: /Alder Bend Millwork/ }).click();
  await expect(page.getByRole("row").filter({ hasText: ITEM })).toBeVisible();
  await expect(page.getByRole("button", { name: /\. Edit$/ })).toHaveCount(0);
  await expect(page.getByRole("button", { name: /^Delete / })).toHaveCount(0);
  await expect(page.getByRole("columnheader", { name: "Actions" })).toHaveCount(0);
  await expect(page.getByRole("status").filter({ hasText: /^Showing/ })).toHaveText("Showing 10 of 10");
});
