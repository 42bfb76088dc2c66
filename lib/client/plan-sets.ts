import { queryOptions } from "@tanstack/react-query";
import { z } from "zod";
import type { PlanSetView } from "@/lib/plans/api-types";
import { request } from "./fetch";
import { projectKey, projectPath, type ProjectScope } from "./project-scope";

export const planSetSchema = z.object({
  id: z.string(),
  name: z.string(),
  sizeBytes: z.number(),
  pageCount: z.number(),
  contentHash: z.string().nullable(),
  createdAt: z.string(),
}) satisfies z.ZodType<PlanSetView>;
const listSchema = z.object({ planSets: z.array(planSetSchema) });

/** The project's uploaded plan sets, cached as a bare list. */
export const planSetsQuery = (s: ProjectScope) =>
  queryOptions({
    queryKey: [...projectKey(s), "plan-sets"] as const,
    queryFn: async () => listSchema.parse(await request(`${projectPath(s)}/plan-sets`)).planSets,
  });
