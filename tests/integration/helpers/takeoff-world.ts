import { db } from "@/db/client";
import { priceBookItems, priceBooks } from "@/db/schema";
import { testPrices } from "@/takeoff/testing/job-fixtures";

/** A price book whose items fit the world's windows (the same invented prices the unit tests use). */
export async function addTestPriceBook(orgId: string) {
  const p = testPrices();
  const [book] = await db
    .insert(priceBooks)
    .values({ orgId, name: `Test book ${Math.random().toString(36).slice(2, 7)}`, labour: p.labour, markup: p.markup, taxRate: p.taxRate, taxLabour: p.taxLabour })
    .returning({ id: priceBooks.id });
  const items = await db
    .insert(priceBookItems)
    .values(p.items.map(({ id: _id, ...i }) => ({ ...i, kind: i.kind, orgId, priceBookId: book!.id })))
    .returning({ id: priceBookItems.id, name: priceBookItems.name, kind: priceBookItems.kind, faceWidth: priceBookItems.faceWidth });
  return { priceBookId: book!.id, items };
}
