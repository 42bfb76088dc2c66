"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { ClientError, refusal, request } from "@/lib/client/fetch";
import { priceBookChangesKey, priceBookChangesQuery, priceBookKey, priceBookPath, priceBookQuery } from "@/lib/client/price-books";
import { columnOfField, planItemEdit, priceColumnLength, type ItemColumn } from "@/lib/price-books/item-edit";
import type { PriceBookItemView, PriceBookSummary } from "@/lib/price-books/types";
import type { ItemsControls, RowNotice } from "./items-context";

/** The book, its change log, and every edit of its items: cell patches, deletes, stale-edit recovery. */
export function usePriceBook(orgSlug: string, priceBookId: string, canWrite: boolean) {
  const scope = { orgSlug, priceBookId };
  const base = priceBookPath(scope);
  const queryClient = useQueryClient();
  const bookKey = priceBookKey(scope);
  const changesKey = priceBookChangesKey(scope);
  const book = useQuery(priceBookQuery(scope));
  const changes = useQuery(priceBookChangesQuery(scope));

  const [editing, setEditing] = useState<ItemsControls["editing"]>(null);
  const [notices, setNotices] = useState<Record<string, RowNotice>>({});
  const notify = (id: string, notice: RowNotice | null) => setNotices(({ [id]: _, ...rest }) => (notice ? { ...rest, [id]: notice } : rest));

  const setItems = (f: (items: PriceBookItemView[]) => PriceBookItemView[]) =>
    queryClient.setQueryData(bookKey, (old) => (old ? { ...old, items: f(old.items) } : old));
  const putItem = (item: PriceBookItemView) => setItems((items) => (items.some((i) => i.id === item.id) ? items.map((i) => (i.id === item.id ? item : i)) : [...items, item]));
  const dropItem = (id: string) => setItems((items) => items.filter((i) => i.id !== id));
  const putBook = (summary: PriceBookSummary) => queryClient.setQueryData(bookKey, (old) => (old ? { ...old, ...summary } : old));
  /** Every write adds to the log; fetch it again rather than guess its lines. */
  const logged = () => void queryClient.invalidateQueries({ queryKey: changesKey });
  const reload = () => {
    void queryClient.invalidateQueries({ queryKey: bookKey });
    logged();
  };

  /** A `stale` refusal: someone saved first. Show their row and say so; a missing row means it is gone. */
  const staleRow = (row: PriceBookItemView, error: Error, current: PriceBookItemView | null | undefined) => {
    if (current) {
      putItem(current);
      notify(row.id, { tone: "error", text: error.message });
    } else {
      dropItem(row.id);
      reload();
    }
  };

  const patch = useMutation({
    mutationFn: ({ row, body }: { row: PriceBookItemView; body: unknown }) => request<{ item: PriceBookItemView }>(`${base}/items/${row.id}`, { method: "PATCH", body }),
  });
  const del = useMutation({
    mutationFn: (row: PriceBookItemView) => request<void>(`${base}/items/${row.id}?version=${row.version}`, { method: "DELETE" }),
    onSuccess: (_, row) => {
      dropItem(row.id);
      notify(row.id, null);
      logged();
    },
    onError: (error, row) => {
      const stale = refusal(error, "stale");
      if (stale) staleRow(row, error, stale.current as PriceBookItemView | null);
      else notify(row.id, { tone: "error", text: error.message });
    },
  });

  async function commit(row: PriceBookItemView, column: ItemColumn, text: string): Promise<Record<string, string> | null> {
    const plan = planItemEdit(row, column, text);
    if (plan.kind === "unchanged") return null;
    if (plan.kind === "invalid") return plan.fields;
    try {
      const { item } = await patch.mutateAsync({ row, body: plan.body });
      putItem(item);
      notify(row.id, null);
      logged();
      return null;
    } catch (error) {
      if (!(error instanceof ClientError)) return { [column]: "Could not reach the server; your change is not saved." };
      const stale = refusal(error, "stale");
      if (stale) {
        staleRow(row, error, stale.current as PriceBookItemView | null);
        return null;
      }
      const lengths = priceColumnLength(column) === null ? [] : ((plan.body.stock as { length: number }[]) ?? []).map((s) => s.length);
      const fields = Object.entries(error.fields ?? {}).map(([k, m]) => [columnOfField(k, lengths, column), m]);
      return fields.length > 0 ? Object.fromEntries(fields) : { [column]: error.message };
    }
  }

  const controls: ItemsControls = {
    canWrite,
    editing,
    startEdit: (rowId, column) => setEditing({ rowId, column }),
    stopEdit: (rowId, column) => setEditing((cur) => (cur && cur.rowId === rowId && cur.column === column ? null : cur)),
    commit,
    remove: (row) => del.mutate(row),
    removing: del.isPending ? (del.variables?.id ?? null) : null,
    notices,
    dismiss: (rowId) => notify(rowId, null),
  };

  return { base, book, changes, controls, putItem, putBook, reload, logged };
}
