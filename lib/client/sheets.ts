import { queryOptions } from "@tanstack/react-query";
import { z } from "zod";
import type { SheetView } from "@/lib/plans/api-types";
import { orderSheets } from "@/lib/plans/sheet-order";
import { request } from "./fetch";
import { projectKey, projectPath, type ProjectScope } from "./project-scope";

/** A sheet as the sheets routes send it (`satisfies` keeps the schema in step with SheetView). */
export const sheetSchema = z.object({
  id: z.string(),
  planSetId: z.string(),
  planSetName: z.string(),
  pageNumber: z.number(),
  label: z.string(),
  unitTypeId: z.string().nullable(),
  countRole: z.enum(["counted", "reference"]),
  width: z.number(),
  height: z.number(),
  rotation: z.number(),
  userUnit: z.number(),
  scaleRatio: z.number().nullable(),
  scaleLabel: z.string().nullable(),
  calibrationPoints: z.object({ ax: z.number(), ay: z.number(), bx: z.number(), by: z.number(), inches: z.number() }).nullable(),
  inchesPerUnit: z.number().nullable(),
  scaleMismatchPercent: z.number().nullable(),
  tagCount: z.number(),
  version: z.number(),
}) satisfies z.ZodType<SheetView>;

/** The project's sheets, cached as a bare list in sheet-number order (plan set by plan set). */
export const sheetsQuery = (s: ProjectScope) =>
  queryOptions({
    queryKey: [...projectKey(s), "sheets"] as const,
    queryFn: async () => orderSheets(z.object({ sheets: z.array(sheetSchema) }).parse(await request(`${projectPath(s)}/sheets`)).sheets),
  });

/** One sheet, as the viewer holds it. */
export const sheetQuery = (s: ProjectScope, sheetId: string) =>
  queryOptions({
    queryKey: [...projectKey(s), "sheet", sheetId] as const,
    queryFn: async () => z.object({ sheet: sheetSchema }).parse(await request(`${projectPath(s)}/sheets/${sheetId}`)).sheet,
  });

/** Keys carry their data's type, so setQueryData and getQueryData know the cached shape. */
export const sheetsKey = (s: ProjectScope) => sheetsQuery(s).queryKey;

export const sheetKey = (s: ProjectScope, sheetId: string) => sheetQuery(s, sheetId).queryKey;
