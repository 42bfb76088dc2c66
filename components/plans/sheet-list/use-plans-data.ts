"use client";

import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import type { CountsView, OpeningTypeView, SheetView, UnitTypeView } from "@/lib/plans/api-types";
import { PlansApiError, plansApi, projectApi } from "@/lib/plans/window-list/request";

export type SheetPatch = { label?: string; unitTypeId?: string | null; countRole?: SheetView["countRole"] };
export type SheetNotice = { text: string; current: SheetView | null };

/** Everything the plans page reads, and the sheet edits with their stale-edit recovery. */
export function usePlansData(orgSlug: string, projectId: string) {
  const base = projectApi(orgSlug, projectId);
  const queryClient = useQueryClient();
  const key = (what: string) => [what, orgSlug, projectId];
  const sheets = useQuery({ queryKey: key("sheets"), queryFn: () => plansApi<{ sheets: SheetView[] }>(`${base}/sheets`) });
  const unitTypes = useQuery({ queryKey: key("unit-types"), queryFn: () => plansApi<{ unitTypes: UnitTypeView[] }>(`${base}/unit-types`) });
  const counts = useQuery({ queryKey: key("counts"), queryFn: () => plansApi<{ counts: CountsView }>(`${base}/counts`) });
  const openingTypes = useQuery({
    queryKey: key("opening-types"),
    queryFn: () => plansApi<{ openingTypes: OpeningTypeView[] }>(`${base}/opening-types`),
  });
  const [notices, setNotices] = useState<Record<string, SheetNotice>>({});

  const putSheet = (sheet: SheetView) =>
    queryClient.setQueryData<{ sheets: SheetView[] }>(key("sheets"), (old) =>
      old ? { sheets: old.sheets.map((s) => (s.id === sheet.id ? sheet : s)) } : old,
    );

  /**
   * Saves a sheet's label or unit type with the version it was loaded at. Resolves to field errors to show
   * beside the control, or null; a stale edit puts the sheet as it is now in place and says so.
   */
  async function saveSheet(sheet: SheetView, patch: SheetPatch): Promise<Record<string, string> | null> {
    setNotices(({ [sheet.id]: _, ...rest }) => rest);
    try {
      const { sheet: saved } = await plansApi<{ sheet: SheetView }>(`${base}/sheets/${sheet.id}`, {
        method: "PATCH",
        body: { version: sheet.version, ...patch },
      });
      putSheet(saved);
      if (patch.unitTypeId !== undefined || patch.countRole !== undefined) void queryClient.invalidateQueries({ queryKey: key("counts") });
      return null;
    } catch (error) {
      if (error instanceof PlansApiError && error.status === 409 && error.current !== undefined) {
        const current = (error.current ?? null) as SheetView | null;
        if (current) putSheet(current);
        else void queryClient.invalidateQueries({ queryKey: key("sheets") });
        setNotices((n) => ({ ...n, [sheet.id]: { text: error.message, current } }));
        return null;
      }
      if (error instanceof PlansApiError && Object.keys(error.fields).length > 0) return error.fields;
      return { _: error instanceof Error ? error.message : "Could not save." };
    }
  }

  /** Unit types feed the sheets' pickers and the counts; after a change all three are re-read. */
  const unitTypesChanged = () => {
    for (const what of ["unit-types", "counts", "sheets"]) void queryClient.invalidateQueries({ queryKey: key(what) });
  };

  const refetch = () => {
    for (const what of ["sheets", "counts"]) void queryClient.invalidateQueries({ queryKey: key(what) });
  };

  const dismiss = (sheetId: string) => setNotices(({ [sheetId]: _, ...rest }) => rest);

  return { base, sheets, unitTypes, counts, openingTypes, notices, dismiss, saveSheet, unitTypesChanged, refetch };
}
