import { queryOptions } from "@tanstack/react-query";
import { z } from "zod";
import type { PriceBookView } from "@/lib/price-book/types";
import { request } from "./fetch";
import { orgKey, orgPath } from "./org-scope";
import { priceBookChangeSchema, priceBookSchema } from "./price-book-schemas";

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
