"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { countsKey, countsQuery } from "@/lib/client/counts";
import { openingTypesKey, openingTypesQuery } from "@/lib/client/opening-types";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import { planCellPatch, type CellEdit } from "@/lib/plans/window-list/cell-patch";
import type { EditableColumn } from "@/lib/plans/window-list/columns";
import { ClientError, refusal, request } from "@/lib/client/fetch";
import { projectPath } from "@/lib/client/project-scope";
import type { RowNotice, WindowListControls } from "./window-list-context";

type TypesData = OpeningTypeView[];
type Patch = { row: OpeningTypeView; body: unknown };

/** The window list's data and every edit of it: cell patches, deletes, stale-edit recovery. */
export function useWindowList(orgSlug: string, projectId: string, canWrite: boolean) {
  const queryClient = useQueryClient();
  // Keys, fetchers and cached shapes come from lib/client: the Plans page and the viewer read these same entries.
  const scope = { orgSlug, projectId };
  const base = projectPath(scope);
  const typesKey = openingTypesKey(scope);
  const types = useQuery(openingTypesQuery(scope));
  const counts = useQuery(countsQuery(scope));

  const [editing, setEditing] = useState<WindowListControls["editing"]>(null);
  const [notices, setNotices] = useState<Record<string, RowNotice>>({});
  const notify = (id: string, notice: RowNotice | null) =>
    setNotices(({ [id]: _, ...rest }) => (notice ? { ...rest, [id]: notice } : rest));

  const putRow = (row: OpeningTypeView) =>
    queryClient.setQueryData<TypesData>(typesKey, (old) =>
      old ? old.map((r) => (r.id === row.id ? row : r)) : old,
    );
  const dropRow = (id: string) =>
    queryClient.setQueryData<TypesData>(typesKey, (old) => (old ? old.filter((r) => r.id !== id) : old));

  /** A `stale` refusal: someone saved first. Show their row and say so; a null `current` means it is gone. */
  const staleRow = (row: OpeningTypeView, error: Error, current: OpeningTypeView | null) => {
    if (current) {
      putRow(current);
      notify(row.id, { tone: "error", text: error.message });
    } else {
      dropRow(row.id);
      void queryClient.invalidateQueries({ queryKey: typesKey });
    }
  };

  const patch = useMutation({
    mutationFn: ({ row, body }: Patch) =>
      request<{ openingType: OpeningTypeView }>(`${base}/opening-types/${row.id}`, { method: "PATCH", body }),
  });
  const del = useMutation({
    // `tags`: how many tags the person was told go with the type; the server refuses if that is no longer so.
    mutationFn: (row: OpeningTypeView & { tags?: number }) =>
      request<void>(`${base}/opening-types/${row.id}?version=${row.version}&tags=${row.tags ?? 0}`, { method: "DELETE" }),
    onSuccess: (_, row) => {
      dropRow(row.id);
      notify(row.id, null);
      void queryClient.invalidateQueries({ queryKey: countsKey(scope) });
    },
    onError: (error, row) => {
      const stale = refusal(error, "stale");
      if (stale) staleRow(row, error, stale.current as OpeningTypeView | null);
      else notify(row.id, { tone: "error", text: error.message });
    },
  });

  async function commit(row: OpeningTypeView, edit: CellEdit): Promise<Record<string, string> | null> {
    const plan = planCellPatch(row, edit);
    if (plan.kind === "unchanged") return null;
    if (plan.kind === "invalid") return plan.fields;
    try {
      const { openingType } = await patch.mutateAsync({ row, body: plan.body });
      putRow(openingType);
      notify(row.id, null);
      return null;
    } catch (error) {
      if (!(error instanceof ClientError)) return { _: "Could not reach the server; your change is not saved." };
      const stale = refusal(error, "stale");
      if (stale) {
        staleRow(row, error, stale.current as OpeningTypeView | null);
        return null;
      }
      // 422, or a conflict naming a field (a mark already used): show it beside the cell.
      return error.hasFields ? error.fields : { _: error.message };
    }
  }

  const controls: WindowListControls = {
    canWrite,
    editing,
    startEdit: (rowId: string, column: EditableColumn) => setEditing({ rowId, column }),
    stopEdit: (rowId: string, column: EditableColumn) =>
      setEditing((cur) => (cur && cur.rowId === rowId && cur.column === column ? null : cur)),
    commit,
    remove: (row) => del.mutate(row),
    removing: del.isPending ? (del.variables?.id ?? null) : null,
    notices,
    dismiss: (rowId: string) => notify(rowId, null),
  };

  const added = (row: OpeningTypeView) =>
    queryClient.setQueryData<TypesData>(typesKey, (old) => (old ? [...old, row] : [row]));

  return { types, counts, controls, added };
}
