import { randomBytes } from "node:crypto";
import { NextRequest } from "next/server";
import * as booksRoute from "@/app/api/orgs/[orgSlug]/price-books/route";
import * as bookRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/route";
import * as itemsRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/items/route";
import * as itemRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/items/[itemId]/route";
import * as csvRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/csv/route";
import * as changesRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/changes/route";
import { createPriceBook } from "@/lib/server/price-books/books";
import { createPriceBookItem } from "@/lib/server/price-books/items";
import type { PriceBookChangeView, PriceBookView } from "@/lib/price-books/types";
import { priceBookItemCreateSchema } from "@/lib/validators/price-books";
import { call, sessionCookie } from "./http";
// Types only: world.ts imports this file to build its organisations.
import type { Person, World } from "./world";

/** An item as a person would type it, through the same schema the API uses. */
export const casingInput = (over: Record<string, unknown> = {}) =>
  priceBookItemCreateSchema.parse({
    name: "Casing 2 1/2 colonial",
    kind: "casing",
    faceWidth: "2 1/2",
    thickness: "11/16",
    species: "Primed finger-joint pine",
    supplierCode: "TC-250",
    stock: [
      { length: "7'", price: "8.90" },
      { length: "8'", price: "10.15" },
    ],
    ...over,
  });

/** A price book with two items (one to edit, one to delete), written by the organisation's admin. */
export async function makePriceBook(s: { orgId: string; userId: string }) {
  const book = await createPriceBook({
    orgId: s.orgId,
    userId: s.userId,
    input: {
      name: `Shop prices ${randomBytes(3).toString("hex")}`,
      labour: { minutesPerOpening: { "stool-and-apron": 45, "picture-frame": 30 }, minutesPerExtensionFoot: 2, hourlyRate: 58 },
      markup: 0.15,
      taxRate: 0.0825,
    },
  });
  const scope = { ...s, priceBookId: book.id };
  const item = await createPriceBookItem(scope, casingInput());
  const spareItem = await createPriceBookItem(
    scope,
    casingInput({ name: "Stool 5 1/4 bullnose", kind: "stool", faceWidth: "5 1/4", thickness: "3/4", supplierCode: "TS-525", stock: [{ length: "10'", price: "34.00" }] }),
  );
  return { book, item, spareItem };
}

/**
 * The price-book routes as `person` calls them on `w`'s book. Tests pass a second admin, so "the right
 * user" in the change log is not simply whoever created the book.
 */
export async function priceBookApi(w: World, person: Person) {
  const cookie = await sessionCookie(person);
  const org = { orgSlug: w.org.slug };
  const bookParams = { ...org, priceBookId: w.priceBook.book.id };
  const item = (itemId: string) => ({ ...bookParams, itemId });
  return {
    person,
    createBook: (body: unknown) => call(booksRoute.POST, { method: "POST", path: "/x", params: org, body, cookie }),
    book: async () => (await call(bookRoute.GET, { method: "GET", path: "/x", params: bookParams, cookie })).json.priceBook as PriceBookView,
    patchBook: (body: unknown) => call(bookRoute.PATCH, { method: "PATCH", path: "/x", params: bookParams, body, cookie }),
    deleteBook: (version: number) => call(bookRoute.DELETE, { method: "DELETE", path: `/x?version=${version}`, params: bookParams, cookie }),
    addItem: (body: unknown) => call(itemsRoute.POST, { method: "POST", path: "/x", params: bookParams, body, cookie }),
    patchItem: (id: string, body: unknown) => call(itemRoute.PATCH, { method: "PATCH", path: "/x", params: item(id), body, cookie }),
    deleteItem: (id: string, version: number) => call(itemRoute.DELETE, { method: "DELETE", path: `/x?version=${version}`, params: item(id), cookie }),
    /** Through the handler directly: the download's headers are what is under test. */
    exportCsv: async () => {
      const res = await csvRoute.GET(new NextRequest("http://localhost/x", { headers: { cookie } }), { params: Promise.resolve(bookParams) });
      return { res, text: await res.text() };
    },
    importCsv: (body: { csv?: string; mode?: string; apply?: boolean; previewToken?: string }) => call(csvRoute.POST, { method: "POST", path: "/x", params: bookParams, body, cookie }),
    changes: async () => (await call(changesRoute.GET, { method: "GET", path: "/x", params: bookParams, cookie })).json.changes as PriceBookChangeView[],
  };
}
export type PriceBookApi = Awaited<ReturnType<typeof priceBookApi>>;
