"use client";

import { controlsContext, type EditableControls, type FieldErrors } from "@/components/ui/editable-table/context";
import type { ItemColumn } from "@/lib/price-books/item-edit";
import type { PriceBookItemView } from "@/lib/price-books/types";

export type { RowNotice } from "@/components/ui/editable-table/context";

/** The editable table's controls for a price book's items. */
export interface ItemsControls extends EditableControls<PriceBookItemView, ItemColumn> {
  /** Resolves to messages keyed by column to show beside the cell, or null when the edit is done. */
  commit: (row: PriceBookItemView, column: ItemColumn, text: string) => Promise<FieldErrors | null>;
}

export const [ItemsContext, useItemsControls] = controlsContext<ItemsControls>("Items table cells render inside <ItemsContext>.");
