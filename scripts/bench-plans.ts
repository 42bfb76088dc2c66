// The plans benchmark (npm run bench:plans, through scripts/bench-serve.sh): opening a dense ARCH D sheet (from a
// click on the Plans page, as people do, and from a typed address), zoom steps on it, and upload-to-ready of a
// 50-page set, all in headless Chromium against `next start`.
import { chromium, type BrowserContext, type Page } from "@playwright/test";
import { encode } from "next-auth/jwt";
import { pool } from "@/db/client";
import { createProject } from "@/lib/server/projects/projects";
import { signUp as signUpUser } from "@/lib/server/accounts/sign-up";
import { generatePlanSet } from "@/scripts/demo-plan";
import { SHEET_RENDER_MARK } from "@/lib/plans/viewer/render-marks";

const base = process.env.NEXTAUTH_URL!;
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const ms = (x: number) => `${Math.round(x)} ms`;

const stamp = Date.now().toString(36);
const { user, organisation } = await signUpUser({ name: "Bench Estimator", email: `bench-${stamp}@example.test`, password: "bench-password-1", organisationName: `Bench Trim ${stamp}` });
const uploadsProject = await createProject({ orgId: organisation.id, userId: user.id, input: { name: "Bench job" } });
// The dense sheet has a project of its own, so its label is the only link of that name on the Plans page.
const denseProject = await createProject({ orgId: organisation.id, userId: user.id, input: { name: "Bench dense sheet" } });
const token = await encode({ token: { sub: user.id, name: user.name, email: user.email, sv: 0 }, secret: process.env.NEXTAUTH_SECRET! });

const browser = await chromium.launch({
  executablePath: "/usr/bin/chromium",
  args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
});
async function signedInContext(viewport: { width: number; height: number }): Promise<BrowserContext> {
  const context = await browser.newContext({ viewport, deviceScaleFactor: 1 });
  await context.addCookies([{ name: "next-auth.session-token", value: token, url: base }]);
  return context;
}
const laptop = await signedInContext({ width: 1600, height: 1000 });
const page = await laptop.newPage();
const plansUrl = (projectId: string) => `${base}/${organisation.slug}/projects/${projectId}/plans`;

/** Upload through the page's own control and wait for the server's "N sheets added." */
async function uploadViaPage(p: Page, projectId: string, bytes: Uint8Array, name: string, pages: number) {
  await p.goto(plansUrl(projectId));
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

/** The Plans page as a person reaches it, then a click on the sheet's link → first sharp bitmap. */
async function openFromClick(p: Page, label: string) {
  await p.goto(plansUrl(denseProject.id));
  const link = p.getByRole("main").getByRole("link", { name: label, exact: true });
  await link.waitFor();
  await p.waitForTimeout(500); // the page at rest, as when someone reads the list before choosing
  const t0 = await p.evaluate(() => performance.now());
  await link.click();
  return (await waitForMarkAfter(p, t0)) - t0;
}

/**
 * Milliseconds during which a page layer still being drawn was on screen over the finished one (pdf.js paints a
 * new canvas white, then draws it in slices): sampled every animation frame from the key press to the new bitmap.
 */
async function startFlashMeter(p: Page): Promise<number> {
  // A string, not a function: tsx would wrap named inner functions in a helper the page does not have.
  return p.evaluate(`(() => {
    const w = window;
    w.flash_ = { ms: 0, stop: false };
    let last = performance.now();
    function tick(now) {
      const layers = [...document.querySelectorAll("[data-sheet-page] .react-pdf__Page")];
      if (layers.length > 1 && layers.slice(1).some((l) => getComputedStyle(l).visibility !== "hidden")) w.flash_.ms += now - last;
      last = now;
      if (!w.flash_.stop) requestAnimationFrame(tick);
    }
    requestAnimationFrame(tick);
    return performance.now();
  })()`);
}
const stopFlashMeter = (p: Page): Promise<number> => p.evaluate(`(() => { window.flash_.stop = true; return window.flash_.ms; })()`);

// 1. Upload-to-ready: a 50-page set, three times.
const fifty = await generatePlanSet({ pages: 50 });
const uploads: number[] = [];
for (let i = 0; i < 3; i++) uploads.push(await uploadViaPage(page, uploadsProject.id, fifty.bytes, `fifty-${i}.pdf`, 50));

// 2. The dense sheet: ~20,000 vector paths on one ARCH D (36 × 24 in) sheet.
const dense = await generatePlanSet({ unitTypes: ["A"], commonArea: false, dense: 20_000 });
await uploadViaPage(page, denseProject.id, dense.bytes, "dense.pdf", 1);
const { rows } = await pool.query("select s.id, s.label from sheets s where s.project_id = $1", [denseProject.id]);
const denseLabel: string = rows[0].label;
const viewerUrl = `${base}/${organisation.slug}/projects/${denseProject.id}/sheets/${rows[0].id}`;

const fromClick: number[] = [];
for (let run = 0; run < 5; run++) fromClick.push(await openFromClick(page, denseLabel));

const firstRenders: number[] = [];
const zoomSteps: number[] = [];
const flashes: number[] = [];
for (let run = 0; run < 5; run++) {
  await page.goto(viewerUrl);
  firstRenders.push(await waitForMarkAfter(page, 0)); // navigation start → first sharp bitmap on screen
  await page.waitForTimeout(400);
  for (let step = 0; step < 4; step++) {
    const t0 = await startFlashMeter(page);
    await page.keyboard.press("+");
    zoomSteps.push((await waitForMarkAfter(page, t0)) - t0); // key press → sharp bitmap at the new zoom
    await page.waitForTimeout(300);
    flashes.push(await stopFlashMeter(page));
  }
}

// 3. A tablet (1024 × 768) opening the same sheet from the Plans page.
const tablet = await signedInContext({ width: 1024, height: 768 });
const tabletPage = await tablet.newPage();
const tabletFromClick: number[] = [];
for (let run = 0; run < 5; run++) tabletFromClick.push(await openFromClick(tabletPage, denseLabel));
await browser.close();
await pool.end();

const cpus = (await import("node:os")).cpus();
const denseSize = `${Math.round(dense.bytes.byteLength / 1024)} KB, 20k paths`;
console.log(`\nPlans benchmark — ${cpus.length} × ${cpus[0]?.model ?? "cpu"}, Chromium headless, next start (production build)\n`);
console.table([
  { measure: "upload-to-ready, 50-page set", runs: uploads.length, median: ms(median(uploads)), worst: ms(Math.max(...uploads)), target: "—", size: `${Math.round(fifty.bytes.byteLength / 1024)} KB` },
  { measure: "open sheet: click on Plans → sharp (1600 × 1000)", runs: fromClick.length, median: ms(median(fromClick)), worst: ms(Math.max(...fromClick)), target: "< 1500 ms", size: denseSize },
  { measure: "open sheet: click on Plans → sharp (tablet 1024 × 768)", runs: tabletFromClick.length, median: ms(median(tabletFromClick)), worst: ms(Math.max(...tabletFromClick)), target: "< 1500 ms", size: denseSize },
  { measure: "open sheet: typed address → sharp", runs: firstRenders.length, median: ms(median(firstRenders)), worst: ms(Math.max(...firstRenders)), target: "< 1500 ms", size: denseSize },
  { measure: "zoom step (+ → sharp at new zoom)", runs: zoomSteps.length, median: ms(median(zoomSteps)), worst: ms(Math.max(...zoomSteps)), target: "< 250 ms", size: "×1.25 per step" },
  { measure: "zoom step: unfinished bitmap on screen", runs: flashes.length, median: ms(median(flashes)), worst: ms(Math.max(...flashes)), target: "0 ms", size: "per step" },
]);
console.log("Zoom steps include the viewer's settle delay before it re-renders; the CSS-scaled bitmap follows the key at once.");
