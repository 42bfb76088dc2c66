import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";
import { pool } from "@/db/client";
import * as booksRoute from "@/app/api/orgs/[orgSlug]/price-books/route";
import * as bookRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/route";
import * as itemsRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/items/route";
import * as itemRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/items/[itemId]/route";
import * as csvRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/csv/route";
import * as changesRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/changes/route";
import type { ImportPreview } from "@/db/queries/price-book-import";
import type { PriceBookChangeView, PriceBookItemView, PriceBookView } from "@/lib/price-book/types";
import { call, sessionCookie } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { addMember, makeOrg, type World } from "./helpers/world";

const HEADER = "name,kind,face_width,thickness,species,supplier_code,price 7',price 8',price 10'";

/** The routes as one admin of `w` calls them; a second admin, so "the right user" is not just the book's creator. */
async function as(w: World) {
  const admin = await addMember(w.org.id, "admin", "Second-Admin");
  const cookie = await sessionCookie(admin);
  const org = { orgSlug: w.org.slug };
  const bookParams = { ...org, priceBookId: w.priceBook.book.id };
  const item = (itemId: string) => ({ ...bookParams, itemId });
  return {
    admin,
    createBook: (body: unknown) => call(booksRoute.POST, { method: "POST", path: "/x", params: org, body, cookie }),
    book: async () => (await call(bookRoute.GET, { method: "GET", path: "/x", params: bookParams, cookie })).json.priceBook as PriceBookView,
    patchBook: (body: unknown) => call(bookRoute.PATCH, { method: "PATCH", path: "/x", params: bookParams, body, cookie }),
    deleteBook: (version: number) => call(bookRoute.DELETE, { method: "DELETE", path: `/x?version=${version}`, params: bookParams, cookie }),
    addItem: (body: unknown) => call(itemsRoute.POST, { method: "POST", path: "/x", params: bookParams, body, cookie }),
    patchItem: (id: string, body: unknown) => call(itemRoute.PATCH, { method: "PATCH", path: "/x", params: item(id), body, cookie }),
    deleteItem: (id: string, version: number) => call(itemRoute.DELETE, { method: "DELETE", path: `/x?version=${version}`, params: item(id), cookie }),
    exportCsv: async () => {
      // Through the handler directly: the download's headers are what is under test.
      const res = await csvRoute.GET(new NextRequest("http://localhost/x", { headers: { cookie } }), { params: Promise.resolve(bookParams) });
      return { res, text: await res.text() };
    },
    importCsv: (body: { csv: string; mode?: string; apply?: boolean; previewToken?: string }) =>
      call(csvRoute.POST, { method: "POST", path: "/x", params: bookParams, body, cookie }),
    changes: async () => (await call(changesRoute.GET, { method: "GET", path: "/x", params: bookParams, cookie })).json.changes as PriceBookChangeView[],
  };
}

const goodRows = [`Apron 2 1/2,apron,2 1/2,11/16,Poplar,TA-250,8.40,9.60,`, `Ext board 5 1/2,extension,5 1/2,3/4,Poplar,,,18.75,23.10`];

describe("CSV import", () => {
  it("one bad row among good ones: 422 naming its line and column, and nothing written", async () => {
    const w = await makeOrg("Sorrel");
    const api = await as(w);
    const before = await snapshot();
    const csv = [HEADER, goodRows[0], `Stool 5 1/4,stool,5 1/4,3/4,Poplar,,,twelve,`, goodRows[1]].join("\r\n");
    const res = await api.importCsv({ csv, mode: "merge", apply: true });
    expect(res.status).toBe(422);
    expect(res.json.error).toBe("1 row needs attention; nothing was imported.");
    expect(res.json.fields).toEqual({ "line 3.price 8'": "Price: write a number such as 14.20." });
    expect((res.json.preview as ImportPreview).counts).toEqual({ create: 2, update: 0, unchanged: 0, error: 1, delete: 0 });
    expect(await snapshot()).toBe(before);
  });

  it("previewing writes nothing and says what would change, field by field", async () => {
    const w = await makeOrg("Sorrel");
    const api = await as(w);
    const before = await snapshot();
    const csv = [HEADER, `Casing 2 1/2 colonial,casing,2 1/2,11/16,Primed finger-joint pine,TC-250,8.90,10.45,`, ...goodRows].join("\n");
    const res = await api.importCsv({ csv, mode: "merge", apply: false });
    expect(res.status).toBe(200);
    const preview = res.json.preview as ImportPreview;
    expect(preview.rows.map((r) => [r.line, r.action, Object.keys(r.diff)])).toEqual([
      [2, "update", ["stock"]],
      [3, "create", expect.any(Array)],
      [4, "create", expect.any(Array)],
    ]);
    expect(preview.rows[0]!.diff.stock!.after).toEqual([{ length: 84, price: 8.9 }, { length: 96, price: 10.45 }]);
    expect(await snapshot()).toBe(before);
  });

  it.each([
    ["merge", ["Casing 2 1/2 colonial", "Stool 5 1/4 bullnose", "Apron 2 1/2", "Ext board 5 1/2"].sort(), { create: 2, update: 0, unchanged: 0, error: 0, delete: 0 }],
    ["replace", ["Apron 2 1/2", "Ext board 5 1/2"], { create: 2, update: 0, unchanged: 0, error: 0, delete: 2 }],
  ])("%s: applies the plan it previewed", async (mode, names, counts) => {
    const w = await makeOrg("Sorrel");
    const api = await as(w);
    const csv = [HEADER, ...goodRows].join("\n");
    const preview = (await api.importCsv({ csv, mode })).json.preview as ImportPreview;
    expect(preview.counts).toEqual(counts);
    const res = await api.importCsv({ csv, mode, apply: true, previewToken: preview.previewToken });
    expect(res.status).toBe(200);
    expect((await api.book()).items.map((i) => i.name).sort()).toEqual(names);
    const log = await api.changes();
    expect(log[0]).toMatchObject({ action: "import", userId: api.admin.id, userName: "Second-Admin" });
    expect(log.filter((c) => c.summary.includes("(CSV import)")).map((c) => c.action).sort()).toEqual(
      [...Array(counts.create).fill("item.create"), ...Array(counts.delete).fill("item.delete")].sort(),
    );
  });

  it("export then import is unchanged, and applying it writes nothing", async () => {
    const w = await makeOrg("Sorrel");
    const api = await as(w);
    const { res, text } = await api.exportCsv();
    expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="shop-prices-[0-9a-f]{6}-items-\d{4}-\d{2}-\d{2}\.csv"$/);
    const before = await snapshot();
    for (const mode of ["merge", "replace"]) {
      const applied = await api.importCsv({ csv: text, mode, apply: true });
      expect(applied.status).toBe(200);
      expect((applied.json.preview as ImportPreview).counts).toEqual({ create: 0, update: 0, unchanged: 2, error: 0, delete: 0 });
    }
    expect(await snapshot()).toBe(before);
  });

  it("refuses to apply a preview the book has moved on from (409 with the new preview)", async () => {
    const w = await makeOrg("Sorrel");
    const api = await as(w);
    const csv = [HEADER, ...goodRows].join("\n");
    const { previewToken } = (await api.importCsv({ csv })).json.preview as ImportPreview;
    expect((await api.patchItem(w.priceBook.item.id, { version: 1, species: "Poplar" })).status).toBe(200);
    const before = await snapshot();
    const res = await api.importCsv({ csv, apply: true, previewToken });
    expect(res.status).toBe(409);
    expect((res.json.preview as ImportPreview).previewToken).not.toBe(previewToken);
    expect(await snapshot()).toBe(before);
  });

  it.each([
    ["no csv", { mode: "merge" }, { csv: "Paste or choose a CSV file." }],
    ["an unknown mode", { csv: "x", mode: "append" }, { mode: 'Mode must be "merge" or "replace".' }],
    ["a header the import does not know", { csv: "name,colour\nA,red\n", apply: true }, { "line 1": expect.stringMatching(/Unknown column "colour"/) }],
  ])("answers %s with 422 naming what was wrong", async (_, body, fields) => {
    const w = await makeOrg("Sorrel");
    const api = await as(w);
    const before = await snapshot();
    const res = await api.importCsv(body as never);
    expect(res.status).toBe(422);
    expect(res.json.fields).toEqual(fields);
    expect(await snapshot()).toBe(before);
  });
});

describe("editing a price book", () => {
  it.each([
    ["a stale book edit", (api: Api, w: World) => api.patchBook({ version: 9, markup: 0.2 }), () => ({ id: expect.any(String), version: 1, markup: 0.15 })],
    ["a stale item edit", (api: Api, w: World) => api.patchItem(w.priceBook.item.id, { version: 9, name: "X" }), (w: World) => ({ id: w.priceBook.item.id, version: 1, name: "Casing 2 1/2 colonial" })],
    ["a stale item delete", (api: Api, w: World) => api.deleteItem(w.priceBook.item.id, 9), (w: World) => ({ id: w.priceBook.item.id, version: 1 })],
    ["a stale book delete", (api: Api) => api.deleteBook(9), () => ({ version: 1 })],
  ])("%s → 409 with the current row, nothing changed", async (_, act, current) => {
    const w = await makeOrg("Sorrel");
    const api = await as(w);
    const before = await snapshot();
    const res = await act(api, w);
    expect(res.status).toBe(409);
    expect(res.json.current).toMatchObject(current(w));
    expect(await snapshot()).toBe(before);
  });

  it.each([
    ["book.create", (api: Api) => api.createBook({ name: "Autumn list" }), 201],
    ["book.update", (api: Api) => api.patchBook({ version: 1, taxRate: 0.09, labour: { minutesPerOpening: { "stool-and-apron": 50, "picture-frame": 30 }, minutesPerExtensionFoot: 2, hourlyRate: "61.50" } }), 200],
    ["item.create", (api: Api) => api.addItem({ name: "Apron 3 1/2", kind: "apron", faceWidth: "3 1/2", thickness: "11/16", stock: [{ length: "8'", price: 12.4 }] }), 201],
    ["item.update", (api: Api, w: World) => api.patchItem(w.priceBook.item.id, { version: 1, stock: [{ length: "8'", price: "10.60" }, { length: "16'", price: "21" }] }), 200],
    ["item.delete", (api: Api, w: World) => api.deleteItem(w.priceBook.spareItem.id, 1), 204],
  ])("%s leaves a change-log row naming who did it", async (action, act, status) => {
    const w = await makeOrg("Sorrel");
    const api = await as(w);
    const res = await act(api, w);
    expect(res.status).toBe(status);
    const { rows } = await pool.query(
      "select user_id, action, summary, diff from price_book_changes where org_id = $1 order by at desc limit 1",
      [w.org.id],
    );
    expect(rows[0]).toMatchObject({ user_id: api.admin.id, action });
    expect(rows[0].summary).toEqual(expect.any(String));
  });

  it("logs a price change per stock length and a rate change in percent", async () => {
    const w = await makeOrg("Sorrel");
    const api = await as(w);
    await api.patchItem(w.priceBook.item.id, { version: 1, stock: [{ length: "8'", price: "10.60" }, { length: "16'", price: "21" }] });
    await api.patchBook({ version: 1, markup: 0.18 });
    const [book, item] = await api.changes();
    expect(book).toMatchObject({ summary: "Changed markup 15 % → 18 %", diff: { markup: { before: 0.15, after: 0.18 } }, userName: "Second-Admin" });
    expect(item!.summary).toBe(`Changed casing "Casing 2 1/2 colonial": 8' $10.15 → $10.60; 16' added at $21.00; 7' removed`);
  });

  it.each([
    ["stock lengths listed twice", { stock: [{ length: "8'", price: 1 }, { length: "96", price: 2 }] }, { "stock.1.length": `8' is listed twice.` }],
    ["a stock length in bare feet", { stock: [{ length: "8", price: 1 }] }, { "stock.0.length": expect.stringMatching(/under a foot/) }],
    ["a price in tenths of a cent", { stock: [{ length: "8'", price: "1.005" }] }, { "stock.0.price": expect.stringMatching(/at most 2 decimals/) }],
    ["thirteen stock lengths", { stock: Array.from({ length: 13 }, (_, i) => ({ length: 12 * (i + 2), price: 1 })) }, { stock: "At most 12 stock lengths per item." }],
    ["an unknown kind", { kind: "crown" }, { kind: "Kind must be casing, stool, apron, extension or other." }],
    ["an unreadable thickness", { thickness: "thin" }, { thickness: expect.stringMatching(/^Thickness: write a length/) }],
  ])("refuses %s with 422 on that field, nothing written", async (_, patch, fields) => {
    const w = await makeOrg("Sorrel");
    const api = await as(w);
    const before = await snapshot();
    const res = await api.addItem({ name: "Apron 3 1/2", kind: "apron", faceWidth: "3 1/2", thickness: "11/16", stock: [{ length: "8'", price: 1 }], ...patch });
    expect(res.status).toBe(422);
    expect(res.json.fields).toEqual(fields);
    expect(await snapshot()).toBe(before);
  });

  it.each([
    ["a supplier code another item has", { supplierCode: "tc-250" }, { supplierCode: `Supplier code tc-250 is already used by "Casing 2 1/2 colonial".` }],
    ["a name and kind another item has", { name: "casing 2 1/2  COLONIAL", supplierCode: null }, { name: `This book already has casing named "Casing 2 1/2 colonial".` }],
  ])("refuses %s with 409 on that field", async (_, patch, fields) => {
    const w = await makeOrg("Sorrel");
    const api = await as(w);
    const before = await snapshot();
    const res = await api.patchItem(w.priceBook.spareItem.id, { version: 1, kind: "casing", ...patch });
    expect(res.status).toBe(409);
    expect(res.json.fields).toEqual(fields);
    expect(await snapshot()).toBe(before);
  });

  it("refuses a second book of the same name, whatever its case", async () => {
    const w = await makeOrg("Sorrel");
    const api = await as(w);
    const res = await api.createBook({ name: w.priceBook.book.name.toUpperCase() });
    expect(res.status).toBe(409);
    expect(res.json.fields).toEqual({ name: "Name already used by another price book." });
  });

  it("deleting a book takes its items and keeps the log row that says so", async () => {
    const w = await makeOrg("Sorrel");
    const api = await as(w);
    expect((await api.deleteBook(1)).status).toBe(204);
    expect((await call(bookRoute.GET, { method: "GET", path: "/x", params: { orgSlug: w.org.slug, priceBookId: w.priceBook.book.id }, cookie: await sessionCookie(api.admin) })).status).toBe(404);
    const items = await pool.query("select id from price_book_items where price_book_id = $1", [w.priceBook.book.id]);
    expect(items.rows).toEqual([]);
    const log = await pool.query("select price_book_id, summary, user_id from price_book_changes where org_id = $1 and action = 'book.delete'", [w.org.id]);
    expect(log.rows).toEqual([{ price_book_id: null, summary: `Deleted price book "${w.priceBook.book.name}" and its 2 items`, user_id: api.admin.id }]);
  });

  it("an estimator reads the book and its items but has no write to make", async () => {
    const w = await makeOrg("Sorrel");
    const cookie = await sessionCookie(w.people.estimator);
    const res = await call(bookRoute.GET, { method: "GET", path: "/x", params: { orgSlug: w.org.slug, priceBookId: w.priceBook.book.id }, cookie });
    expect(res.status).toBe(200);
    expect((res.json.priceBook as PriceBookView).items.map((i: PriceBookItemView) => i.supplierCode)).toEqual(["TC-250", "TS-525"]);
  });
});

describe("the demo price book", () => {
  it("is seeded once, every item valid, and survives its own export and import unchanged", async () => {
    const { seedDemoPriceBook, DEMO_PRICE_BOOK_NAME } = await import("@/db/seed/demo-price-book");
    const w = await makeOrg("Sorrel");
    expect(await seedDemoPriceBook(w.org.id, w.people.admin.id)).toBe(true);
    expect(await seedDemoPriceBook(w.org.id, w.people.admin.id)).toBe(false);
    const cookie = await sessionCookie(w.people.admin);
    const list = await call(booksRoute.GET, { method: "GET", path: "/x", params: { orgSlug: w.org.slug }, cookie });
    const demo = (list.json.priceBooks as { id: string; name: string; itemCount: number; markup: number; taxRate: number }[]).find((b) => b.name === DEMO_PRICE_BOOK_NAME)!;
    expect(demo).toMatchObject({ itemCount: 10, markup: 0.15, taxRate: 0.0825 });
    const params = { orgSlug: w.org.slug, priceBookId: demo.id };
    const csv = await (await csvRoute.GET(new NextRequest("http://localhost/x", { headers: { cookie } }), { params: Promise.resolve(params) })).text();
    const preview = await call(csvRoute.POST, { method: "POST", path: "/x", params, body: { csv, mode: "replace" }, cookie });
    expect((preview.json.preview as ImportPreview).counts).toEqual({ create: 0, update: 0, unchanged: 10, error: 0, delete: 0 });
  });
});

type Api = Awaited<ReturnType<typeof as>>;
