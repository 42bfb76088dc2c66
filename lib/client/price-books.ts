import { queryOptions } from "@tanstack/react-query";
import { z } from "zod";
import type { PriceBookView } from "@/lib/price-books/types";
import { request } from "./fetch";
import { orgKey, orgPath } from "./org-scope";
import { priceBookChangeSchema, priceBookListEntrySchema, priceBookSchema } from "./price-books-schemas";

// Price books on the client: the organisation's list, one book with its items, and its change log.
export const priceBooksPath = (orgSlug: string) => `${orgPath(orgSlug)}/price-books`;

/** The organisation's price books, cached as a bare list (the price-books page and the window list's gap check share it). */
export const priceBooksQuery = (orgSlug: string) =>
  queryOptions({
    queryKey: [...orgKey(orgSlug), "price-books"] as const,
    queryFn: async () => z.object({ priceBooks: z.array(priceBookListEntrySchema) }).parse(await request(priceBooksPath(orgSlug))).priceBooks,
  });

export const priceBooksKey = (orgSlug: string) => priceBooksQuery(orgSlug).queryKey;

export interface PriceBookScope {
  orgSlug: string;
  priceBookId: string;
}

export const priceBookPath = (s: PriceBookScope) => `${orgPath(s.orgSlug)}/price-books/${s.priceBookId}`;

/** The book and its log sit under this prefix (apart from the list, so deleting a book does not re-read it). */
export const priceBookPrefix = (s: PriceBookScope) => [...orgKey(s.orgSlug), "price-book", s.priceBookId] as const;

/** One price book with its items, cached as the bare book. */
export const priceBookQuery = (s: PriceBookScope) =>
  queryOptions({
    queryKey: [...priceBookPrefix(s), "book"] as const,
    // Typed as the view the routes build, whose summary edits (putBook) write into this entry too.
    queryFn: async (): Promise<PriceBookView> => z.object({ priceBook: priceBookSchema }).parse(await request(priceBookPath(s))).priceBook,
  });

/** The book's change log, newest first, cached as a bare list. */
export const priceBookChangesQuery = (s: PriceBookScope) =>
  queryOptions({
    queryKey: [...priceBookPrefix(s), "changes"] as const,
    queryFn: async () => z.object({ changes: z.array(priceBookChangeSchema) }).parse(await request(`${priceBookPath(s)}/changes`)).changes,
  });

export const priceBookKey = (s: PriceBookScope) => priceBookQuery(s).queryKey;
export const priceBookChangesKey = (s: PriceBookScope) => priceBookChangesQuery(s).queryKey;