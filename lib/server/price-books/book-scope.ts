import type { Tx } from "@/db/client";
import { findBookSummary, listItems, lockPriceBook, type PriceBookScope } from "@/db/queries/price-books/scope";
import { orNotFound } from "@/lib/errors";
import type { PriceBookItemView, PriceBookSummary } from "@/lib/price-books/types";

export const MISSING_BOOK = "No such price book.";

/** The book's summary, or 404: another organisation's book is "not found", like one that never was. */
export async function requireBook(s: PriceBookScope, tx?: Tx): Promise<PriceBookSummary> {
  return orNotFound(await findBookSummary(s, tx), MISSING_BOOK);
}

/** The book locked for this transaction, or 404 (see lockPriceBook). */
export async function requireLockedBook(tx: Tx, s: PriceBookScope): Promise<PriceBookSummary> {
  return orNotFound(await lockPriceBook(tx, s), MISSING_BOOK);
}

export const itemsOf = (s: PriceBookScope, tx?: Tx): Promise<PriceBookItemView[]> => listItems(s, tx);
