import { keepPreviousData, queryOptions } from "@tanstack/react-query";
import { z } from "zod";
import type { PriceGapsView } from "@/lib/plans/api-types";
import { request } from "./fetch";
import { projectKey, projectPath, type ProjectScope } from "./project-scope";

export const priceGapsSchema = z.object({
  priceBook: z.object({ id: z.string(), name: z.string() }).nullable(),
  gaps: z.array(
    z.object({ openingTypeId: z.string(), mark: z.string(), material: z.string(), kind: z.enum(["no-item", "too-long", "cannot-cut"]), message: z.string(), fix: z.string() }),
  ),
}) satisfies z.ZodType<PriceGapsView>;

/**
 * The window list checked against a price book (the org's first when none is chosen). `typesVersion` is part
 * of the key, so an edit of the list that opens or closes a gap is re-read at once.
 */
export const priceGapsQuery = (s: ProjectScope, priceBookId: string | null, typesVersion: string) =>
  queryOptions({
    queryKey: [...projectKey(s), "price-gaps", priceBookId, typesVersion] as const,
    queryFn: async () => priceGapsSchema.parse(await request(`${projectPath(s)}/price-gaps${priceBookId ? `?priceBookId=${encodeURIComponent(priceBookId)}` : ""}`)),
    placeholderData: keepPreviousData,
  });
