import { queryOptions } from "@tanstack/react-query";
import { request } from "./fetch";
import type { SheetView } from "@/lib/plans/api-types";
import { orderSheets } from "@/lib/plans/sheet-order";
import { projectKey, projectPath, type ProjectScope } from "./project-scope";

/** The project's sheets, cached as a bare list in sheet-number order (plan set by plan set). */
export const sheetsQuery = (s: ProjectScope) =>
  queryOptions({
    queryKey: [...projectKey(s), "sheets"] as const,
    queryFn: async () => orderSheets((await request<{ sheets: SheetView[] }>(`${projectPath(s)}/sheets`)).sheets),
  });

/** One sheet, as the viewer holds it. */
export const sheetQuery = (s: ProjectScope, sheetId: string) =>
  queryOptions({
    queryKey: [...projectKey(s), "sheet", sheetId] as const,
    queryFn: async () => (await request<{ sheet: SheetView }>(`${projectPath(s)}/sheets/${sheetId}`)).sheet,
  });

/** Keys carry their data's type, so setQueryData and getQueryData know the cached shape. */
export const sheetsKey = (s: ProjectScope) => sheetsQuery(s).queryKey;

export const sheetKey = (s: ProjectScope, sheetId: string) => sheetQuery(s, sheetId).queryKey;
