/**
 * The security headers as a browser meets them: the app, react-pdf and its pdf.js worker run under the
 * Content-Security-Policy without a single violation or console error while a plan set is uploaded and a
 * sheet rendered; API answers are not cacheable; the plan file is sandboxed and never sniffed; a broken
 * %-escape in the address is a 400 with a message, not a plain-text 500.
 */
import { expect, test, type Page } from "@playwright/test";
import { generatePlanSet } from "@/scripts/demo-plan";
import { runId } from "./helpers";

const id = runId();
const owner = { name: "Ines Calloway", email: `ines.${id}@fernhollow-trim.test`, password: "apron-return-5555" };

/** CSP violations (reported by the browser as events) and console errors, from the first script on. */
async function watchForProblems(page: Page) {
  const problems: string[] = [];
  await page.exposeFunction("__reportViolation", (v: string) => problems.push(`CSP: ${v}`));
  await page.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) =>
      (window as unknown as { __reportViolation: (v: string) => void }).__reportViolation(`${e.violatedDirective} ${e.blockedURI} at ${e.sourceFile}:${e.lineNumber}:${e.columnNumber}`),
    );
  });
  page.on("console", (m) => {
    if (m.type() === "error") problems.push(`console: ${m.text()}`);
  });
  page.on("pageerror", (e) => problems.push(`page error: ${e.message}`));
  return problems;
}

test("the app, the upload and the pdf.js viewer run under the CSP with no violation", async ({ page }) => {
  test.setTimeout(240_000);
  const problems = await watchForProblems(page);

  const signUp = await test.step("sign up", async () => {
    const res = await page.goto("/sign-up");
    const csp = res!.headers()["content-security-policy"] ?? "";
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    expect(res!.headers()["x-content-type-options"]).toBe("nosniff");
    expect(res!.headers()["x-frame-options"]).toBe("DENY");
    expect(res!.headers()["referrer-policy"]).toBe("strict-origin-when-cross-origin");
    expect(res!.headers()["strict-transport-security"]).toMatch(/max-age=\d+/);
    await page.getByLabel("Your name").fill(owner.name);
    await page.getByLabel("Company name").fill(`Calloway Trim ${id}`);
    await page.getByLabel("E-mail").fill(owner.email);
    await page.getByLabel("Password").fill(owner.password);
    await page.getByRole("button", { name: "Create account" }).click();
    await expect(page).toHaveURL(/\/projects$/);
    return { slug: new URL(page.url()).pathname.split("/")[1]! };
  });
  const api = (path: string) => `/api/orgs/${signUp.slug}/${path}`;
  const projectName = `Fernhollow Flats ${id}`;
  const project = await page.request.post(api("projects"), { data: { name: projectName } });
  expect(project.headers()["cache-control"]).toBe("no-store");
  const projectId = (await project.json()).project.id as string;
  expect((await page.request.post(api(`projects/${projectId}/unit-types`), { data: { name: "Type A", count: 12 } })).status()).toBe(201);

  await test.step("open the project's plans by clicking, and upload a plan set", async () => {
    await page.reload();
    await page.getByRole("link", { name: projectName }).click();
    await page.getByRole("link", { name: "Plans", exact: true }).click();
    const { bytes } = await generatePlanSet({ unitTypes: ["A"] });
    await page.locator('input[type="file"]').setInputFiles({ name: "Fernhollow.pdf", mimeType: "application/pdf", buffer: Buffer.from(bytes) });
    await expect(page.getByText("2 sheets added.")).toBeVisible({ timeout: 90_000 });
  });

  await test.step("edit a unit type's count: the form sends the version it loaded", async () => {
    await page.getByRole("button", { name: "Edit Type A" }).click();
    const form = page.getByRole("listitem").filter({ has: page.getByRole("button", { name: "Delete Type A" }) });
    await form.getByLabel("Units").fill("14");
    await form.getByRole("button", { name: "Save" }).click();
    await expect(page.getByText("× 14 units")).toBeVisible();
  });

  await test.step("render a sheet in the viewer", async () => {
    // By clicking its link on the Plans page, as a person does (client-side navigation runs under the policy too).
    await page.getByRole("main").getByRole("link", { name: /A-201/ }).first().click();
    await expect(page.locator("[data-sheet-page] canvas").first(), problems.join("\n")).toBeVisible({ timeout: 60_000 });
    // Let the worker finish the page (text layer, detail tiles) so late violations show too.
    await page.waitForTimeout(2000);
  });

  // zod and pdf.js each probe `Function("")` inside try/catch to pick a faster path, and fall back when the
  // CSP refuses it; the browser still reports the refused probe. Those reports — and only those — are expected.
  const probe = /^CSP: script-src eval at \S+$/;
  expect(problems.filter((p) => !probe.test(p))).toEqual([]);

  await test.step("the plan file is sandboxed, never sniffed, privately cached", async () => {
    const sets = (await (await page.request.get(api(`projects/${projectId}/plan-sets`))).json()) as { planSets: { id: string }[] };
    const file = await page.request.get(api(`projects/${projectId}/plan-sets/${sets.planSets[0]!.id}/file`));
    expect(file.status()).toBe(200);
    expect(file.headers()["content-security-policy"]).toMatch(/^sandbox;/);
    expect(file.headers()["x-content-type-options"]).toBe("nosniff");
    expect(file.headers()["cache-control"]).toBe("private, max-age=3600");
  });
});

test("a broken %-escape in the address answers 400 with a message", async ({ request }) => {
  for (const path of ["/api/orgs/%E0%A4%A/projects", "/api/orgs/%/projects", "/some-org/projects/%ZZ"]) {
    const res = await request.get(path);
    expect(res.status(), path).toBe(400);
    expect((await res.json()).error).toMatch(/%-escape/);
  }
});
