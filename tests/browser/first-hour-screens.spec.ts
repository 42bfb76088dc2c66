/**
 * Screens of the first hour, moved through by clicks: price-book row buttons within reach on a 1366 px
 * screen with seven stock lengths, every wrong settings field named at once and a 3/32" kerf kept,
 * takeoffs renamed and deleted from their list, invitations that keep the chosen role and say what
 * they replace, compare with one takeoff ticked, and read-only fields that look read-only.
 */
import { and, eq } from "drizzle-orm";
import { expect, test } from "@playwright/test";
import { db } from "@/db/client";
import { priceBooks } from "@/db/schema";
import { createPriceBookItem } from "@/lib/server/price-books/items";
import { runTakeoff } from "@/lib/server/takeoffs/run-takeoff";
import { priceBookItemCreateSchema } from "@/lib/validators/price-books";
import { seedBidWorld } from "./bid-world";
import { runId, signIn, signOut } from "./helpers";

const id = runId();
const WIDE_ITEM = "Casing 2 1/4 ranch — seven lengths";

test.use({ viewport: { width: 1366, height: 800 } });

test("first-hour screens", async ({ page }) => {
  test.setTimeout(300_000);
  const world = await seedBidWorld(id, async (w) => {
    const [book] = await db.select({ id: priceBooks.id }).from(priceBooks).where(and(eq(priceBooks.orgId, w.orgId)));
    const stock = ["7'", "8'", "10'", "12'", "14'", "16'", "18'"].map((length, i) => ({ length, price: String(8 + i * 2) }));
    const input = priceBookItemCreateSchema.parse({ name: WIDE_ITEM, kind: "casing", faceWidth: "2 1/4", thickness: "11/16", species: "Poplar", supplierCode: `R-${id}`, stock });
    await createPriceBookItem({ orgId: w.orgId, userId: w.adminId, priceBookId: book!.id }, input);
    const scope = { orgId: w.orgId, projectId: w.projectId, userId: w.estimatorId };
    await runTakeoff(scope, { name: "Base bid", priceBookId: book!.id });
    await runTakeoff(scope, { name: "Alternate", priceBookId: book!.id });
  });
  const nav = page.getByRole("banner").getByRole("navigation");

  await signIn(page, world.admin.email, world.password);
  await expect(page).toHaveURL(/\/projects$/);

  await test.step("price book: with seven length columns the row's delete button is on screen at 1366 px", async () => {
    await nav.getByRole("link", { name: "Price books" }).click();
    await page.getByRole("link", { name: /Alder Bend Millwork/ }).click();
    await expect(page.getByRole("columnheader", { name: "18'" })).toBeVisible();
    const button = page.getByRole("button", { name: `Delete ${WIDE_ITEM}` });
    // The table is wider than its frame at this width, so without pinning the button would sit off to the right.
    const scroller = page.locator("table", { has: page.getByRole("columnheader", { name: "18'" }) }).locator("xpath=..");
    const { scrollWidth, clientWidth } = await scroller.evaluate((el) => ({ scrollWidth: el.scrollWidth, clientWidth: el.clientWidth }));
    expect(scrollWidth).toBeGreaterThan(clientWidth);
    // Scroll the page (not the table) down to the row, then the whole button must be in view.
    const box = (await button.boundingBox())!;
    await page.evaluate((y) => window.scrollBy(0, y - 300), box.y);
    await expect(button).toBeInViewport({ ratio: 1 });
  });

  await test.step("price book: a stock length added without a price says it is not kept", async () => {
    await page.getByLabel("Add a stock length column").fill("20'");
    await page.getByRole("button", { name: "Add column" }).click();
    await expect(page.getByText(/20' is a new column with no prices yet: a column is kept only once an item has a price in it/)).toBeVisible();
  });

  await test.step("price book: a Windows-1252 CSV with metric sizes imports its accents and says how it was read", async () => {
    const csv = `name,kind,face_width,thickness,species,supplier_code,price 8'\r\nCasing érable ${id},casing,64 mm,18 mm,Érable,E-${id},9.10\r\n`;
    await page.getByLabel("CSV file").setInputFiles({ name: "export.csv", mimeType: "text/csv", buffer: Buffer.from(csv, "latin1") });
    await expect(page.getByText(/Read as Windows-1252 \(Western European\) text/)).toBeVisible();
    await page.getByRole("button", { name: "Preview changes" }).click();
    await expect(page.getByText(`New item: 2 1/2" × 11/16", Érable · 8' $9.10 · code E-${id}`)).toBeVisible();
    await expect(page.getByText('ℹ Face width 64 mm read as 2 1/2" (rounded to the nearest 1/16").')).toBeVisible();
  });

  await test.step("settings: every wrong field is named at once", async () => {
    await nav.getByRole("link", { name: "Settings" }).click();
    await page.getByLabel("Casing width").fill("wide");
    await page.getByLabel("Saw kerf").fill("3/4");
    await page.getByLabel("Waste allowance (%)").fill("lots");
    await page.getByRole("button", { name: "Save settings" }).click();
    await expect(page.getByText("⚠ Write a length such as 2 1/2 or 11/16.")).toBeVisible();
    await expect(page.getByText("⚠ Kerf must be at most 1/2 in.")).toBeVisible();
    await expect(page.getByText("⚠ Waste allowance must be a number.")).toBeVisible();
    await expect(page.getByText(/3 fields need attention/)).toBeVisible();
  });

  await test.step("settings: a 3/32\" kerf is shown as 3/32\" and an untouched save keeps it", async () => {
    await nav.getByRole("link", { name: "Projects" }).click();
    await nav.getByRole("link", { name: "Settings" }).click();
    await page.getByLabel("Saw kerf").fill("3/32");
    await page.getByRole("button", { name: "Save settings" }).click();
    await expect(page.getByText(/^Saved\./)).toBeVisible();
    await nav.getByRole("link", { name: "Projects" }).click();
    await nav.getByRole("link", { name: "Settings" }).click();
    await expect(page.getByLabel("Saw kerf")).toHaveValue("3/32");
    await page.getByRole("button", { name: "Save settings" }).click();
    await expect(page.getByText(/^Saved\./)).toBeVisible();
    const stored = await (await page.request.get(`/api/orgs/${world.orgSlug}/settings`)).json();
    expect(stored.settings.kerf).toBe(0.09375);
  });

  await test.step("takeoffs: rename and delete a draft from the list", async () => {
    await nav.getByRole("link", { name: "Projects" }).click();
    await page.getByRole("link", { name: world.projectName }).click();
    await page.getByRole("navigation", { name: "Project sections" }).getByRole("link", { name: "Takeoffs" }).click();
    await page.getByRole("button", { name: "Rename Alternate" }).click();
    await page.getByLabel("New name for Alternate").fill("Alternate r2");
    await page.getByRole("button", { name: "Save", exact: true }).click();
    await expect(page.getByRole("link", { name: "Alternate r2" })).toBeVisible();

    page.once("dialog", (d) => void d.accept());
    await page.getByRole("button", { name: "Delete takeoff Base bid" }).click();
    await expect(page.getByRole("link", { name: "Base bid" })).toHaveCount(0);

    // Still so after leaving and coming back.
    await page.getByRole("navigation", { name: "Project sections" }).getByRole("link", { name: "Overview" }).click();
    await page.getByRole("navigation", { name: "Project sections" }).getByRole("link", { name: "Takeoffs" }).click();
    await expect(page.getByRole("link", { name: "Alternate r2" })).toBeVisible();
    await expect(page.getByRole("link", { name: "Base bid" })).toHaveCount(0);
  });

  await test.step("members: the role stays chosen after a send, and a second invitation says it replaces the first", async () => {
    await nav.getByRole("link", { name: "Members" }).click();
    const email = `again.${id}@harrowgate.test`;
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Role", { exact: true }).selectOption("project_manager");
    await page.getByRole("button", { name: "Send invitation" }).click();
    await expect(page.getByText(`Invitation sent to ${email}.`)).toBeVisible();
    await expect(page.getByLabel("Role", { exact: true })).toHaveValue("project_manager");
    await expect(page.getByLabel("E-mail")).toHaveValue("");

    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Role", { exact: true }).selectOption("admin");
    await page.getByRole("button", { name: "Send invitation" }).click();
    await expect(page.getByText(/It replaces the earlier invitation \(as project manager\), whose link no longer works\./)).toBeVisible();
  });
  await signOut(page);

  await test.step("compare: one takeoff ticked says to tick another", async () => {
    await signIn(page, world.manager.email, world.password);
    await expect(page).toHaveURL(/\/projects$/);
    await nav.getByRole("link", { name: "Compare" }).click();
    await page.getByLabel(/Alternate r2/).check();
    await page.getByRole("button", { name: "Compare" }).click();
    await expect(page.getByText("Tick at least one more takeoff to compare with it: a comparison needs two to four.")).toBeVisible();
  });

  await test.step("settings a project manager cannot change look disabled", async () => {
    await nav.getByRole("link", { name: "Settings" }).click();
    const kerf = page.getByLabel("Saw kerf");
    await expect(kerf).toBeDisabled();
    await expect(kerf).toHaveCSS("cursor", "not-allowed");
    await expect(kerf).toHaveCSS("border-top-style", "dashed");
  });
});
