import { and, asc, eq, sql } from "drizzle-orm";
import { db, type Tx } from "../../client";
import { priceBookItems, priceBooks } from "../../schema";

/** What every price-book query takes: the tenant from the session, the book from the URL. */
export interface PriceBookScope {
  orgId: string;
  priceBookId: string;
}

/** Who is writing: the change log names them. */
export interface PriceBookWriter extends PriceBookScope {
  userId: string;
}

export const bookFields = {
  id: priceBooks.id,
  name: priceBooks.name,
  labour: priceBooks.labour,
  markup: priceBooks.markup,
  taxRate: priceBooks.taxRate,
  taxLabour: priceBooks.taxLabour,
  version: priceBooks.version,
  updatedAt: priceBooks.updatedAt,
} as const;

export const itemFields = {
  id: priceBookItems.id,
  name: priceBookItems.name,
  kind: priceBookItems.kind,
  faceWidth: priceBookItems.faceWidth,
  thickness: priceBookItems.thickness,
  species: priceBookItems.species,
  supplierCode: priceBookItems.supplierCode,
  stock: priceBookItems.stock,
  version: priceBookItems.version,
} as const;

export const bookWhere = (s: PriceBookScope) => and(eq(priceBooks.orgId, s.orgId), eq(priceBooks.id, s.priceBookId));
export const itemWhere = (s: PriceBookScope, itemId?: string) =>
  and(eq(priceBookItems.orgId, s.orgId), eq(priceBookItems.priceBookId, s.priceBookId), itemId ? eq(priceBookItems.id, itemId) : undefined);

export async function findBookSummary(s: PriceBookScope, tx: Tx = db) {
  const [row] = await tx.select(bookFields).from(priceBooks).where(bookWhere(s));
  return row ?? null;
}

/**
 * The book, locked until the transaction ends (null if there is none). Every write to a book or its items
 * takes this lock first, so checks that span rows (unique supplier codes, an import's plan) cannot race.
 */
export async function lockPriceBook(tx: Tx, s: PriceBookScope) {
  const [row] = await tx.select(bookFields).from(priceBooks).where(bookWhere(s)).for("update");
  return row ?? null;
}

/** Kinds in the order the enum declares them (casing, stool, apron, extension, other), then by name. */
export function listItems(s: PriceBookScope, tx: Tx = db) {
  return tx
    .select(itemFields)
    .from(priceBookItems)
    .where(itemWhere(s))
    .orderBy(asc(priceBookItems.kind), sql`lower(${priceBookItems.name})`, asc(priceBookItems.id));
}

export type BookRow = NonNullable<Awaited<ReturnType<typeof findBookSummary>>>;
export type ItemRow = Awaited<ReturnType<typeof listItems>>[number];
