/**
 * The path end to end, in one browser: an owner signs up, creates a project and invites an
 * estimator and a project manager; each follows the e-mailed link from the demo outbox, and each then
 * sees only what their role allows — and the API refuses what the screens hide.
 */
import { expect, test, type Page } from "@playwright/test";
import { acceptInviteFromOutbox, expectSignedInAs, recordDialogs, runId, signIn, signOut } from "./helpers";

const id = runId();
const orgName = "Alder Bend Finish Carpentry";
const owner = { name: "Marta Okonkwo", email: `marta.${id}@alderbend-trim.test`, password: "casing-and-stool-1" };
const estimator = { name: "Jonah Pell", email: `jonah.${id}@alderbend-trim.test`, password: "jamb-extension-22", roleLabel: "Estimator" };
const manager = { name: "Ruth Castellanos", email: `ruth.${id}@alderbend-trim.test`, password: "apron-return-333", roleLabel: "Project manager" };

const project = { name: `Millrace Lofts ${id}`, contractor: "Alder Bend Builders" };
// Stored and shown as text: neither the markup nor the SQL may do anything on the way through.
const hostileName = `<script>alert(1)</script>'; drop table projects;--`;

const projectsTable = (page: Page) => page.getByRole("table");

test("owner invites an estimator and a project manager; each sees only what the role allows", async ({ page, request }) => {
  // Five sign-ins, two invitations and a cold server on a shared machine: more than the default budget.
  test.setTimeout(240_000);
  const dialogs = recordDialogs(page);
  let slug = "";
  let projectId = "";

  await test.step("owner signs up and lands in the new organisation", async () => {
    await page.goto("/sign-up");
    await page.getByLabel("Your name").fill(owner.name);
    await page.getByLabel("Company name").fill(orgName);
    await page.getByLabel("E-mail").fill(owner.email);
    await page.getByLabel("Password").fill(owner.password);
    await page.getByRole("button", { name: "Create account" }).click();
    await expect(page).toHaveURL(/\/alder-bend-finish-carpentry[a-z0-9-]*\/projects$/);
    slug = new URL(page.url()).pathname.split("/")[1]!;
    await expectSignedInAs(page, { name: owner.name, orgName, roleLabel: "Admin" });
    await expect(page.getByText("No projects yet. Create the first one.")).toBeVisible();
  });

  await test.step("a new project without a name is refused beside the field, and nothing is created", async () => {
    await page.getByRole("button", { name: "Create project" }).click();
    await expect(page.getByRole("alert").filter({ hasText: "Some fields need attention." })).toBeVisible();
    await expect(page.getByText("Project name is required.")).toBeVisible();
    await expect(page.getByLabel("Project name")).toHaveAttribute("aria-invalid", "true");
    await expect(page.getByText("No projects yet. Create the first one.")).toBeVisible();
  });

  await test.step("owner creates a project through the New project form", async () => {
    await expect(page.getByRole("heading", { name: "New project" })).toBeVisible();
    await page.getByLabel("Project name").fill(project.name);
    await page.getByLabel("General contractor").fill(project.contractor);
    await page.getByRole("button", { name: "Create project" }).click();
    await expect(page.getByRole("status")).toHaveText(`Created “${project.name}”.`);
    // The refusal's messages went with the answer that replaced it.
    await expect(page.getByText("Project name is required.")).toHaveCount(0);
    const row = projectsTable(page).getByRole("row").filter({ hasText: project.name });
    await expect(row).toContainText(project.contractor);
    await expect(row).toContainText("Draft");
    const href = await row.getByRole("link", { name: project.name }).getAttribute("href");
    projectId = href!.split("/").pop()!;
    expect(projectId).toMatch(/^[0-9a-f-]{36}$/);
  });

  await test.step("a name full of markup and SQL is stored and shown literally", async () => {
    await page.getByLabel("Project name").fill(hostileName);
    await page.getByRole("button", { name: "Create project" }).click();
    await expect(page.getByRole("status")).toHaveText(`Created “${hostileName}”.`);
    const link = projectsTable(page).getByRole("link", { name: hostileName, exact: true });
    await expect(link).toHaveText(hostileName);
    // The "drop table" reached PostgreSQL as a value only: the first project is still listed.
    await expect(projectsTable(page).getByRole("link", { name: project.name })).toBeVisible();
    await expect(page.locator("main script")).toHaveCount(0);

    await link.click();
    await expect(page.getByRole("heading", { level: 1 })).toContainText(hostileName);
    await expect(page.getByLabel("Project name")).toHaveValue(hostileName);
    expect(dialogs).toEqual([]);
  });

  await test.step("owner invites an estimator and a project manager", async () => {
    await page.getByRole("link", { name: "Members" }).click();
    await expect(page.getByRole("heading", { name: "Invite someone" })).toBeVisible();
    const invite = async (email: string, role: string) => {
      await page.getByLabel("E-mail").fill(email);
      await page.getByLabel("Role", { exact: true }).selectOption(role);
      await page.getByRole("button", { name: "Send invitation" }).click();
      await expect(page.getByRole("status")).toHaveText(`Invitation sent to ${email}.`);
    };
    await invite(estimator.email, "estimator");
    await invite(manager.email, "project_manager");
    const pending = page.locator("section").filter({ has: page.getByRole("heading", { name: "Pending invitations" }) });
    await expect(pending).toContainText(`${estimator.email} · Estimator`);
    await expect(pending).toContainText(`${manager.email} · Project manager`);
    await signOut(page);
  });

  await test.step("estimator joins from the e-mailed link", async () => {
    await acceptInviteFromOutbox(page, { ...estimator, orgName });
    await expect(page).toHaveURL(`/${slug}/projects`);
    await expectSignedInAs(page, { name: estimator.name, orgName, roleLabel: "Estimator" });
  });

  await test.step("estimator works on projects but cannot manage members", async () => {
    await expect(projectsTable(page).getByRole("link", { name: project.name })).toBeVisible();
    await expect(page.getByRole("heading", { name: "New project" })).toBeVisible();
    await expect(page.getByRole("button", { name: "Create project" })).toBeEnabled();

    await projectsTable(page).getByRole("link", { name: project.name }).click();
    await expect(page.getByRole("button", { name: "Save changes" })).toBeVisible();
    await expect(page.getByRole("button", { name: "Archive project" })).toBeVisible();

    await page.getByRole("link", { name: "Members" }).click();
    const members = page.getByRole("table");
    await expect(members.getByRole("row").filter({ hasText: owner.email })).toContainText("Admin");
    await expect(members.getByRole("row").filter({ hasText: estimator.email })).toContainText("(you)");
    await expect(page.getByText("Only admins invite people and change roles.")).toBeVisible();
    await expect(page.getByRole("heading", { name: "Invite someone" })).toHaveCount(0);
    await expect(page.getByRole("heading", { name: "Pending invitations" })).toHaveCount(0);
    await expect(page.getByRole("combobox")).toHaveCount(0);
    await expect(page.getByRole("button", { name: "Remove" })).toHaveCount(0);
    await signOut(page);
  });

  await test.step("project manager joins from the e-mailed link, then signs in explicitly", async () => {
    await acceptInviteFromOutbox(page, { ...manager, orgName });
    await expect(page).toHaveURL(`/${slug}/projects`);
    await signOut(page);

    await signIn(page, manager.email, "not-the-password");
    // Next.js keeps an empty role="alert" route announcer on every page, hence the filter.
    await expect(page.getByRole("alert").filter({ hasText: "Wrong e-mail or password." })).toBeVisible();
    await expect(page).toHaveURL(/\/sign-in$/);

    await signIn(page, manager.email, manager.password);
    await expect(page).toHaveURL(`/${slug}/projects`);
    await expectSignedInAs(page, { name: manager.name, orgName, roleLabel: "Project manager" });
  });

  await test.step("project manager reads but sees no write controls", async () => {
    await expect(projectsTable(page).getByRole("link", { name: project.name })).toBeVisible();
    await expect(page.getByRole("heading", { name: "New project" })).toHaveCount(0);
    await expect(page.getByRole("button", { name: "Create project" })).toHaveCount(0);

    await projectsTable(page).getByRole("link", { name: project.name }).click();
    await expect(page.getByRole("heading", { level: 1 })).toContainText(project.name);
    await expect(page.getByText(project.contractor)).toBeVisible();
    await expect(page.getByText("Your role can read this project; estimators and admins edit it.")).toBeVisible();
    await expect(page.getByRole("button", { name: "Save changes" })).toHaveCount(0);
    await expect(page.getByRole("button", { name: /archive/i })).toHaveCount(0);
    await expect(page.getByRole("textbox")).toHaveCount(0);

    await page.getByRole("link", { name: "Members" }).click();
    await expect(page.getByRole("table").getByRole("row").filter({ hasText: manager.email })).toContainText("Project manager");
    await expect(page.getByRole("heading", { name: "Invite someone" })).toHaveCount(0);
    await expect(page.getByRole("combobox")).toHaveCount(0);
    await expect(page.getByRole("button", { name: "Remove" })).toHaveCount(0);
  });

  await test.step("the API refuses the project manager's writes and nothing changes", async () => {
    // page.request carries the browser's session cookie, so these are the PM's own calls.
    const api = page.request;
    const list = `/api/orgs/${slug}/projects?archived=include`;
    const before = await (await api.get(list)).json();

    const create = await api.post(`/api/orgs/${slug}/projects`, { data: { name: "Sneaky" } });
    expect(create.status()).toBe(403);
    const rename = await api.patch(`/api/orgs/${slug}/projects/${projectId}`, { data: { name: "Renamed by PM", status: "won" } });
    expect(rename.status()).toBe(403);
    const archive = await api.patch(`/api/orgs/${slug}/projects/${projectId}`, { data: { archived: true } });
    expect(archive.status()).toBe(403);

    const after = await api.get(list);
    expect(after.status()).toBe(200);
    const { projects } = await after.json();
    expect(projects).toEqual(before.projects);
    expect(projects.map((p: { name: string }) => p.name)).not.toContain("Sneaky");
    const one = await (await api.get(`/api/orgs/${slug}/projects/${projectId}`)).json();
    expect(one.project).toMatchObject({ name: project.name, status: "draft", archivedAt: null });
  });

  await test.step("an organisation the PM is not in answers 404, like one that does not exist", async () => {
    // A real neighbouring company, made through the public sign-up API (its own cookie jar, not the PM's).
    const other = await request.post("/api/signup", {
      data: { name: "Idris Vance", organisationName: "Alder Bend Stair & Rail", email: `idris.${id}@alderbend-stair.test`, password: "newel-post-4444" },
    });
    expect(other.status()).toBe(201);
    const otherSlug: string = (await other.json()).organisation.slug;

    // Typed or pasted addresses, on purpose: the one place a person does not arrive by a link.
    for (const target of ["no-such-org-xyz", otherSlug]) {
      const res = await page.goto(`/${target}/projects`);
      expect(res?.status()).toBe(404);
      await expect(page.getByRole("heading", { name: "Nothing here" })).toBeVisible();
      expect((await page.request.get(`/api/orgs/${target}/projects`)).status()).toBe(404);
    }
    expect(dialogs).toEqual([]);
  });
});
