import { and, asc, eq, sql } from "drizzle-orm";
import { db, type Tx } from "../../client";
import { priceBookItems, priceBooks } from "../../schema";
import { bookFields, bookWhere, type PriceBookScope } from "./scope";

type BookValues = Pick<typeof priceBooks.$inferInsert, "name" | "labour" | "markup" | "taxRate" | "taxLabour">;

/** Serialises name changes in one organisation until the transaction ends, so two people cannot both take a free name. */
export async function lockBookNames(tx: Tx, orgId: string) {
  await tx.execute(sql`select pg_advisory_xact_lock(hashtext(${`price-book-names:${orgId}`}))`);
}

/** Whether another of the organisation's books has this name, in any case. */
export async function isBookNameTaken(tx: Tx, orgId: string, name: string, exceptId?: string): Promise<boolean> {
  const [clash] = await tx
    .select({ id: priceBooks.id })
    .from(priceBooks)
    .where(and(eq(priceBooks.orgId, orgId), sql`lower(${priceBooks.name}) = lower(${name})`, exceptId ? sql`${priceBooks.id} <> ${exceptId}` : undefined));
  return clash !== undefined;
}

export async function listPriceBooks({ orgId }: { orgId: string }) {
  return db
    .select({ ...bookFields, itemCount: sql<number>`count(${priceBookItems.id})::int` })
    .from(priceBooks)
    .leftJoin(priceBookItems, eq(priceBookItems.priceBookId, priceBooks.id))
    .where(eq(priceBooks.orgId, orgId))
    .groupBy(priceBooks.id)
    .orderBy(sql`lower(${priceBooks.name})`, asc(priceBooks.id));
}

export async function insertBook(tx: Tx, orgId: string, values: BookValues) {
  const [row] = await tx.insert(priceBooks).values({ orgId, ...values }).returning(bookFields);
  return row!;
}

/** The book after the update, or null when no book had this id and version. */
export async function updateBookAt(tx: Tx, s: PriceBookScope, version: number, values: Partial<BookValues>) {
  const [row] = await tx
    .update(priceBooks)
    .set({ ...values, version: sql`${priceBooks.version} + 1`, updatedAt: new Date() })
    .where(and(bookWhere(s), eq(priceBooks.version, version)))
    .returning(bookFields);
  return row ?? null;
}

export async function deleteBookAt(tx: Tx, s: PriceBookScope, version: number) {
  await tx.delete(priceBooks).where(and(bookWhere(s), eq(priceBooks.version, version)));
}
