// The plans benchmark (npm run bench:plans, through scripts/bench-serve.sh): first render and zoom steps of a dense
// ARCH D sheet, and upload-to-ready of a 50-page set, all in headless Chromium against `next start`.
import { chromium, type Page } from "@playwright/test";
import { encode } from "next-auth/jwt";
import { pool } from "@/db/client";
import { createProject } from "@/db/queries/projects";
import { signUpUser } from "@/db/queries/users";
import { generatePlanSet } from "@/lib/plans/demo-plan";
import { SHEET_RENDER_MARK } from "@/lib/plans/viewer/render-marks";

const base = process.env.NEXTAUTH_URL!;
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const ms = (x: number) => `${Math.round(x)} ms`;

const stamp = Date.now().toString(36);
const { user, organisation } = await signUpUser({ name: "Bench Estimator", email: `bench-${stamp}@example.test`, password: "bench-password-1", organisationName: `Bench Trim ${stamp}` });
const project = await createProject({ orgId: organisation.id, userId: user.id, input: { name: "Bench job" } });
const token = await encode({ token: { sub: user.id, name: user.name, email: user.email, sv: 0 }, secret: process.env.NEXTAUTH_SECRET! });

const browser = await chromium.launch({
  executablePath: "/usr/bin/chromium",
  args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
});
const context = await browser.newContext({ viewport: { width: 1600, height: 1000 }, deviceScaleFactor: 1 });
await context.addCookies([{ name: "next-auth.session-token", value: token, url: base }]);
const page = await context.newPage();
const plansUrl = `${base}/${organisation.slug}/projects/${project.id}/plans`;

/** Upload through the page's own control and wait for the server's "N sheets added." */
async function uploadViaPage(p: Page, bytes: Uint8Array, name: string, pages: number) {
  await p.goto(plansUrl);
  await p.locator('input[type="file"]').waitFor({ state: "attached" });
  const t0 = Date.now();
  await p.locator('input[type="file"]').setInputFiles({ name, mimeType: "application/pdf", buffer: Buffer.from(bytes) });
  await p.getByText(`${pages} sheets added.`).or(p.getByText(`${pages} sheet added.`)).first().waitFor({ timeout: 300_000 });
  return Date.now() - t0;
}

const renderMarks = (p: Page) =>
  p.evaluate((name) => performance.getEntriesByName(name).map((e) => e.startTime), SHEET_RENDER_MARK);

async function waitForMarkAfter(p: Page, t: number) {
  await p.waitForFunction(([name, after]) => performance.getEntriesByName(name).some((e) => e.startTime > after), [SHEET_RENDER_MARK, t] as const, { timeout: 60_000 });
  return Math.min(...(await renderMarks(p)).filter((s) => s > t));
}

// 1. Upload-to-ready: a 50-page set, three times.
const fifty = await generatePlanSet({ pages: 50 });
const uploads: number[] = [];
for (let i = 0; i < 3; i++) uploads.push(await uploadViaPage(page, fifty.bytes, `fifty-${i}.pdf`, 50));

// 2. The dense sheet: ~20,000 vector paths on one ARCH D (36 × 24 in) sheet.
const dense = await generatePlanSet({ unitTypes: ["A"], commonArea: false, dense: 20_000 });
await uploadViaPage(page, dense.bytes, "dense.pdf", 1);
const { rows } = await pool.query("select s.id from sheets s join plan_sets p on p.id = s.plan_set_id where p.name = 'dense.pdf' and s.project_id = $1", [project.id]);
const viewerUrl = `${base}/${organisation.slug}/projects/${project.id}/sheets/${rows[0].id}`;

const firstRenders: number[] = [];
const zoomSteps: number[] = [];
for (let run = 0; run < 5; run++) {
  await page.goto(viewerUrl);
  firstRenders.push(await waitForMarkAfter(page, 0)); // navigation start → first sharp bitmap on screen
  await page.waitForTimeout(400);
  for (let step = 0; step < 4; step++) {
    const t0 = await page.evaluate(() => performance.now());
    await page.keyboard.press("+");
    zoomSteps.push((await waitForMarkAfter(page, t0)) - t0); // key press → sharp bitmap at the new zoom
    await page.waitForTimeout(300);
  }
}
await browser.close();
await pool.end();

const cpus = (await import("node:os")).cpus();
console.log(`\nPlans benchmark — ${cpus.length} × ${cpus[0]?.model ?? "cpu"}, Chromium headless, next start (production build)\n`);
console.table([
  { measure: "upload-to-ready, 50-page set", runs: uploads.length, median: ms(median(uploads)), worst: ms(Math.max(...uploads)), target: "—", size: `${Math.round(fifty.bytes.byteLength / 1024)} KB` },
  { measure: "first sheet render (open → sharp)", runs: firstRenders.length, median: ms(median(firstRenders)), worst: ms(Math.max(...firstRenders)), target: "< 1500 ms", size: `${Math.round(dense.bytes.byteLength / 1024)} KB, 20k paths` },
  { measure: "zoom step (+ → sharp at new zoom)", runs: zoomSteps.length, median: ms(median(zoomSteps)), worst: ms(Math.max(...zoomSteps)), target: "< 250 ms", size: "×1.25 per step" },
]);
console.log("Zoom steps include the viewer's settle delay before it re-renders; the CSS-scaled bitmap follows the key at once.");
