import { describe, expect, it } from "vitest";
import * as sheetRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/sheets/[sheetId]/route";
import * as countsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/counts/route";
import * as takeoffsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/route";
import type { TakeoffView } from "@/lib/server/takeoffs/takeoffs";
import { addPlanSet as createPlanSet } from "@/lib/server/plans/plan-sets";
import { sheetsOf as listSheets } from "@/lib/server/plans/sheets";
import { addTag as createTag } from "@/lib/server/plans/tags";
import type { CountsView, SheetView } from "@/lib/plans/api-types";
import { call, sessionCookie } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { addTestPriceBook } from "./helpers/takeoff-world";
import { makeOrg, unique, type World } from "./helpers/world";

const page = { width: 2592, height: 1728, rotation: 0, userUnit: 1 };

/**
 * Three sheets of one unit plan (the plan, an enlarged plan, a repeat in a later set), all under
 * Type A (12 units), each tagged with the same W1, W1, W2 layout — the enlarged one at twice the size.
 */
async function threeSheetsOfOnePlan(w: World) {
  const scope = { orgId: w.org.id, projectId: w.project.id, userId: w.people.estimator.id };
  await createPlanSet(scope, { name: "Unit plans.pdf", key: `fixture-${unique()}`, size: 1 }, [
    { pageNumber: 1, label: "A-101", ...page },
    { pageNumber: 2, label: "A-401", ...page },
    { pageNumber: 3, label: "A-102", ...page },
  ]);
  const all = await listSheets(scope);
  const [a101, a401, a102] = ["A-101", "A-401", "A-102"].map((l) => all.find((s) => s.label === l)!);
  const layout = (sheetId: string, k: number, dx: number) =>
    Promise.all(
      [
        [w.plans.w1.id, 400, 300],
        [w.plans.w1.id, 520, 300],
        [w.plans.w2.id, 900, 700],
      ].map(([openingTypeId, x, y]) => createTag(scope, { sheetId, openingTypeId: openingTypeId as string, x: (x as number) * k + dx, y: (y as number) * k })),
    );
  await layout(a101!.id, 1, 0);
  await layout(a401!.id, 2, -300);
  await layout(a102!.id, 1, 40);
  return { scope, sheets: [a101!, a401!, a102!] };
}

async function as(w: World) {
  const cookie = await sessionCookie(w.people.estimator);
  const base = { orgSlug: w.org.slug, projectId: w.project.id };
  return {
    patch: async (sheet: { id: string }, body: Record<string, unknown>) => {
      const current = (await call(sheetRoute.GET, { method: "GET", path: "/x", params: { ...base, sheetId: sheet.id }, cookie })).json.sheet as SheetView;
      return call(sheetRoute.PATCH, { method: "PATCH", path: "/x", params: { ...base, sheetId: sheet.id }, body: { version: current.version, ...body }, cookie });
    },
    counts: async () => (await call(countsRoute.GET, { method: "GET", path: "/x", params: base, cookie })).json.counts as CountsView,
    run: (priceBookId: string) => call(takeoffsRoute.POST, { method: "POST", path: "/x", params: base, body: { name: "Base", priceBookId }, cookie }),
  };
}

describe("sheets of one unit type", () => {
  it("the first sheet of a unit type counts; later ones join as reference views and count nothing", async () => {
    const w = await makeOrg("Hornbeam");
    const { sheets } = await threeSheetsOfOnePlan(w);
    const api = await as(w);
    const roles: string[] = [];
    for (const s of sheets) {
      const res = await api.patch(s, { unitTypeId: w.plans.unitType.id });
      expect(res.status).toBe(200);
      roles.push((res.json.sheet as SheetView).countRole);
    }
    expect(roles).toEqual(["counted", "reference", "reference"]);

    const c = await api.counts();
    const { w1, w2 } = w.plans;
    // One unit shows W1 ×2 and W2 ×1; Type A has 12 units. Not three times that.
    expect(c.unitTypes.find((u) => u.unitTypeId === w.plans.unitType.id)).toMatchObject({ perUnit: { [w1.id]: 2, [w2.id]: 1 }, allUnits: { [w1.id]: 24, [w2.id]: 12 } });
    // The fixture's own tag (one W1 on A-201, a common area) still counts once.
    expect(c.job).toEqual({ [w1.id]: 25, [w2.id]: 12 });
    expect(c.sheets.find((s) => s.label === "A-401")).toMatchObject({ countRole: "reference", total: 3 });
    expect(c.warnings).toEqual([]);
  });

  it("warns when two counted sheets of one unit type carry the same tag layout, and the takeoff counts what the counts say", async () => {
    const w = await makeOrg("Hornbeam");
    const { sheets } = await threeSheetsOfOnePlan(w);
    const api = await as(w);
    for (const s of sheets) expect((await api.patch(s, { unitTypeId: w.plans.unitType.id, countRole: "counted" })).status).toBe(200);

    const c = await api.counts();
    expect(c.warnings).toEqual([
      expect.objectContaining({ kind: "same-layout", unitTypeId: w.plans.unitType.id, sheetIds: sheets.map((s) => s.id), message: expect.stringMatching(/A-101, A-401 and A-102 carry the same tags/) }),
    ]);
    expect(c.job[w.plans.w1.id]).toBe(1 + 3 * 24);

    // Mark the enlarged plan and the repeat as reference views: the warning goes, and so do the extra windows.
    await api.patch(sheets[1]!, { countRole: "reference" });
    await api.patch(sheets[2]!, { countRole: "reference" });
    const fixed = await api.counts();
    expect(fixed.warnings).toEqual([]);
    const book = await addTestPriceBook(w.org.id);
    const takeoff = (await api.run(book.priceBookId)).json.takeoff as TakeoffView;
    expect(takeoff.inputs.counts.job).toEqual(fixed.job);
    expect(takeoff.result.openingTypes.find((o) => o.mark === "W1")!.quantity).toBe(25);
  });

  it("a unit type whose sheets are all reference views is flagged, not silently zero", async () => {
    const w = await makeOrg("Hornbeam");
    const { sheets } = await threeSheetsOfOnePlan(w);
    const api = await as(w);
    await api.patch(sheets[0]!, { unitTypeId: w.plans.unitType.id, countRole: "reference" });
    const c = await api.counts();
    expect(c.warnings).toEqual([expect.objectContaining({ kind: "no-counted-sheet", sheetIds: [sheets[0]!.id], message: expect.stringMatching(/counts no openings: A-101 is a reference view/) })]);
  });

  it("an unknown count role is a 422 naming the field, and nothing changes", async () => {
    const w = await makeOrg("Hornbeam");
    const api = await as(w);
    const before = await snapshot();
    const res = await api.patch(w.plans.sheet, { countRole: "twice" });
    expect(res.status).toBe(422);
    expect(res.json.fields?.countRole).toMatch(/counted or reference/);
    expect(await snapshot()).toBe(before);
  });
});
