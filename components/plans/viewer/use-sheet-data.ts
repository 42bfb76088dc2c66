"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { ClientError, refusal, request } from "@/lib/client/fetch";
import { countsKey, countsQuery } from "@/lib/client/counts";
import { openingTypesQuery } from "@/lib/client/opening-types";
import { projectPath, type ProjectScope } from "@/lib/client/project-scope";
import { sheetKey, sheetQuery, sheetsKey, sheetsQuery } from "@/lib/client/sheets";
import { tagsKey, tagsQuery } from "@/lib/client/tags";
import type { SheetView } from "@/lib/plans/api-types";
import { neighbours } from "@/lib/plans/sheet-order";

export type { ViewerTag } from "@/lib/client/tags";

export interface SheetScope extends ProjectScope {
  sheetId: string;
}

export const projectBase = (s: SheetScope) => projectPath(s);

/** The viewer's keys, all from the resource modules the Plans page and the window list use too. */
export const keys = {
  sheet: (s: SheetScope) => sheetKey(s, s.sheetId),
  tags: (s: SheetScope) => tagsKey(s, s.sheetId),
  counts: (s: SheetScope) => countsKey(s),
  sheets: (s: SheetScope) => sheetsKey(s),
};

export function useSheetData(scope: SheetScope, initialSheet: SheetView) {
  const sheet = useQuery({ ...sheetQuery(scope, scope.sheetId), initialData: initialSheet });
  const tags = useQuery(tagsQuery(scope, scope.sheetId));
  const openingTypes = useQuery(openingTypesQuery(scope));
  const counts = useQuery(countsQuery(scope));
  // The project's sheets in sheet-number order, for previous / next (often already cached by the Plans page).
  const sheets = useQuery(sheetsQuery(scope));
  const ordered = sheets.data ?? [];
  const around = neighbours(ordered, scope.sheetId);
  const position = ordered.findIndex((s) => s.id === scope.sheetId);
  return {
    sheet: sheet.data,
    tags: tags.data ?? [],
    tagsLoading: tags.isPending,
    openingTypes: openingTypes.data ?? [],
    counts: counts.data,
    around: { ...around, position: position < 0 ? null : position + 1, of: ordered.length },
  };
}

export type SheetPatch =
  | { scale: { ratio: number; label: string } | null }
  | { calibrationPoints: { ax: number; ay: number; bx: number; by: number; length: string | number } | null };

/** Calibration saves, with the version the viewer last saw; a 409 shows the sheet as it is now. */
export function useSheetMutation(scope: SheetScope, onNotice: (tone: "info" | "error", text: string) => void) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (patch: SheetPatch) => {
      const current = qc.getQueryData<SheetView>(keys.sheet(scope));
      const body = { ...patch, version: current?.version ?? 1 };
      return (await request<{ sheet: SheetView }>(`${projectBase(scope)}/sheets/${scope.sheetId}`, { method: "PATCH", body })).sheet;
    },
    onSuccess: (sheet) => {
      qc.setQueryData(keys.sheet(scope), sheet);
      void qc.invalidateQueries({ queryKey: keys.sheets(scope) });
    },
    onError: (error) => {
      const current = refusal(error, "stale")?.current as SheetView | null | undefined;
      if (current) qc.setQueryData(keys.sheet(scope), current);
      const field = error instanceof ClientError ? Object.values(error.fields)[0] : undefined;
      onNotice("error", field ? `${error.message} ${field}` : error.message);
    },
  });
}
