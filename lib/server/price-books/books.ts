import { db, type Tx } from "@/db/client";
import { recordChanges } from "@/db/queries/price-books/changes";
import type { PriceBookScope } from "@/db/queries/price-books/scope";
import { deleteBookAt, insertBook, isBookNameTaken, listPriceBooks as bookRows, lockBookNames, updateBookAt } from "@/db/queries/price-books/books";
import { conflict, stale } from "@/lib/errors";
import { bookDiff, type BookFields } from "@/lib/price-books/diff";
import { bookSummary } from "@/lib/price-books/describe";
import type { PriceBookListEntry, PriceBookSummary, PriceBookView } from "@/lib/price-books/types";
import type { PriceBookCreateInput, PriceBookUpdateInput } from "@/lib/validators/price-books";
import type { LabourRates } from "@/takeoff";
import { itemsOf, requireBook, requireLockedBook } from "./book-scope";

/** A new book's rates until someone sets them: zero reads as "not set", where a guess would mislead. */
export const UNSET_LABOUR: LabourRates = { minutesPerOpening: { "stool-and-apron": 0, "picture-frame": 0 }, minutesPerExtensionFoot: 0, hourlyRate: 0 };

const fieldsOf = (b: PriceBookSummary): BookFields => ({ name: b.name, labour: b.labour, markup: b.markup, taxRate: b.taxRate, taxLabour: b.taxLabour });

/** Book names are how people pick a book: two with one name (any case) would be a trap. */
async function assertNameFree(tx: Tx, orgId: string, name: string, exceptId?: string) {
  await lockBookNames(tx, orgId);
  if (await isBookNameTaken(tx, orgId, name, exceptId)) {
    throw conflict("This organisation already has a price book with that name.", { name: "Name already used by another price book." });
  }
}

export const listPriceBooks = (s: { orgId: string }): Promise<PriceBookListEntry[]> => bookRows(s);

export async function getPriceBook(s: PriceBookScope): Promise<PriceBookView> {
  const book = await requireBook(s);
  return { ...book, items: await itemsOf(s) };
}

export async function createPriceBook({ orgId, userId, input }: { orgId: string; userId: string; input: PriceBookCreateInput }): Promise<PriceBookSummary> {
  return db.transaction(async (tx) => {
    await assertNameFree(tx, orgId, input.name);
    const book = await insertBook(tx, orgId, {
      name: input.name,
      labour: input.labour ?? UNSET_LABOUR,
      markup: input.markup ?? 0,
      taxRate: input.taxRate ?? 0,
      taxLabour: input.taxLabour ?? false,
    });
    await recordChanges(tx, { orgId, userId, priceBookId: book.id }, [
      { action: "book.create", summary: bookSummary("create", book.name, {}), diff: bookDiff(null, fieldsOf(book)) },
    ]);
    return book;
  });
}

/** Name, labour rates, markup and tax; a stale version is refused with the book as it is now. */
export async function updatePriceBook(w: PriceBookScope & { userId: string }, input: PriceBookUpdateInput): Promise<PriceBookSummary> {
  return db.transaction(async (tx) => {
    const current = await requireLockedBook(tx, w);
    if (current.version !== input.version) throw stale(current);
    const { version: _, ...set } = input;
    const next = { ...fieldsOf(current), ...set };
    const diff = bookDiff(fieldsOf(current), next);
    if (Object.keys(diff).length === 0) return current;
    if (diff.name) await assertNameFree(tx, w.orgId, next.name, w.priceBookId);
    const row = await updateBookAt(tx, w, input.version, set);
    await recordChanges(tx, w, [{ action: "book.update", summary: bookSummary("update", next.name, diff), diff }]);
    return row!; // the lock held since the version check, so the row is there
  });
}

/** The book and its items go; the log keeps its rows (their book reference is cleared by the foreign key). */
export async function deletePriceBook(w: PriceBookScope & { userId: string }, version: number) {
  await db.transaction(async (tx) => {
    const current = await requireLockedBook(tx, w);
    if (current.version !== version) throw stale(current);
    const items = await itemsOf(w, tx);
    await recordChanges(tx, w, [
      { action: "book.delete", summary: bookSummary("delete", current.name, {}, items.length), diff: bookDiff(fieldsOf(current), null) },
    ]);
    await deleteBookAt(tx, w, version);
  });
}
