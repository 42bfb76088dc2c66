import { queryOptions } from "@tanstack/react-query";
import type { PriceBookChangeView, PriceBookView } from "@/lib/price-book/types";
import { request } from "./fetch";
import { orgKey, orgPath } from "./org-scope";

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
    queryFn: async () => (await request<{ priceBook: PriceBookView }>(priceBookPath(s))).priceBook,
  });

/** The book's change log, newest first, cached as a bare list. */
export const priceBookChangesQuery = (s: PriceBookScope) =>
  queryOptions({
    queryKey: [...priceBookPrefix(s), "changes"] as const,
    queryFn: async () => (await request<{ changes: PriceBookChangeView[] }>(`${priceBookPath(s)}/changes`)).changes,
  });

export const priceBookKey = (s: PriceBookScope) => priceBookQuery(s).queryKey;
export const priceBookChangesKey = (s: PriceBookScope) => priceBookChangesQuery(s).queryKey;
