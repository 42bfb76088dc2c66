import { listChangeRows, MAX_CHANGES } from "@/db/queries/price-books/changes";
import type { PriceBookScope } from "@/db/queries/price-books/scope";
import type { PriceBookChangeView } from "@/lib/price-books/types";
import { requireBook } from "./book-scope";

export { MAX_CHANGES };

/** The book's log, newest first. */
export async function listPriceBookChanges(s: PriceBookScope & { limit?: number }): Promise<PriceBookChangeView[]> {
  await requireBook(s);
  return listChangeRows(s);
}
