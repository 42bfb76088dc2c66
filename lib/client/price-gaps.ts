import { keepPreviousData, queryOptions } from "@tanstack/react-query";
import type { PriceGapsView } from "@/db/queries/price-gaps";
import { request } from "./fetch";
import { projectKey, projectPath, type ProjectScope } from "./project-scope";

/**
 * The window list checked against a price book (the org's first when none is chosen). `typesVersion` is part
 * of the key, so an edit of the list that opens or closes a gap is re-read at once.
 */
export const priceGapsQuery = (s: ProjectScope, priceBookId: string | null, typesVersion: string) =>
  queryOptions({
    queryKey: [...projectKey(s), "price-gaps", priceBookId, typesVersion] as const,
    queryFn: () => request<PriceGapsView>(`${projectPath(s)}/price-gaps${priceBookId ? `?priceBookId=${encodeURIComponent(priceBookId)}` : ""}`),
    placeholderData: keepPreviousData,
  });
