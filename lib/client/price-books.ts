import { queryOptions } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { PriceBookListEntry } from "@/lib/price-book/types";

/** The organisation's price books, cached as a bare list (the price-books page and the window list's gap check share it). */
export const priceBooksQuery = (orgSlug: string) =>
  queryOptions({
    queryKey: ["orgs", orgSlug, "price-books"] as const,
    queryFn: async () => (await api<{ priceBooks: PriceBookListEntry[] }>(`/api/orgs/${orgSlug}/price-books`)).priceBooks,
  });

export const priceBooksKey = (orgSlug: string) => priceBooksQuery(orgSlug).queryKey;
