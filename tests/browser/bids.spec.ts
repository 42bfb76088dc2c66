/**
 * Plans become a bid: an admin changes a price, an estimator runs two takeoffs with different casing, a
 * project manager compares them, marks one as the submitted bid (which locks it), downloads the material
 * order and the bid PDF (its text checked), and e-mails it — the message is in the outbox.
 */
import { readFile } from "node:fs/promises";
import { expect, test, type Page } from "@playwright/test";
import { seedBidWorld } from "./bid-world";
import { openNav, openProject, openProjectSection, runId, signIn, signOut } from "./helpers";

const id = runId();

async function pdfText(path: string) {
  const pdfjs = await import("pdfjs-dist/legacy/build/pdf.mjs");
  const doc = await pdfjs.getDocument({ data: new Uint8Array(await readFile(path)), isEvalSupported: false, standardFontDataUrl: "node_modules/pdfjs-dist/standard_fonts/" }).promise;
  const content = await (await doc.getPage(1)).getTextContent();
  return content.items.map((i) => ("str" in i ? i.str : "")).join(" ");
}

/** From inside the project: the Takeoffs tab, then the run form. */
async function runTakeoff(page: Page, name: string, casing: RegExp | null) {
  await openProjectSection(page, "Takeoffs");
  await page.getByLabel("Name", { exact: true }).fill(name);
  if (casing) {
    const select = page.getByLabel("Alternate casing (optional)");
    const value = await select.locator("option", { hasText: casing }).first().getAttribute("value");
    await select.selectOption(value!);
  }
  await page.getByRole("button", { name: "Run takeoff" }).click();
  await expect(page).toHaveURL(/\/takeoffs\/[0-9a-f-]{36}$/, { timeout: 60_000 });
  await expect(page.getByRole("heading", { name: "Per opening type" })).toBeVisible();
  return page.url().split("/").pop()!;
}

test("price change, two takeoffs, compare, lock, documents, send", async ({ page }) => {
  test.setTimeout(300_000);
  const world = await seedBidWorld(id);

  await test.step("the admin changes a price in the price book", async () => {
    await signIn(page, world.admin.email, world.password);
    await expect(page).toHaveURL(/\/projects$/);
    await world.editPriceThroughUi(page);
    await signOut(page);
  });

  let baseId = "";
  let altId = "";
  await test.step("the estimator runs a base bid and an alternate in poplar casing", async () => {
    await signIn(page, world.estimator.email, world.password);
    await expect(page).toHaveURL(/\/projects$/);
    await openProject(page, world.projectName);
    baseId = await runTakeoff(page, "Base bid", null);
    altId = await runTakeoff(page, "Alternate — poplar casing", /poplar/i);
    await signOut(page);
  });

  await test.step("the project manager compares them and sees why they differ", async () => {
    await signIn(page, world.manager.email, world.password);
    await expect(page).toHaveURL(/\/projects$/);
    await openNav(page, "Compare");
    for (const name of ["Base bid", "Alternate — poplar casing"]) await page.getByRole("checkbox", { name: new RegExp(`^${name}`) }).check();
    await page.getByRole("button", { name: "Compare", exact: true }).click();
    await expect(page).toHaveURL(new RegExp(`ids=${baseId}.*ids=${altId}|ids=${altId}.*ids=${baseId}`));
    await expect(page.getByRole("heading", { name: "Side by side" })).toBeVisible();
    // The picker lists takeoffs newest first, so the alternate is the first column and the base is compared with it.
    await expect(page.getByText(/Alternate casing: .*poplar.* → each window's own|Alternate casing: each window's own → .*poplar/i)).toBeVisible();
    await expect(page.getByRole("row", { name: /Bid total/ })).toContainText(/[▲▼]/);
  });

  await test.step("marks the base bid as submitted, which locks it", async () => {
    await openProject(page, world.projectName);
    await openProjectSection(page, "Takeoffs");
    await page.getByRole("main").getByRole("link", { name: "Base bid", exact: true }).click();
    await expect(page).toHaveURL(new RegExp(`/takeoffs/${baseId}$`));
    page.once("dialog", (d) => void d.accept());
    await page.getByRole("button", { name: "Mark as submitted bid" }).click();
    await expect(page.getByText("Submitted bid — locked")).toBeVisible();
    const rename = await page.request.patch(`/api/orgs/${world.orgSlug}/projects/${world.projectId}/takeoffs/${baseId}`, { data: { name: "Changed" } });
    expect(rename.status()).toBe(403); // a project manager never renames; estimators get 409 "locked" (integration tests)
  });

  await test.step("downloads the material order and the bid PDF", async () => {
    const [csv] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Material order (CSV)" }).click()]);
    const text = await readFile((await csv.path())!, "utf8");
    expect(text.split("\r\n")[0]).toBe("material,item,supplier_code,rip_width,stock_length,boards_planned,boards_to_buy,unit_price,extended,rip_layout");
    expect(text).toContain("DEMO-C250-FJ");
    const [pdf] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Bid summary (PDF)" }).click()]);
    const body = await pdfText((await pdf.path())!);
    for (const expected of [world.orgName, world.projectName, "Fenwick & Hale Builders", "Exclusions", "Assumptions", "Valid until", "Bid total"]) {
      expect(body).toContain(expected);
    }
  });

  await test.step("the crew cut list: by unit type, with the cautions first", async () => {
    await page.getByRole("link", { name: "Crew cut list (print)" }).click();
    await expect(page.getByRole("complementary", { name: "Safety", exact: true })).toContainText("eye and hearing protection");
    await expect(page.getByRole("heading", { name: /^Type A/ })).toBeVisible();
    await expect(page.getByRole("heading", { name: /^W1 · 3'-0" × 5'-0"/ }).first()).toBeVisible();
    await page.goBack();
  });

  await test.step("e-mails the bid; the message and its record are there", async () => {
    const to = `estimating.${id}@fenwick-hale.test`;
    await page.getByLabel("E-mail the bid to").fill(to);
    await page.getByRole("button", { name: "Send bid" }).click();
    await expect(page.getByText(`Sent to ${to}.`)).toBeVisible();
    await expect(page.getByRole("list", { name: "Bid e-mails sent" })).toContainText(to);
    await page.goto("/demo/outbox");
    const message = page.getByTestId("outbox-message").filter({ hasText: to }).first();
    await expect(message).toContainText(`Window trim bid — ${world.projectName}`);
  });
});
