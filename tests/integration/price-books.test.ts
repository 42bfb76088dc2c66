import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";
import { pool } from "@/db/client";
import * as booksRoute from "@/app/api/orgs/[orgSlug]/price-books/route";
import * as bookRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/route";
import * as csvRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/csv/route";
import * as changesRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/changes/route";
import type { ImportPreview } from "@/lib/server/price-books/import";
import type { PriceBookChangeView, PriceBookItemView, PriceBookView } from "@/lib/price-books/types";
import { call, sessionCookie } from "./helpers/http";
import { priceBookApi, type PriceBookApi } from "./helpers/price-book-world";
import { snapshot } from "./helpers/snapshot";
import { addMember, makeOrg, type World } from "./helpers/world";

/** A second admin of `w`: the change log must name whoever made the change, not the book's creator. */
const asSecondAdmin = async (w: World) => priceBookApi(w, await addMember(w.org.id, "admin", "Second-Admin"));


describe("editing a price book", () => {
  it.each([
    ["a stale book edit", (api: PriceBookApi) => api.patchBook({ version: 9, markup: 0.2 }), () => ({ id: expect.any(String), version: 1, markup: 0.15 })],
    ["a stale item edit", (api: PriceBookApi, w: World) => api.patchItem(w.priceBook.item.id, { version: 9, name: "X" }), (w: World) => ({ id: w.priceBook.item.id, version: 1, name: "Casing 2 1/2 colonial" })],
    ["a stale item delete", (api: PriceBookApi, w: World) => api.deleteItem(w.priceBook.item.id, 9), (w: World) => ({ id: w.priceBook.item.id, version: 1 })],
    ["a stale book delete", (api: PriceBookApi) => api.deleteBook(9), () => ({ version: 1 })],
  ])("%s → 409 with the current row, nothing changed", async (_, act, current) => {
    const w = await makeOrg("Sorrel");
    const api = await asSecondAdmin(w);
    const before = await snapshot();
    const res = await act(api, w);
    expect(res.status).toBe(409);
    expect(res.json.current).toMatchObject(current(w));
    expect(await snapshot()).toBe(before);
  });

  it.each([
    ["book.create", (api: PriceBookApi) => api.createBook({ name: "Autumn list" }), 201],
    ["book.update", (api: PriceBookApi) => api.patchBook({ version: 1, taxRate: 0.09, labour: { minutesPerOpening: { "stool-and-apron": 50, "picture-frame": 30 }, minutesPerExtensionFoot: 2, hourlyRate: "61.50" } }), 200],
    ["item.create", (api: PriceBookApi) => api.addItem({ name: "Apron 3 1/2", kind: "apron", faceWidth: "3 1/2", thickness: "11/16", stock: [{ length: "8'", price: 12.4 }] }), 201],
    ["item.update", (api: PriceBookApi, w: World) => api.patchItem(w.priceBook.item.id, { version: 1, stock: [{ length: "8'", price: "10.60" }, { length: "16'", price: "21" }] }), 200],
    ["item.delete", (api: PriceBookApi, w: World) => api.deleteItem(w.priceBook.spareItem.id, 1), 204],
  ])("%s leaves a change-log row naming who did it", async (action, act, status) => {
    const w = await makeOrg("Sorrel");
    const api = await asSecondAdmin(w);
    const res = await act(api, w);
    expect(res.status).toBe(status);
    const { rows } = await pool.query(
      "select user_id, action, summary, diff from price_book_changes where org_id = $1 order by at desc limit 1",
      [w.org.id],
    );
    expect(rows[0]).toMatchObject({ user_id: api.person.id, action });
    expect(rows[0].summary).toEqual(expect.any(String));
  });

  it("logs a price change per stock length and a rate change in percent", async () => {
    const w = await makeOrg("Sorrel");
    const api = await asSecondAdmin(w);
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
    const api = await asSecondAdmin(w);
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
    const api = await asSecondAdmin(w);
    const before = await snapshot();
    const res = await api.patchItem(w.priceBook.spareItem.id, { version: 1, kind: "casing", ...patch });
    expect(res.status).toBe(409);
    expect(res.json.fields).toEqual(fields);
    expect(await snapshot()).toBe(before);
  });

  it("keeps labour rates per opening kind, logs them by name, and refuses a negative one on its field", async () => {
    const w = await makeOrg("Sorrel");
    const api = await asSecondAdmin(w);
    const labour = { minutesPerOpening: { "stool-and-apron": 45, "picture-frame": 30 }, minutesPerExtensionFoot: 2, hourlyRate: 58 };
    const before = await snapshot();
    const bad = await api.patchBook({ version: 1, labour: { ...labour, minutesPerMull: -1 } });
    expect(bad.status).toBe(422);
    expect(bad.json.fields).toEqual({ "labour.minutesPerMull": "Minutes per mull must be zero or more." });
    expect(await snapshot()).toBe(before);
    const ok = await api.patchBook({ version: 1, labour: { ...labour, minutesPerDoorSide: 25, minutesArchPremium: "60" } });
    expect(ok.status).toBe(200);
    expect((ok.json.priceBook as { labour: unknown }).labour).toEqual({ ...labour, minutesPerDoorSide: 25, minutesArchPremium: 60 });
    const [change] = await api.changes();
    expect(change!.summary).toMatch(/minutes per door side/);
  });

  it("refuses a second book of the same name, whatever its case", async () => {
    const w = await makeOrg("Sorrel");
    const api = await asSecondAdmin(w);
    const res = await api.createBook({ name: w.priceBook.book.name.toUpperCase() });
    expect(res.status).toBe(409);
    expect(res.json.fields).toEqual({ name: "Name already used by another price book." });
  });

  it("deleting a book takes its items and keeps the log row that says so", async () => {
    const w = await makeOrg("Sorrel");
    const api = await asSecondAdmin(w);
    expect((await api.deleteBook(1)).status).toBe(204);
    expect((await call(bookRoute.GET, { method: "GET", path: "/x", params: { orgSlug: w.org.slug, priceBookId: w.priceBook.book.id }, cookie: await sessionCookie(api.person) })).status).toBe(404);
    const items = await pool.query("select id from price_book_items where price_book_id = $1", [w.priceBook.book.id]);
    expect(items.rows).toEqual([]);
    const log = await pool.query("select price_book_id, summary, user_id from price_book_changes where org_id = $1 and action = 'book.delete'", [w.org.id]);
    expect(log.rows).toEqual([{ price_book_id: null, summary: `Deleted price book "${w.priceBook.book.name}" and its 2 items`, user_id: api.person.id }]);
  });

  it("an estimator reads the book and its items but has no write to make", async () => {
    const w = await makeOrg("Sorrel");
    const cookie = await sessionCookie(w.people.estimator);
    const res = await call(bookRoute.GET, { method: "GET", path: "/x", params: { orgSlug: w.org.slug, priceBookId: w.priceBook.book.id }, cookie });
    expect(res.status).toBe(200);
    expect((res.json.priceBook as PriceBookView).items.map((i: PriceBookItemView) => i.supplierCode)).toEqual(["TC-250", "TS-525"]);
  });
});

describe("the change log", () => {
  it.each([["0"], ["501"], ["ten"]])("refuses ?limit=%s with 422 naming the limit", async (limit) => {
    const w = await makeOrg("Sorrel");
    const cookie = await sessionCookie(w.people.project_manager);
    const res = await call(changesRoute.GET, { method: "GET", path: `/x?limit=${limit}`, params: { orgSlug: w.org.slug, priceBookId: w.priceBook.book.id }, cookie });
    expect(res.status).toBe(422);
    expect(res.json.fields).toEqual({ limit: "Limit must be a whole number from 1 to 500." });
  });

  it("lists the newest first and names who made each change", async () => {
    const w = await makeOrg("Sorrel");
    const cookie = await sessionCookie(w.people.project_manager);
    const res = await call(changesRoute.GET, { method: "GET", path: "/x?limit=2", params: { orgSlug: w.org.slug, priceBookId: w.priceBook.book.id }, cookie });
    expect((res.json.changes as PriceBookChangeView[]).map((c) => [c.action, c.userName])).toEqual([
      ["item.create", w.people.admin.name],
      ["item.create", w.people.admin.name],
    ]);
  });
});

describe("the demo price book", () => {
  it("is found again by its seed key after being renamed, so seeding again adds no second book", async () => {
    const { seedDemoPriceBook } = await import("@/scripts/seed/demo-price-book");
    const { pool } = await import("@/db/client");
    const w = await makeOrg("Sorrel");
    const books = async () => (await pool.query("select count(*)::int as n from price_books where org_id = $1", [w.org.id])).rows[0].n as number;
    const first = await seedDemoPriceBook(w.org.id, w.people.admin.id);
    const count = await books();
    await pool.query("update price_books set name = 'Our own 2027 prices' where id = $1", [first.id]);
    expect(await seedDemoPriceBook(w.org.id, w.people.admin.id)).toEqual({ id: first.id, created: false });
    expect(await books()).toBe(count);
  });

  it("is seeded once, every item valid, and survives its own export and import unchanged", async () => {
    const { seedDemoPriceBook, DEMO_PRICE_BOOK_NAME } = await import("@/scripts/seed/demo-price-book");
    const w = await makeOrg("Sorrel");
    expect(await seedDemoPriceBook(w.org.id, w.people.admin.id)).toMatchObject({ created: true });
    expect(await seedDemoPriceBook(w.org.id, w.people.admin.id)).toMatchObject({ created: false });
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
