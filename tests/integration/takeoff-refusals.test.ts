import { beforeEach, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { NextRequest } from "next/server";
import * as takeoffsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/route";
import * as submitRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/submit/route";
import * as pdfRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/bid-pdf/route";
import * as openingTypesRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/opening-types/route";
import * as openingTypeRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/opening-types/[openingTypeId]/route";
import * as priceGapsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/price-gaps/route";
import { db } from "@/db/client";
import { openingTypes, takeoffs } from "@/db/schema";
import type { TakeoffView } from "@/lib/server/takeoffs/takeoffs";
import type { PriceGapsView } from "@/lib/plans/api-types";
import { addOpeningType as createOpeningType } from "@/lib/server/plans/opening-types";
import { addTag as createTag } from "@/lib/server/plans/tags";
import { call, sessionCookie } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { addTestPriceBook } from "./helpers/takeoff-world";
import { makeOrg, type World } from "./helpers/world";

let w: World;
let book: Awaited<ReturnType<typeof addTestPriceBook>>;
beforeEach(async () => {
  w = await makeOrg("Quillet");
  book = await addTestPriceBook(w.org.id);
});

const base = () => ({ orgSlug: w.org.slug, projectId: w.project.id });
const scope = () => ({ orgId: w.org.id, projectId: w.project.id, userId: w.people.estimator.id });
const estimator = () => sessionCookie(w.people.estimator);
const run = async (body: Record<string, unknown> = {}) =>
  call(takeoffsRoute.POST, { method: "POST", path: "/x", params: base(), body: { name: "Base", priceBookId: book.priceBookId, ...body }, cookie: await estimator() });
const tagged = async (input: Parameters<typeof createOpeningType>[1]) => {
  const ot = await createOpeningType(scope(), input);
  await createTag(scope(), { sheetId: w.plans.commonSheet.id, openingTypeId: ot.id, x: 50, y: 50 });
  return ot;
};

describe("a takeoff explains what it cannot do, never a 500", () => {
  it("a 20' window: its casing head is longer than every stock length — spliced from two boards with a scarf joint, not refused", async () => {
    // Before splicing, this run was refused with "W20's casing head is 20'-5 1/4" long, but the longest stock … is 12'".
    await tagged({ mark: "W20", width: 240, height: 60, setback: 0, trimSpec: { casingWidth: 2.5, casingThickness: 0.6875 } });
    const res = await run();
    expect(res.status).toBe(201);
    const t = res.json.takeoff as TakeoffView;
    const heads = t.result.openingTypes.find((o) => o.mark === "W20")!.cutList.filter((p) => p.part === "casing-head");
    // 20'-5 1/4" (245 1/4") plus the company's 1" scarf overlap, in two parts that each fit a 12' board with a kerf.
    expect(heads.map((p) => p.scarf)).toEqual([expect.objectContaining({ of: 2, overlap: 1 }), expect.objectContaining({ of: 2, overlap: 1 })]);
    expect(heads.every((p) => p.length + 0.125 <= 144)).toBe(true);
    expect(heads.reduce((n, p) => n + p.length * p.quantity, 0)).toBeGreaterThanOrEqual(245.25 + 1);
  });

  it("an apron inset larger than the window is refused on save (create and edit), naming trimSpec.apronInset", async () => {
    const cookie = await estimator();
    const before = await snapshot();
    const created = await call(openingTypesRoute.POST, {
      method: "POST",
      path: "/x",
      params: base(),
      body: { mark: "W5", width: "10", height: "30", setback: "0", trimSpec: { apronInset: 20 } },
      cookie,
    });
    expect(created.status).toBe(422);
    expect(created.json.fields?.["trimSpec.apronInset"]).toMatch(/apron inset of 20" at each end leaves no apron: the casing is 15 1\/4" across this 10" window\. Use an inset under 7 5\/8"/i);
    const edited = await call(openingTypeRoute.PATCH, {
      method: "PATCH",
      path: "/x",
      params: { ...base(), openingTypeId: w.plans.w2.id },
      body: { version: 1, trimSpec: { apronInset: 40 } },
      cookie,
    });
    expect(edited.status).toBe(422);
    expect(edited.json.fields?.["trimSpec.apronInset"]).toMatch(/leaves no apron/);
    expect(await snapshot()).toBe(before);
  });

  it("a window list saved before that check still gets a 422 naming the type and field, not a 500", async () => {
    const ot = await tagged({ mark: "W5", width: 10, height: 30, setback: 0 });
    // As a row from before the save-time check would be.
    await db.update(openingTypes).set({ trimSpec: { ...ot.trimSpec, apronInset: 20 } }).where(eq(openingTypes.id, ot.id));
    const res = await run();
    expect(res.status).toBe(422);
    expect(res.json.fields?.["openingTypes.W5.trimSpec.apronInset"]).toMatch(/^W5: An apron inset of 20"/);
  });
});

describe("price-book gaps", () => {
  const gaps = async (query = "") =>
    (await call(priceGapsRoute.GET, { method: "GET", path: `/x${query}`, params: base(), cookie: await sessionCookie(w.people.project_manager) })).json as unknown as PriceGapsView;

  it("show on the window list as soon as the type exists, against the chosen book (or the project's last one)", async () => {
    // The world's own book has a 5 1/4 stool; the test book's stool is 5 1/4 too. A 9" setback needs a 10" stool.
    await createOpeningType(scope(), { mark: "M", width: 40, height: 60, setback: 9, trimSpec: { casingWidth: 2.5, casingThickness: 0.6875 } });
    const found = await gaps(`?priceBookId=${book.priceBookId}`);
    expect(found.priceBook?.id).toBe(book.priceBookId);
    expect(found.gaps).toEqual([
      expect.objectContaining({ mark: "M", material: "stool", kind: "no-item", message: 'M needs stool at least 10" wide: the price book has none that wide.', fix: expect.stringMatching(/Add stool of that size/) }),
      expect.objectContaining({ mark: "M", material: "extension", kind: "no-item" }),
    ]);
    expect((await gaps(`?priceBookId=not-a-uuid`)).gaps).toBeUndefined();
  });

  it("a run with placeholders prices the gap, marks it, and the takeoff cannot be submitted; the bid PDF says so", async () => {
    await tagged({ mark: "M", width: 40, height: 60, setback: 9, trimSpec: { casingWidth: 2.5, casingThickness: 0.6875 } });
    expect((await run()).status).toBe(422);
    const res = await run({ allowPlaceholders: true });
    expect(res.status).toBe(201);
    const t = res.json.takeoff as TakeoffView;
    expect(t.inputs.allowPlaceholders).toBe(true);
    expect(t.result.placeholders?.map((p) => [p.material, p.marks])).toEqual([
      ["stool", ["M"]],
      ["extension", ["M"]],
    ]);
    // Priced at the nearest real stool's rate, not left at zero: the bid is not short by the whole stool.
    const stoolOrder = t.result.orders.find((o) => o.material === "stool" && o.placeholder)!;
    expect(stoolOrder.itemName).toMatch(/^PLACEHOLDER stool 10" wide/);
    expect(stoolOrder.plan.cost).toBeGreaterThan(0);

    const pm = await sessionCookie(w.people.project_manager);
    const before = await snapshot();
    const submit = await call(submitRoute.POST, { method: "POST", path: "/x", params: { ...base(), takeoffId: t.id }, cookie: pm });
    expect(submit.status).toBe(409);
    expect(submit.json.error).toMatch(/prices 2 items with a placeholder \(stool 10" wide .* for M; .*\)\. Add them to the price book and run the takeoff again/);
    expect(await snapshot()).toBe(before);
    const [row] = await db.select({ status: takeoffs.status }).from(takeoffs).where(eq(takeoffs.id, t.id));
    expect(row!.status).toBe("draft");

    // Reading the bid PDF stays allowed (it is marked as a draft: lib/takeoffs/bid-pdf.test.ts).
    const pdf = await pdfRoute.GET(new NextRequest("http://localhost/x", { headers: { cookie: pm } }), { params: Promise.resolve({ ...base(), takeoffId: t.id }) });
    expect(pdf.status).toBe(200);
  });

  it("a run without gaps has no placeholders and submits", async () => {
    const t = (await run({ allowPlaceholders: true })).json.takeoff as TakeoffView;
    expect(t.result.placeholders).toBeUndefined();
    const submit = await call(submitRoute.POST, { method: "POST", path: "/x", params: { ...base(), takeoffId: t.id }, cookie: await sessionCookie(w.people.project_manager) });
    expect(submit.status).toBe(200);
  });
});
