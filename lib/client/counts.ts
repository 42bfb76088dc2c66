import { queryOptions } from "@tanstack/react-query";
import { request } from "./fetch";
import type { CountsView } from "@/lib/plans/api-types";
import { projectKey, projectPath, type ProjectScope } from "./project-scope";

/** Openings counted per sheet, per unit type and for the job, cached as the bare CountsView. */
export const countsQuery = (s: ProjectScope) =>
  queryOptions({
    queryKey: [...projectKey(s), "counts"] as const,
    queryFn: async () => (await request<{ counts: CountsView }>(`${projectPath(s)}/counts`)).counts,
  });

/** Keys carry their data's type, so setQueryData and getQueryData know the cached shape. */
export const countsKey = (s: ProjectScope) => countsQuery(s).queryKey;
