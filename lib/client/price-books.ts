import { queryOptions } from "@tanstack/react-query";
import { z } from "zod";
import { request } from "./fetch";
import { orgKey, orgPath } from "./org-scope";
import { priceBookListEntrySchema } from "./price-book-schemas";

export const priceBooksPath = (orgSlug: string) => `${orgPath(orgSlug)}/price-books`;

/** The organisation's price books, cached as a bare list (the price-books page and the window list's gap check share it). */
export const priceBooksQuery = (orgSlug: string) =>
  queryOptions({
    queryKey: [...orgKey(orgSlug), "price-books"] as const,
    queryFn: async () => z.object({ priceBooks: z.array(priceBookListEntrySchema) }).parse(await request(priceBooksPath(orgSlug))).priceBooks,
  });

export const priceBooksKey = (orgSlug: string) => priceBooksQuery(orgSlug).queryKey;
