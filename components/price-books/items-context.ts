"use client";

import { createContext, useContext } from "react";
import type { ItemColumn } from "@/lib/price-book/item-edit";
import type { PriceBookItemView } from "@/lib/price-book/types";

export type RowNotice = { tone: "info" | "error"; text: string };

/**
 * What the items table's cells need from the page. Columns are memoised on the stock lengths, so the
 * parts that change on every edit reach the cells through this context instead.
 */
export interface ItemsControls {
  canWrite: boolean;
  editing: { rowId: string; column: ItemColumn } | null;
  startEdit: (rowId: string, column: ItemColumn) => void;
  /** Closes this cell's editor, unless another cell's has opened since (a save on blur ends late). */
  stopEdit: (rowId: string, column: ItemColumn) => void;
  /** Resolves to messages keyed by column to show beside the cell, or null when the edit is done. */
  commit: (row: PriceBookItemView, column: ItemColumn, text: string) => Promise<Record<string, string> | null>;
  remove: (row: PriceBookItemView) => void;
  removing: string | null;
  notices: Record<string, RowNotice>;
  dismiss: (rowId: string) => void;
}

export const ItemsContext = createContext<ItemsControls | null>(null);

export function useItemsControls(): ItemsControls {
  const controls = useContext(ItemsContext);
  if (!controls) throw new Error("Items table cells render inside <ItemsContext>.");
  return controls;
}
