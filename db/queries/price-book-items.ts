import { and, eq, sql } from "drizzle-orm";
import { db, type Tx } from "../client";
import { priceBookItems } from "../schema";
import { conflict, notFound, stale } from "@/lib/errors";
import { itemSummary } from "@/lib/price-book/describe";
import { itemDiff } from "@/lib/price-book/diff";
import { findClash } from "@/lib/price-book/identity";
import type { ItemFields, PriceBookItemView } from "@/lib/price-book/types";
import type { PriceBookItemCreateInput, PriceBookItemUpdateInput } from "@/lib/validators/price-book";
import { recordChanges } from "./price-book-changes";
import { itemFields, itemWhere, listItems, lockPriceBook, type PriceBookScope, type PriceBookWriter } from "./price-book-scope";

const fieldsOf = (i: PriceBookItemView | PriceBookItemCreateInput): ItemFields => ({
  name: i.name,
  kind: i.kind,
  faceWidth: i.faceWidth,
  thickness: i.thickness,
  species: i.species ?? null,
  supplierCode: i.supplierCode ?? null,
  stock: i.stock,
});

/** A CSV row names its item by supplier code or by name and kind, so neither may repeat in a book. */
async function assertDistinct(tx: Tx, s: PriceBookScope, candidate: ItemFields, exceptId?: string) {
  const clash = findClash(await listItems(s, tx), candidate, exceptId);
  if (clash) throw conflict(clash.message, { [clash.field]: clash.message });
}

async function getItem(s: PriceBookScope, itemId: string, tx: Tx = db): Promise<PriceBookItemView> {
  const [row] = await tx.select(itemFields).from(priceBookItems).where(itemWhere(s, itemId));
  if (!row) throw notFound("No such item in this price book.");
  return row;
}

export async function createPriceBookItem(w: PriceBookWriter, input: PriceBookItemCreateInput): Promise<PriceBookItemView> {
  return db.transaction(async (tx) => {
    await lockPriceBook(tx, w);
    const fields = fieldsOf(input);
    await assertDistinct(tx, w, fields);
    const [row] = await tx
      .insert(priceBookItems)
      .values({ orgId: w.orgId, priceBookId: w.priceBookId, ...fields })
      .returning(itemFields);
    const diff = itemDiff(null, fields);
    await recordChanges(tx, w, [{ action: "item.create", itemId: row!.id, summary: itemSummary("create", null, fields, diff), diff }]);
    return row!;
  });
}

/** One or more fields of an item; a stale version is refused with the item as it is now. */
export async function updatePriceBookItem(w: PriceBookWriter, itemId: string, input: PriceBookItemUpdateInput): Promise<PriceBookItemView> {
  return db.transaction(async (tx) => {
    await lockPriceBook(tx, w);
    const current = await getItem(w, itemId, tx);
    if (current.version !== input.version) throw stale(current);
    const { version, ...set } = input;
    const before = fieldsOf(current);
    const after: ItemFields = { ...before, ...set, species: set.species ?? null, supplierCode: set.supplierCode ?? null };
    if (!("species" in set)) after.species = before.species;
    if (!("supplierCode" in set)) after.supplierCode = before.supplierCode;
    const diff = itemDiff(before, after);
    if (Object.keys(diff).length === 0) return current;
    await assertDistinct(tx, w, after, itemId);
    const [row] = await tx
      .update(priceBookItems)
      .set({ ...after, version: sql`${priceBookItems.version} + 1`, updatedAt: new Date() })
      .where(and(itemWhere(w, itemId), eq(priceBookItems.version, version)))
      .returning(itemFields);
    await recordChanges(tx, w, [{ action: "item.update", itemId, summary: itemSummary("update", before, after, diff), diff }]);
    return row!;
  });
}

export async function deletePriceBookItem(w: PriceBookWriter, itemId: string, version: number) {
  await db.transaction(async (tx) => {
    await lockPriceBook(tx, w);
    const current = await getItem(w, itemId, tx);
    if (current.version !== version) throw stale(current);
    await tx.delete(priceBookItems).where(and(itemWhere(w, itemId), eq(priceBookItems.version, version)));
    const before = fieldsOf(current);
    const diff = itemDiff(before, null);
    await recordChanges(tx, w, [{ action: "item.delete", itemId, summary: itemSummary("delete", before, null, diff), diff }]);
  });
}
