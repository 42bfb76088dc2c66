import { queryOptions } from "@tanstack/react-query";
import type { PlanSetView } from "@/lib/plans/api-types";
import { request } from "./fetch";
import { projectKey, projectPath, type ProjectScope } from "./project-scope";

/** The project's uploaded plan sets, cached as a bare list. */
export const planSetsQuery = (s: ProjectScope) =>
  queryOptions({
    queryKey: [...projectKey(s), "plan-sets"] as const,
    queryFn: async () => (await request<{ planSets: PlanSetView[] }>(`${projectPath(s)}/plan-sets`)).planSets,
  });
