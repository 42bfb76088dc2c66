"use client";

import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { priceBooksQuery } from "@/lib/client/price-books";
import { priceGapsQuery } from "@/lib/client/price-gaps";

/**
 * The window list checked against a price book, re-read whenever the list or the chosen book changes
 * (the opening-types key is part of this query's key, so an edit that opens or closes a gap shows at once).
 */
export function usePriceGaps(orgSlug: string, projectId: string, typesVersion: string) {
  const [priceBookId, setPriceBookId] = useState<string | null>(null);
  const books = useQuery(priceBooksQuery(orgSlug));
  const gaps = useQuery(priceGapsQuery({ orgSlug, projectId }, priceBookId, typesVersion));
  return { books, gaps, priceBookId: priceBookId ?? gaps.data?.priceBook?.id ?? null, choose: setPriceBookId };
}
