import { expect, type Page } from "@playwright/test";

// Lower-case base 36: e-mails are stored lower-cased, so the outbox shows them exactly as written here.
export const runId = () => `${Date.now().toString(36)}${Math.floor(Math.random() * 1296).toString(36)}`;

/** Every browser dialog is recorded (and dismissed): injected markup that ran `alert()` would show up here. */
export function recordDialogs(page: Page): string[] {
  const seen: string[] = [];
  page.on("dialog", (dialog) => {
    seen.push(`${dialog.type()}: ${dialog.message()}`);
    void dialog.dismiss();
  });
  return seen;
}

/** A page that threw while rendering shows the framework's or our error page; either way it is recorded here. */
export function recordPageErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on("pageerror", (e) => errors.push(e.message));
  return errors;
}

export async function signOut(page: Page) {
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/\/sign-in(\?|$)/);
  await expect(page.getByRole("heading", { name: "Sign in" })).toBeVisible();
}

export async function signIn(page: Page, email: string, password: string) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}

/**
 * Follows the invitation e-mail the way a person would: the demo outbox, the message addressed to
 * them (the outbox outlives a test run, so the address must be unique), its link, then the join form.
 */
export async function acceptInviteFromOutbox(
  page: Page,
  invite: { email: string; name: string; password: string; roleLabel: string; orgName: string },
) {
  await page.goto("/demo/outbox");
  await expect(page.getByRole("heading", { name: "Demo outbox" })).toBeVisible();
  const message = page.getByTestId("outbox-message").filter({ hasText: invite.email }).first();
  await expect(message).toContainText(`invited you to ${invite.orgName} on Miterwise`);
  await expect(message).toContainText(`as ${invite.roleLabel}.`);
  await message.getByRole("link", { name: /\/invite\// }).click();

  await expect(page.getByRole("heading", { name: `Join ${invite.orgName}` })).toBeVisible();
  await expect(page.getByText(`You were invited as ${invite.roleLabel} with the e-mail ${invite.email}.`)).toBeVisible();
  await page.getByLabel("Your name").fill(invite.name);
  await page.getByLabel("Choose a password").fill(invite.password);
  await page.getByRole("button", { name: "Join" }).click();
}

/** The header's organisation switcher names the org and the caller's role in it. */
export async function expectSignedInAs(page: Page, who: { name: string; orgName: string; roleLabel: string }) {
  const switcher = page.getByLabel("Switch organisation");
  await expect(switcher).toContainText(who.orgName);
  await expect(switcher).toContainText(who.roleLabel);
  await expect(page.getByRole("banner").getByText(who.name, { exact: true })).toBeVisible();
}

/** From anywhere in an organisation: the header's Projects link, then the project's row. */
export async function openProject(page: Page, projectName: string) {
  await page.getByRole("banner").getByRole("link", { name: "Projects", exact: true }).click();
  await page.getByRole("table").getByRole("link", { name: projectName }).click();
  await expect(page.getByRole("navigation", { name: "Project sections" })).toBeVisible();
}

/** One of the project's section tabs: Overview, Plans, Window list, Takeoffs. */
export async function openProjectSection(page: Page, section: "Overview" | "Plans" | "Window list" | "Takeoffs") {
  await page.getByRole("navigation", { name: "Project sections" }).getByRole("link", { name: section, exact: true }).click();
  await expect(page.getByRole("navigation", { name: "Project sections" }).getByRole("link", { name: section, exact: true })).toHaveAttribute("aria-current", "page");
}

/** Plans tab, then the sheet's own link in the list (its label). */
export async function openSheetFromPlans(page: Page, label: string) {
  await openProjectSection(page, "Plans");
  await page.getByRole("main").getByRole("link", { name: label, exact: true }).click();
}

/** A link of the header's main navigation (Projects, Price books, Compare, Members, Settings). */
export async function openNav(page: Page, name: string) {
  await page.getByRole("banner").getByRole("navigation", { name: "Main" }).getByRole("link", { name, exact: true }).click();
}
