"use client";

import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { countsKey, countsQuery } from "@/lib/client/counts";
import { openingTypesQuery } from "@/lib/client/opening-types";
import { sheetsKey, sheetsQuery } from "@/lib/client/sheets";
import { unitTypesKey, unitTypesQuery } from "@/lib/client/unit-types";
import type { SheetView } from "@/lib/plans/api-types";
import { ClientError, refusal, request } from "@/lib/client/fetch";
import { projectPath } from "@/lib/client/project-scope";

export type SheetPatch = { label?: string; unitTypeId?: string | null; countRole?: SheetView["countRole"] };
export type SheetNotice = { text: string; current: SheetView | null };

/** Everything the plans page reads, and the sheet edits with their stale-edit recovery. */
export function usePlansData(orgSlug: string, projectId: string) {
  const queryClient = useQueryClient();
  // Keys, fetchers and cached shapes come from lib/client: the viewer reads these same entries.
  const scope = { orgSlug, projectId };
  const base = projectPath(scope);
  const sheets = useQuery(sheetsQuery(scope));
  const unitTypes = useQuery(unitTypesQuery(scope));
  const counts = useQuery(countsQuery(scope));
  const openingTypes = useQuery(openingTypesQuery(scope));
  const [notices, setNotices] = useState<Record<string, SheetNotice>>({});

  const putSheet = (sheet: SheetView) =>
    queryClient.setQueryData(sheetsKey(scope), (old) => (old ? old.map((s) => (s.id === sheet.id ? sheet : s)) : old));

  /**
   * Saves a sheet's label or unit type with the version it was loaded at. Resolves to field errors to show
   * beside the control, or null; a stale edit puts the sheet as it is now in place and says so.
   */
  async function saveSheet(sheet: SheetView, patch: SheetPatch): Promise<Record<string, string> | null> {
    setNotices(({ [sheet.id]: _, ...rest }) => rest);
    try {
      const { sheet: saved } = await request<{ sheet: SheetView }>(`${base}/sheets/${sheet.id}`, {
        method: "PATCH",
        body: { version: sheet.version, ...patch },
      });
      putSheet(saved);
      if (patch.unitTypeId !== undefined || patch.countRole !== undefined) void queryClient.invalidateQueries({ queryKey: countsKey(scope) });
      return null;
    } catch (error) {
      const stale = refusal(error, "stale");
      if (stale) {
        const current = (stale.current ?? null) as SheetView | null;
        if (current) putSheet(current);
        else void queryClient.invalidateQueries({ queryKey: sheetsKey(scope) });
        setNotices((n) => ({ ...n, [sheet.id]: { text: (error as Error).message, current } }));
        return null;
      }
      if (error instanceof ClientError && error.hasFields) return error.fields;
      return { _: error instanceof Error ? error.message : "Could not save." };
    }
  }

  /** Unit types feed the sheets' pickers and the counts; after a change all three are re-read. */
  const unitTypesChanged = () => {
    for (const queryKey of [unitTypesKey(scope), countsKey(scope), sheetsKey(scope)]) void queryClient.invalidateQueries({ queryKey });
  };

  const refetch = () => {
    for (const queryKey of [sheetsKey(scope), countsKey(scope)]) void queryClient.invalidateQueries({ queryKey });
  };

  const dismiss = (sheetId: string) => setNotices(({ [sheetId]: _, ...rest }) => rest);

  return { base, sheets, unitTypes, counts, openingTypes, notices, dismiss, saveSheet, unitTypesChanged, refetch };
}
