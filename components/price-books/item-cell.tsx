"use client";

import { EditableCell } from "@/components/ui/editable-table/editable-cell";
import { cellText, columnLabel, type ItemColumn } from "@/lib/price-books/item-edit";
import type { PriceBookItemView } from "@/lib/price-books/types";
import { ItemCellEditor } from "./item-cell-editor";

/** One cell of the items table: plain text for readers; for admins a button that opens its editor. */
export function ItemCell({ row, column }: { row: PriceBookItemView; column: ItemColumn }) {
  return (
    <EditableCell
      rowId={row.id}
      column={column}
      label={`${columnLabel(column)} of ${row.name}`}
      text={cellText(row, column)}
      editor={<ItemCellEditor row={row} column={column} />}
    />
  );
}
