import { describe, expect, it } from "vitest";
import * as sheetRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/sheets/[sheetId]/route";
import * as openingTypesRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/opening-types/route";
import * as openingTypeRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/opening-types/[openingTypeId]/route";
import * as tagsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/tags/route";
import * as tagRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/tags/[tagId]/route";
import * as countsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/counts/route";
import { addTag as createTag } from "@/lib/server/plans/tags";
import { addUnitType as createUnitType } from "@/lib/server/plans/unit-types";
import { editSheet as updateSheet } from "@/lib/server/plans/sheets";
import type { CountsView, SheetView, TagView } from "@/lib/plans/api-types";
import { call, sessionCookie } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { makeOrg, type World } from "./helpers/world";

async function as(w: World) {
  const cookie = await sessionCookie(w.people.estimator);
  const base = { orgSlug: w.org.slug, projectId: w.project.id };
  return {
    scope: { orgId: w.org.id, projectId: w.project.id, userId: w.people.estimator.id },
    patchSheet: (body: unknown) =>
      call(sheetRoute.PATCH, { method: "PATCH", path: "/x", params: { ...base, sheetId: w.plans.sheet.id }, body, cookie }),
    addType: (body: unknown) => call(openingTypesRoute.POST, { method: "POST", path: "/x", params: base, body, cookie }),
    patchType: (id: string, body: unknown) =>
      call(openingTypeRoute.PATCH, { method: "PATCH", path: "/x", params: { ...base, openingTypeId: id }, body, cookie }),
    deleteType: (id: string, version: number) =>
      call(openingTypeRoute.DELETE, { method: "DELETE", path: `/x?version=${version}`, params: { ...base, openingTypeId: id }, cookie }),
    addTag: (body: unknown) => call(tagsRoute.POST, { method: "POST", path: "/x", params: base, body, cookie }),
    patchTag: (id: string, body: unknown) => call(tagRoute.PATCH, { method: "PATCH", path: "/x", params: { ...base, tagId: id }, body, cookie }),
    deleteTag: (id: string, version: number) =>
      call(tagRoute.DELETE, { method: "DELETE", path: `/x?version=${version}`, params: { ...base, tagId: id }, cookie }),
    counts: async () => (await call(countsRoute.GET, { method: "GET", path: "/x", params: base, cookie })).json.counts as CountsView,
  };
}

describe("calibration", () => {
  it("a standard scale gives ratio × UserUnit / 72 inches per PDF unit (ISO 32000-1 §8.3.2.3: 1 unit = 1/72 in)", async () => {
    const w = await makeOrg("Larch");
    const api = await as(w);
    const res = await api.patchSheet({ version: 1, scale: { ratio: 48, label: `1/4" = 1'-0"` } });
    expect(res.status).toBe(200);
    expect((res.json.sheet as SheetView).inchesPerUnit).toBeCloseTo(48 / 72, 12);
  });

  it("picked points win over the scale, and a disagreement over 1% is flagged", async () => {
    const w = await makeOrg("Larch");
    const api = await as(w);
    await api.patchSheet({ version: 1, scale: { ratio: 48, label: `1/4" = 1'-0"` } });
    // 216 units at 1/4" = 1'-0" is 144 in; typing 12'-6" (150 in) disagrees by 4.17%.
    const res = await api.patchSheet({ version: 2, calibrationPoints: { ax: 100, ay: 100, bx: 316, by: 100, length: `12'-6"` } });
    const sheet = res.json.sheet as SheetView;
    expect(sheet.inchesPerUnit).toBeCloseTo(150 / 216, 12);
    expect(sheet.scaleMismatchPercent).toBeCloseTo(((150 / 216 - 48 / 72) / (48 / 72)) * 100, 6);
    const agreeing = await api.patchSheet({ version: 3, calibrationPoints: { ax: 100, ay: 100, bx: 316, by: 100, length: `12'-0 1/2"` } });
    expect((agreeing.json.sheet as SheetView).scaleMismatchPercent).toBeNull();
  });

  it("a stale edit is refused with the sheet as it is now", async () => {
    const w = await makeOrg("Larch");
    const api = await as(w);
    expect((await api.patchSheet({ version: 1, label: "A-201a" })).status).toBe(200);
    const before = await snapshot();
    const stale = await api.patchSheet({ version: 1, label: "A-999" });
    expect(stale.status).toBe(409);
    expect(stale.json.current).toMatchObject({ label: "A-201a", version: 2 });
    expect(await snapshot()).toBe(before);
  });

  it("an unreadable length names the field", async () => {
    const w = await makeOrg("Larch");
    const res = await (await as(w)).patchSheet({ version: 1, calibrationPoints: { ax: 0, ay: 0, bx: 100, by: 0, length: "twelve feet" } });
    expect(res.status).toBe(422);
    expect(res.json.fields?.["calibrationPoints.length"]).toMatch(/write a length/);
  });
});

describe("the window list", () => {
  it("takes lengths as people write them and fills the trim spec from the defaults", async () => {
    const w = await makeOrg("Larch");
    const res = await (await as(w)).addType({ mark: "W5", width: `2'-11 1/2"`, height: "59 1/2", setback: "902 mm" });
    expect(res.status).toBe(201);
    // 902 mm / 25.4 = 35.5118… in (1 in = 25.4 mm exactly, NIST Handbook 44 Appendix C).
    expect(res.json.openingType).toMatchObject({ width: 35.5, height: 59.5, trimSpec: { style: "stool-and-apron", casingWidth: 2.5 } });
    // Rows are plain windows until a kind is given; the kind and its shape come back with every read.
    expect(res.json.openingType).toMatchObject({ kind: "window", shape: null });
    expect((res.json.openingType as { setback: number }).setback).toBeCloseTo(902 / 25.4, 9);
  });

  it("derives the setback from a wall build-up: 2x6 (5 1/2, PS 20) + 1/2 board (ASTM C1396) − 4 9/16 frame = 1 7/16", async () => {
    const w = await makeOrg("Larch");
    const res = await (await as(w)).addType({ mark: "W6", width: 36, height: 48, wallBuildUp: { stud: "2x6", wallboard: "1/2", frameDepth: 4.5625 } });
    expect(res.status).toBe(201);
    expect((res.json.openingType as { setback: number }).setback).toBe(1.4375);
  });

  it("refuses a duplicate mark, a reveal as wide as the casing, and a setback-less type, naming the field", async () => {
    const w = await makeOrg("Larch");
    const api = await as(w);
    const before = await snapshot();
    expect((await api.addType({ mark: "W1", width: 30, height: 30, setback: 0 })).json.fields).toEqual({ mark: "Mark already used in this project." });
    const reveal = await api.addType({ mark: "W7", width: 30, height: 30, setback: 0, trimSpec: { casingWidth: 2.5, reveal: 2.5 } });
    expect(reveal.status).toBe(422);
    expect(reveal.json.fields?.["trimSpec.reveal"]).toMatch(/less than the casing width/);
    expect((await api.addType({ mark: "W8", width: 30, height: 30 })).json.fields?.setback).toMatch(/wall build-up/);
    expect(await snapshot()).toBe(before);
  });

  it("won't delete a type that tags use, and refuses a stale version", async () => {
    const w = await makeOrg("Larch");
    const api = await as(w);
    const used = await api.deleteType(w.plans.w1.id, 1);
    expect(used.status).toBe(409);
    expect(used.json.error).toMatch(/1 tag on the drawings use W1/);
    expect((await api.patchType(w.plans.w2.id, { version: 1, notes: "obscure glass" })).status).toBe(200);
    expect((await api.deleteType(w.plans.w2.id, 1)).status).toBe(409);
    expect((await api.deleteType(w.plans.w2.id, 2)).status).toBe(204);
  });
});

describe("tags", () => {
  it("two estimators on one tag: the second, stale move is refused and sees the first", async () => {
    const w = await makeOrg("Larch");
    const api = await as(w);
    const first = await api.patchTag(w.plans.tag.id, { version: 1, x: 410, y: 305 });
    expect(first.status).toBe(200);
    const second = await api.patchTag(w.plans.tag.id, { version: 1, x: 999, y: 999 });
    expect(second.status).toBe(409);
    expect(second.json.current).toMatchObject({ x: 410, y: 305, version: 2 });
    expect((await api.deleteTag(w.plans.tag.id, 1)).status).toBe(409);
    expect((await api.deleteTag(w.plans.tag.id, 2)).status).toBe(204);
  });

  it("flags a measured width more than 1 in off the type's width", async () => {
    const w = await makeOrg("Larch");
    const api = await as(w);
    const near = await api.patchTag(w.plans.tag.id, { version: 1, measuredWidth: "36 7/8" });
    expect((near.json.tag as TagView).widthMismatch).toBe(false);
    const far = await api.patchTag(w.plans.tag.id, { version: 2, measuredWidth: "37 1/8" });
    expect((far.json.tag as TagView).widthMismatch).toBe(true);
  });

  it("a sheet or opening type of another project is a field error, and nothing is written", async () => {
    const w = await makeOrg("Larch");
    const other = await makeOrg("Aspen");
    const api = await as(w);
    const before = await snapshot();
    const res = await api.addTag({ sheetId: other.plans.sheet.id, openingTypeId: w.plans.w1.id, x: 1, y: 1 });
    expect(res.status).toBe(422);
    expect(res.json.fields).toEqual({ sheetId: "No such sheet in this project." });
    const res2 = await api.addTag({ sheetId: w.plans.sheet.id, openingTypeId: other.plans.w1.id, x: 1, y: 1 });
    expect(res2.json.fields).toEqual({ openingTypeId: "No such opening type in this project." });
    expect(await snapshot()).toBe(before);
  });
});

describe("counts", () => {
  it("tags on a unit type's sheet count once per unit; common-area sheets count once", async () => {
    const w = await makeOrg("Larch");
    const api = await as(w);
    const { scope, counts } = api;
    // Sheet 1 shows Type A (12 units): W1 ×2 + W2 ×1. Sheet 2 is a common area: W2 ×3.
    await updateSheet(scope, w.plans.sheet.id, { version: 1, unitTypeId: w.plans.unitType.id });
    await createTag(scope, { sheetId: w.plans.sheet.id, openingTypeId: w.plans.w1.id, x: 700, y: 300 });
    await createTag(scope, { sheetId: w.plans.sheet.id, openingTypeId: w.plans.w2.id, x: 900, y: 300 });
    for (const x of [100, 200, 300]) await createTag(scope, { sheetId: w.plans.commonSheet.id, openingTypeId: w.plans.w2.id, x, y: 50 });
    const b = await createUnitType(scope, { name: "Type B", count: 5 }); // no sheet yet: counts nothing

    const c = await counts();
    const { w1, w2 } = w.plans;
    expect(c.sheets.map((s) => [s.label, s.byType, s.total])).toEqual([
      ["A-201", { [w1.id]: 2, [w2.id]: 1 }, 3],
      ["Page 2", { [w2.id]: 3 }, 3],
    ]);
    const typeA = c.unitTypes.find((u) => u.unitTypeId === w.plans.unitType.id)!;
    expect(typeA).toMatchObject({ unitCount: 12, perUnit: { [w1.id]: 2, [w2.id]: 1 }, allUnits: { [w1.id]: 24, [w2.id]: 12 } });
    expect(c.unitTypes.find((u) => u.unitTypeId === b.id)).toMatchObject({ perUnit: {}, allUnits: {} });
    expect(c.commonAreas).toEqual({ [w2.id]: 3 });
    expect(c.job).toEqual({ [w1.id]: 24, [w2.id]: 15 });
    expect(c.jobTotal).toBe(39);
  });
});
