import { queryOptions } from "@tanstack/react-query";
import { z } from "zod";
import type { UnitTypeView } from "@/lib/plans/api-types";
import { request } from "./fetch";
import { projectKey, projectPath, type ProjectScope } from "./project-scope";

/** GET …/unit-types, checked against the route's shape (`satisfies` keeps it in step with UnitTypeView). */
export const unitTypeSchema = z.object({ id: z.string(), name: z.string(), count: z.number(), version: z.number() }) satisfies z.ZodType<UnitTypeView>;
const listSchema = z.object({ unitTypes: z.array(unitTypeSchema) });

/** The project's unit types, cached as a bare list. */
export const unitTypesQuery = (s: ProjectScope) =>
  queryOptions({
    queryKey: [...projectKey(s), "unit-types"] as const,
    queryFn: async () => listSchema.parse(await request(`${projectPath(s)}/unit-types`)).unitTypes,
  });

/** Keys carry their data's type, so setQueryData and getQueryData know the cached shape. */
export const unitTypesKey = (s: ProjectScope) => unitTypesQuery(s).queryKey;
