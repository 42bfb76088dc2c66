/**
 * A zoom step on a dense sheet: the drawing already on screen stays there, CSS-scaled, until the bitmap at the
 * new zoom is finished. pdf.js paints a fresh canvas white and then draws it in slices, so a new layer shown
 * while it is being drawn is a white flash of a second or more on a busy sheet.
 */
import { expect, test } from "@playwright/test";
import { UTApi, UTFile } from "uploadthing/server";
import { createProject } from "@/lib/server/projects/projects";
import { addPlanSet as createPlanSet } from "@/lib/server/plans/plan-sets";
import { signUp as signUpUser } from "@/lib/server/accounts/sign-up";
import { generatePlanSet } from "@/scripts/demo-plan";
import { inspectPdf } from "@/lib/pdf/inspect";
import { SHEET_RENDER_MARK } from "@/lib/plans/viewer/render-marks";
import { pointAtUploadStandInUnlessConfigured } from "@/lib/uploads/config";
import { openProject, openSheetFromPlans, runId, signIn } from "./helpers";

const id = runId();
const password = "coping-saw-7777";

test("zooming keeps the last drawing on screen until the new one is ready", async ({ page }) => {
  test.setTimeout(180_000);
  const { user, organisation } = await signUpUser({ name: "Noor Halvorsen", email: `noor.${id}@quillfield-trim.test`, password, organisationName: `Quillfield Trim ${id}` });
  const projectName = `Dense sheet ${id}`;
  const project = await createProject({ orgId: organisation.id, userId: user.id, input: { name: projectName } });
  // Enough vector paths that one render takes many frames (the benchmark uses 20,000).
  const { bytes } = await generatePlanSet({ unitTypes: ["A"], commonArea: false, dense: 12_000 });
  pointAtUploadStandInUnlessConfigured();
  const [stored] = await new UTApi().uploadFiles([new UTFile([Buffer.from(bytes)], "dense.pdf", { type: "application/pdf" })]);
  if (!stored?.data) throw new Error("could not store the plan set");
  await createPlanSet({ orgId: organisation.id, projectId: project.id, userId: user.id }, { key: stored.data.key, name: "dense.pdf", size: bytes.byteLength }, (await inspectPdf(bytes)).pages);

  await signIn(page, user.email, password);
  await expect(page).toHaveURL(/\/projects$/);
  await openProject(page, projectName);
  await openSheetFromPlans(page, "A-201");
  await expect(page.locator("[data-sheet-page] canvas").first()).toBeVisible({ timeout: 60_000 });
  await page.waitForFunction((name) => performance.getEntriesByName(name).length > 0, SHEET_RENDER_MARK, { timeout: 60_000 });

  // Every animation frame from the key press until the new bitmap is in: which page layers are there, and seen?
  const t0 = await page.evaluate(() => {
    const w = window as unknown as { frames_: string[][]; stop_: boolean };
    w.frames_ = [];
    w.stop_ = false;
    const tick = () => {
      w.frames_.push([...document.querySelectorAll("[data-sheet-page] .react-pdf__Page")].map((l) => getComputedStyle(l).visibility));
      if (!w.stop_) requestAnimationFrame(tick);
    };
    requestAnimationFrame(tick);
    return performance.now();
  });
  await page.getByRole("button", { name: "Zoom in" }).click();
  await page.waitForFunction(([name, after]) => performance.getEntriesByName(name).some((e) => e.startTime > after), [SHEET_RENDER_MARK, t0] as const, { timeout: 60_000 });
  const frames = await page.evaluate(() => {
    const w = window as unknown as { frames_: string[][]; stop_: boolean };
    w.stop_ = true;
    return w.frames_;
  });

  const drawing = frames.filter((f) => f.length > 1);
  expect(drawing.length, "frames while the new bitmap was being drawn").toBeGreaterThan(0);
  for (const f of drawing) expect(f).toEqual(["visible", ...f.slice(1).map(() => "hidden")]);
  // …and the finished one took over: one layer, shown.
  await expect(page.locator("[data-sheet-page] .react-pdf__Page")).toHaveCount(1);
  await expect(page.locator("[data-sheet-page] .react-pdf__Page")).toHaveCSS("visibility", "visible");
});
