import { queryOptions } from "@tanstack/react-query";
import { request } from "./fetch";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import { projectKey, projectPath, type ProjectScope } from "./project-scope";

/** The project's window list, cached as a bare list in the order the server sends (by mark). */
export const openingTypesQuery = (s: ProjectScope) =>
  queryOptions({
    queryKey: [...projectKey(s), "opening-types"] as const,
    queryFn: async () => (await request<{ openingTypes: OpeningTypeView[] }>(`${projectPath(s)}/opening-types`)).openingTypes,
  });

/** Keys carry their data's type, so setQueryData and getQueryData know the cached shape. */
export const openingTypesKey = (s: ProjectScope) => openingTypesQuery(s).queryKey;
