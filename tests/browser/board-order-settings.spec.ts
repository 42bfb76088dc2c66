/**
 * The board-order settings on the Settings page, reached by clicks: an admin sets a rip kerf and a
 * board-order time limit, a wrong time limit is named, both are kept after a reload, and a blank rip kerf
 * goes back to the saw kerf. An estimator sees them and cannot change them.
 */
import { expect, test } from "@playwright/test";
import { db } from "@/db/client";
import { memberships, users } from "@/db/schema";
import { signUp as signUpUser } from "@/lib/server/accounts/sign-up";
import { hashPassword } from "@/lib/auth/password";
import { openNav, recordPageErrors, runId, signIn, signOut } from "./helpers";

const id = runId();
const password = "rip-fence-4242";

test("an admin's rip kerf and board-order time limit are kept; an estimator only reads them", async ({ page }) => {
  test.setTimeout(120_000);
  const errors = recordPageErrors(page);
  const { user: admin, organisation } = await signUpUser({ name: "Tove Ekdahl", email: `tove.${id}@ekdahl-trim.test`, password, organisationName: `Ekdahl Trim ${id}` });
  const [estimator] = await db.insert(users).values({ name: "Pim Varga", email: `pim.${id}@ekdahl-trim.test`, passwordHash: await hashPassword(password) }).returning();
  await db.insert(memberships).values({ orgId: organisation.id, userId: estimator!.id, role: "estimator" });
  const stored = async () => (await (await page.request.get(`/api/orgs/${organisation.slug}/settings`)).json()).settings as { ripKerf: number | null; planSeconds: number };

  await signIn(page, admin.email, password);
  await expect(page).toHaveURL(/\/projects$/);
  const ripKerf = page.getByLabel("Rip kerf");
  const limit = page.getByLabel("Board-order time limit (seconds)");
  const saveButton = page.getByRole("button", { name: "Save settings" });
  /** Saves and waits for the server's answer, so an earlier "Saved." on screen is never taken for this one. */
  const save = async () => {
    const answered = page.waitForResponse((r) => r.url().endsWith(`/api/orgs/${organisation.slug}/settings`) && r.request().method() === "PATCH");
    await saveButton.click();
    expect((await answered).status()).toBe(200);
    await expect(page.getByText(/^Saved\./)).toBeVisible();
  };

  await test.step("until set: rips take the saw kerf and the limit is 2 s, with the hint saying what longer buys", async () => {
    await openNav(page, "Settings");
    await expect(ripKerf).toHaveValue("");
    await expect(ripKerf).toHaveAttribute("placeholder", "Saw kerf (1/8)");
    await expect(limit).toHaveValue("2");
    await expect(page.getByText(/On large jobs a longer limit can find cheaper orders/)).toBeVisible();
  });

  await test.step("a time limit out of range is named and nothing is saved", async () => {
    await ripKerf.fill("3/32");
    await limit.fill("90");
    await saveButton.click();
    await expect(page.getByText("⚠ Board-order time limit must be at most 60 seconds.")).toBeVisible();
    await expect(limit).toHaveAttribute("aria-invalid", "true");
    expect(await stored()).toEqual(expect.objectContaining({ ripKerf: null, planSeconds: 2 }));
  });

  await test.step("set, saved, and still there after a reload", async () => {
    await limit.fill("7.5");
    await save();
    await page.reload();
    await expect(ripKerf).toHaveValue("3/32");
    await expect(limit).toHaveValue("7.5");
    expect(await stored()).toEqual(expect.objectContaining({ ripKerf: 3 / 32, planSeconds: 7.5 }));
  });

  await test.step("an untouched save keeps them; a blank rip kerf goes back to the saw kerf", async () => {
    await save();
    expect(await stored()).toEqual(expect.objectContaining({ ripKerf: 3 / 32, planSeconds: 7.5 }));
    await ripKerf.fill("");
    await save();
    await openNav(page, "Projects");
    await openNav(page, "Settings");
    await expect(ripKerf).toHaveValue("");
    await expect(limit).toHaveValue("7.5");
    expect(await stored()).toEqual(expect.objectContaining({ ripKerf: null, planSeconds: 7.5 }));
  });
  await signOut(page);

  await test.step("an estimator sees the limit but cannot change it", async () => {
    await signIn(page, estimator!.email, password);
    await expect(page).toHaveURL(/\/projects$/);
    await openNav(page, "Settings");
    await expect(limit).toHaveValue("7.5");
    await expect(limit).toBeDisabled();
    await expect(ripKerf).toBeDisabled();
    await expect(page.getByText("Only admins change these.")).toBeVisible();
  });
  expect(errors).toEqual([]);
});
