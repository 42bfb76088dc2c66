import { and, asc, eq, sql } from "drizzle-orm";
import { db, type Tx } from "../client";
import { priceBookItems, priceBooks } from "../schema";
import { conflict, stale } from "@/lib/errors";
import { bookDiff, type BookFields } from "@/lib/price-book/diff";
import { bookSummary } from "@/lib/price-book/describe";
import type { PriceBookListEntry, PriceBookSummary, PriceBookView } from "@/lib/price-book/types";
import type { PriceBookCreateInput, PriceBookUpdateInput } from "@/lib/validators/price-book";
import type { LabourRates } from "@/takeoff";
import { recordChanges } from "./price-book-changes";
import { bookFields, bookWhere, getBookSummary, listItems, lockPriceBook, type PriceBookScope } from "./price-book-scope";

/** A new book's rates until someone sets them: zero reads as "not set", where a guess would mislead. */
export const UNSET_LABOUR: LabourRates = { minutesPerOpening: { "stool-and-apron": 0, "picture-frame": 0 }, minutesPerExtensionFoot: 0, hourlyRate: 0 };

const fieldsOf = (b: PriceBookSummary): BookFields => ({ name: b.name, labour: b.labour, markup: b.markup, taxRate: b.taxRate, taxLabour: b.taxLabour });

/** Book names are how people pick a book: two with one name (any case) would be a trap. */
async function assertNameFree(tx: Tx, orgId: string, name: string, exceptId?: string) {
  const [clash] = await tx
    .select({ id: priceBooks.id })
    .from(priceBooks)
    .where(and(eq(priceBooks.orgId, orgId), sql`lower(${priceBooks.name}) = lower(${name})`, exceptId ? sql`${priceBooks.id} <> ${exceptId}` : undefined));
  if (clash) throw conflict("This organisation already has a price book with that name.", { name: "Name already used by another price book." });
}

export async function listPriceBooks({ orgId }: { orgId: string }): Promise<PriceBookListEntry[]> {
  return db
    .select({ ...bookFields, itemCount: sql<number>`count(${priceBookItems.id})::int` })
    .from(priceBooks)
    .leftJoin(priceBookItems, eq(priceBookItems.priceBookId, priceBooks.id))
    .where(eq(priceBooks.orgId, orgId))
    .groupBy(priceBooks.id)
    .orderBy(sql`lower(${priceBooks.name})`, asc(priceBooks.id));
}

export async function getPriceBook(s: PriceBookScope): Promise<PriceBookView> {
  const book = await getBookSummary(s);
  return { ...book, items: await listItems(s) };
}

export async function createPriceBook({ orgId, userId, input }: { orgId: string; userId: string; input: PriceBookCreateInput }): Promise<PriceBookSummary> {
  return db.transaction(async (tx) => {
    // Serialises creations in one organisation, so two people cannot both take a free name.
    await tx.execute(sql`select pg_advisory_xact_lock(hashtext(${`price-book-names:${orgId}`}))`);
    await assertNameFree(tx, orgId, input.name);
    const [row] = await tx
      .insert(priceBooks)
      .values({
        orgId,
        name: input.name,
        labour: input.labour ?? UNSET_LABOUR,
        markup: input.markup ?? 0,
        taxRate: input.taxRate ?? 0,
        taxLabour: input.taxLabour ?? false,
      })
      .returning(bookFields);
    const book = row!;
    await recordChanges(tx, { orgId, userId, priceBookId: book.id }, [
      { action: "book.create", summary: bookSummary("create", book.name, {}), diff: bookDiff(null, fieldsOf(book)) },
    ]);
    return book;
  });
}

/** Name, labour rates, markup and tax; a stale version is refused with the book as it is now. */
export async function updatePriceBook(w: PriceBookScope & { userId: string }, input: PriceBookUpdateInput): Promise<PriceBookSummary> {
  return db.transaction(async (tx) => {
    const current = await lockPriceBook(tx, w);
    if (current.version !== input.version) throw stale(current);
    const { version: _, ...set } = input;
    const next = { ...fieldsOf(current), ...set };
    const diff = bookDiff(fieldsOf(current), next);
    if (Object.keys(diff).length === 0) return current;
    if (diff.name) {
      await tx.execute(sql`select pg_advisory_xact_lock(hashtext(${`price-book-names:${w.orgId}`}))`);
      await assertNameFree(tx, w.orgId, next.name, w.priceBookId);
    }
    const [row] = await tx
      .update(priceBooks)
      .set({ ...set, version: sql`${priceBooks.version} + 1`, updatedAt: new Date() })
      .where(and(bookWhere(w), eq(priceBooks.version, input.version)))
      .returning(bookFields);
    await recordChanges(tx, w, [{ action: "book.update", summary: bookSummary("update", next.name, diff), diff }]);
    return row!;
  });
}

/** The book and its items go; the log keeps its rows (their book reference is cleared by the foreign key). */
export async function deletePriceBook(w: PriceBookScope & { userId: string }, version: number) {
  await db.transaction(async (tx) => {
    const current = await lockPriceBook(tx, w);
    if (current.version !== version) throw stale(current);
    const items = await listItems(w, tx);
    await recordChanges(tx, w, [
      { action: "book.delete", summary: bookSummary("delete", current.name, {}, items.length), diff: bookDiff(fieldsOf(current), null) },
    ]);
    await tx.delete(priceBooks).where(and(bookWhere(w), eq(priceBooks.version, version)));
  });
}
