import { queryOptions } from "@tanstack/react-query";
import { request } from "./fetch";
import type { UnitTypeView } from "@/lib/plans/api-types";
import { projectKey, projectPath, type ProjectScope } from "./project-scope";

/** The project's unit types, cached as a bare list. */
export const unitTypesQuery = (s: ProjectScope) =>
  queryOptions({
    queryKey: [...projectKey(s), "unit-types"] as const,
    queryFn: async () => (await request<{ unitTypes: UnitTypeView[] }>(`${projectPath(s)}/unit-types`)).unitTypes,
  });

/** Keys carry their data's type, so setQueryData and getQueryData know the cached shape. */
export const unitTypesKey = (s: ProjectScope) => unitTypesQuery(s).queryKey;
