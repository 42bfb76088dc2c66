import { queryOptions } from "@tanstack/react-query";
import { z } from "zod";
import type { CountsView } from "@/lib/plans/api-types";
import { request } from "./fetch";
import { projectKey, projectPath, type ProjectScope } from "./project-scope";

const byType = z.record(z.string(), z.number());
const countRole = z.enum(["counted", "reference"]);

/** GET …/counts; `satisfies` keeps the schema in step with CountsView, which the route builds. */
export const countsSchema = z.object({
  sheets: z.array(z.object({ sheetId: z.string(), label: z.string(), unitTypeId: z.string().nullable(), countRole, byType, total: z.number() })),
  unitTypes: z.array(z.object({ unitTypeId: z.string(), name: z.string(), unitCount: z.number(), perUnit: byType, allUnits: byType })),
  commonAreas: byType,
  job: byType,
  jobTotal: z.number(),
  warnings: z.array(
    z.discriminatedUnion("kind", [
      z.object({ kind: z.literal("same-layout"), unitTypeId: z.string().nullable(), sheetIds: z.array(z.string()), message: z.string() }),
      z.object({ kind: z.literal("no-counted-sheet"), unitTypeId: z.string(), sheetIds: z.array(z.string()), message: z.string() }),
    ]),
  ),
}) satisfies z.ZodType<CountsView>;

/** Openings counted per sheet, per unit type and for the job, cached as the bare CountsView. */
export const countsQuery = (s: ProjectScope) =>
  queryOptions({
    queryKey: [...projectKey(s), "counts"] as const,
    queryFn: async () => z.object({ counts: countsSchema }).parse(await request(`${projectPath(s)}/counts`)).counts,
  });

/** Keys carry their data's type, so setQueryData and getQueryData know the cached shape. */
export const countsKey = (s: ProjectScope) => countsQuery(s).queryKey;
