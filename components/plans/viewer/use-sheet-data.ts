"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { api, ApiError } from "@/lib/api-client";
import type { CountsView, OpeningTypeView, SheetView, TagView } from "@/lib/plans/api-types";

/** A tag as the viewer holds it: `pending` while its POST is on the way (not yet editable). */
export type ViewerTag = TagView & { pending?: boolean };

export interface SheetScope {
  orgSlug: string;
  projectId: string;
  sheetId: string;
}

export const projectBase = (s: SheetScope) => `/api/orgs/${s.orgSlug}/projects/${s.projectId}`;

export const keys = {
  sheet: (s: SheetScope) => ["sheet", s.orgSlug, s.projectId, s.sheetId] as const,
  tags: (s: SheetScope) => ["tags", s.orgSlug, s.projectId, s.sheetId] as const,
  openingTypes: (s: SheetScope) => ["opening-types", s.orgSlug, s.projectId] as const,
  counts: (s: SheetScope) => ["counts", s.orgSlug, s.projectId] as const,
  sheets: (s: SheetScope) => ["sheets", s.orgSlug, s.projectId] as const,
};

export function useSheetData(scope: SheetScope, initialSheet: SheetView) {
  const base = projectBase(scope);
  const sheet = useQuery({
    queryKey: keys.sheet(scope),
    queryFn: async () => (await api<{ sheet: SheetView }>(`${base}/sheets/${scope.sheetId}`)).sheet,
    initialData: initialSheet,
  });
  const tags = useQuery({
    queryKey: keys.tags(scope),
    queryFn: async (): Promise<ViewerTag[]> => (await api<{ tags: TagView[] }>(`${base}/tags?sheetId=${scope.sheetId}`)).tags,
  });
  const openingTypes = useQuery({
    queryKey: keys.openingTypes(scope),
    queryFn: async () => (await api<{ openingTypes: OpeningTypeView[] }>(`${base}/opening-types`)).openingTypes,
  });
  const counts = useQuery({
    queryKey: keys.counts(scope),
    queryFn: async () => (await api<{ counts: CountsView }>(`${base}/counts`)).counts,
  });
  return { sheet: sheet.data, tags: tags.data ?? [], tagsLoading: tags.isPending, openingTypes: openingTypes.data ?? [], counts: counts.data };
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
      return (await api<{ sheet: SheetView }>(`${projectBase(scope)}/sheets/${scope.sheetId}`, { method: "PATCH", body })).sheet;
    },
    onSuccess: (sheet) => {
      qc.setQueryData(keys.sheet(scope), sheet);
      void qc.invalidateQueries({ queryKey: keys.sheets(scope) });
    },
    onError: (error) => {
      if (error instanceof ApiError && error.status === 409 && error.body.current) {
        qc.setQueryData(keys.sheet(scope), error.body.current as SheetView);
      }
      const field = error instanceof ApiError ? Object.values(error.fields)[0] : undefined;
      onNotice("error", field ? `${error.message} ${field}` : error.message);
    },
  });
}
