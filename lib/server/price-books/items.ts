import { db, type Tx } from "@/db/client";
import { deleteItemAt, findItem, insertItems, updateItemAt } from "@/db/queries/price-books/items";
import { recordChanges } from "@/db/queries/price-books/changes";
import type { PriceBookScope, PriceBookWriter } from "@/db/queries/price-books/scope";
import { conflict, orNotFound, stale } from "@/lib/errors";
import { itemSummary } from "@/lib/price-books/describe";
import { itemDiff } from "@/lib/price-books/diff";
import { findClash } from "@/lib/price-books/identity";
import type { ItemFields, PriceBookItemView } from "@/lib/price-books/types";
import type { PriceBookItemCreateInput, PriceBookItemUpdateInput } from "@/lib/validators/price-books";
import { itemsOf, requireLockedBook } from "./book-scope";

const MISSING_ITEM = "No such item in this price book.";

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
  const clash = findClash(await itemsOf(s, tx), candidate, exceptId);
  if (clash) throw conflict(clash.message, { [clash.field]: clash.message });
}

const requireItem = async (s: PriceBookScope, itemId: string, tx: Tx): Promise<PriceBookItemView> => orNotFound(await findItem(s, itemId, tx), MISSING_ITEM);

export async function createPriceBookItem(w: PriceBookWriter, input: PriceBookItemCreateInput): Promise<PriceBookItemView> {
  return db.transaction(async (tx) => {
    await requireLockedBook(tx, w);
    const fields = fieldsOf(input);
    await assertDistinct(tx, w, fields);
    const [row] = await insertItems(tx, w, [fields]);
    const diff = itemDiff(null, fields);
    await recordChanges(tx, w, [{ action: "item.create", itemId: row!.id, summary: itemSummary("create", null, fields, diff), diff }]);
    return row!;
  });
}

/** One or more fields of an item; a stale version is refused with the item as it is now. */
export async function updatePriceBookItem(w: PriceBookWriter, itemId: string, input: PriceBookItemUpdateInput): Promise<PriceBookItemView> {
  return db.transaction(async (tx) => {
    await requireLockedBook(tx, w);
    const current = await requireItem(w, itemId, tx);
    if (current.version !== input.version) throw stale(current);
    const { version, ...set } = input;
    const before = fieldsOf(current);
    const after: ItemFields = { ...before, ...set, species: set.species ?? null, supplierCode: set.supplierCode ?? null };
    if (!("species" in set)) after.species = before.species;
    if (!("supplierCode" in set)) after.supplierCode = before.supplierCode;
    const diff = itemDiff(before, after);
    if (Object.keys(diff).length === 0) return current;
    await assertDistinct(tx, w, after, itemId);
    const row = await updateItemAt(tx, w, itemId, after, version);
    await recordChanges(tx, w, [{ action: "item.update", itemId, summary: itemSummary("update", before, after, diff), diff }]);
    return row!; // the book lock held since the version check
  });
}

export async function deletePriceBookItem(w: PriceBookWriter, itemId: string, version: number) {
  await db.transaction(async (tx) => {
    await requireLockedBook(tx, w);
    const current = await requireItem(w, itemId, tx);
    if (current.version !== version) throw stale(current);
    await deleteItemAt(tx, w, itemId, version);
    const before = fieldsOf(current);
    const diff = itemDiff(before, null);
    await recordChanges(tx, w, [{ action: "item.delete", itemId, summary: itemSummary("delete", before, null, diff), diff }]);
  });
}
