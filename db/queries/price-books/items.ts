import { and, eq, inArray, sql } from "drizzle-orm";
import { db, type Tx } from "../../client";
import { priceBookItems } from "../../schema";
import { itemFields, itemWhere, type PriceBookScope } from "./scope";

export type ItemValues = Pick<typeof priceBookItems.$inferInsert, "name" | "kind" | "faceWidth" | "thickness" | "species" | "supplierCode" | "stock">;

export async function findItem(s: PriceBookScope, itemId: string, tx: Tx = db) {
  const [row] = await tx.select(itemFields).from(priceBookItems).where(itemWhere(s, itemId));
  return row ?? null;
}

export async function insertItems(tx: Tx, s: PriceBookScope, values: ItemValues[]) {
  if (values.length === 0) return [];
  return tx
    .insert(priceBookItems)
    .values(values.map((v) => ({ orgId: s.orgId, priceBookId: s.priceBookId, ...v })))
    .returning(itemFields);
}

/** The item after the update, or null when no item had this id (and version, when given). */
export async function updateItemAt(tx: Tx, s: PriceBookScope, itemId: string, values: ItemValues, version?: number) {
  const [row] = await tx
    .update(priceBookItems)
    .set({ ...values, version: sql`${priceBookItems.version} + 1`, updatedAt: new Date() })
    .where(and(itemWhere(s, itemId), version === undefined ? undefined : eq(priceBookItems.version, version)))
    .returning(itemFields);
  return row ?? null;
}

export async function deleteItemAt(tx: Tx, s: PriceBookScope, itemId: string, version: number) {
  await tx.delete(priceBookItems).where(and(itemWhere(s, itemId), eq(priceBookItems.version, version)));
}

export async function deleteItems(tx: Tx, s: PriceBookScope, ids: string[]) {
  if (ids.length === 0) return;
  await tx.delete(priceBookItems).where(and(itemWhere(s), inArray(priceBookItems.id, ids)));
}
