"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { api, ApiError } from "@/lib/api-client";
import { columnOfField, planItemEdit, priceColumnLength, type ItemColumn } from "@/lib/price-book/item-edit";
import type { PriceBookChangeView, PriceBookItemView, PriceBookSummary, PriceBookView } from "@/lib/price-book/types";
import type { ItemsControls, RowNotice } from "./items-context";

type BookData = { priceBook: PriceBookView };

export const bookApi = (orgSlug: string, priceBookId: string) => `/api/orgs/${orgSlug}/price-books/${priceBookId}`;

/** The book, its change log, and every edit of its items: cell patches, deletes, stale-edit recovery. */
export function usePriceBook(orgSlug: string, priceBookId: string, canWrite: boolean) {
  const base = bookApi(orgSlug, priceBookId);
  const queryClient = useQueryClient();
  const bookKey = ["price-book", orgSlug, priceBookId];
  const changesKey = ["price-book-changes", orgSlug, priceBookId];
  const book = useQuery({ queryKey: bookKey, queryFn: () => api<BookData>(base) });
  const changes = useQuery({ queryKey: changesKey, queryFn: () => api<{ changes: PriceBookChangeView[] }>(`${base}/changes`) });

  const [editing, setEditing] = useState<ItemsControls["editing"]>(null);
  const [notices, setNotices] = useState<Record<string, RowNotice>>({});
  const notify = (id: string, notice: RowNotice | null) => setNotices(({ [id]: _, ...rest }) => (notice ? { ...rest, [id]: notice } : rest));

  const setItems = (f: (items: PriceBookItemView[]) => PriceBookItemView[]) =>
    queryClient.setQueryData<BookData>(bookKey, (old) => (old ? { priceBook: { ...old.priceBook, items: f(old.priceBook.items) } } : old));
  const putItem = (item: PriceBookItemView) => setItems((items) => (items.some((i) => i.id === item.id) ? items.map((i) => (i.id === item.id ? item : i)) : [...items, item]));
  const dropItem = (id: string) => setItems((items) => items.filter((i) => i.id !== id));
  const putBook = (summary: PriceBookSummary) => queryClient.setQueryData<BookData>(bookKey, (old) => (old ? { priceBook: { ...old.priceBook, ...summary } } : old));
  /** Every write adds to the log; fetch it again rather than guess its lines. */
  const logged = () => void queryClient.invalidateQueries({ queryKey: changesKey });
  const reload = () => {
    void queryClient.invalidateQueries({ queryKey: bookKey });
    logged();
  };

  /** A 409 with `current`: someone saved first. Show their row and say so; a missing row means it is gone. */
  const staleRow = (row: PriceBookItemView, error: ApiError) => {
    const current = error.body.current as PriceBookItemView | null | undefined;
    if (current) {
      putItem(current);
      notify(row.id, { tone: "error", text: error.message });
    } else {
      dropItem(row.id);
      reload();
    }
  };

  const patch = useMutation({
    mutationFn: ({ row, body }: { row: PriceBookItemView; body: unknown }) => api<{ item: PriceBookItemView }>(`${base}/items/${row.id}`, { method: "PATCH", body }),
  });
  const del = useMutation({
    mutationFn: (row: PriceBookItemView) => api<void>(`${base}/items/${row.id}?version=${row.version}`, { method: "DELETE" }),
    onSuccess: (_, row) => {
      dropItem(row.id);
      notify(row.id, null);
      logged();
    },
    onError: (error, row) => {
      if (error instanceof ApiError && error.status === 409 && "current" in error.body) staleRow(row, error);
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
      if (!(error instanceof ApiError)) return { [column]: "Could not reach the server; your change is not saved." };
      if (error.status === 409 && "current" in error.body) {
        staleRow(row, error);
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
