"use client";

import { cellText, columnLabel, type ItemColumn } from "@/lib/price-book/item-edit";
import type { PriceBookItemView } from "@/lib/price-book/types";
import { ItemCellEditor } from "./item-cell-editor";
import { useItemsControls } from "./items-context";

/** One cell of the items table: plain text for readers; for admins a button that opens its editor. */
export function ItemCell({ row, column }: { row: PriceBookItemView; column: ItemColumn }) {
  const { canWrite, editing, startEdit } = useItemsControls();
  const text = cellText(row, column);
  if (editing?.rowId === row.id && editing.column === column) return <ItemCellEditor row={row} column={column} />;
  const empty = (
    <span className="text-graphite-500">
      —<span className="sr-only">none</span>
    </span>
  );
  if (!canWrite) return <span>{text || empty}</span>;
  return (
    <button
      type="button"
      onClick={() => startEdit(row.id, column)}
      className="-mx-1.5 block w-[calc(100%+0.75rem)] rounded px-1.5 py-1 text-inherit hover:bg-maple-100 focus-visible:bg-maple-100"
      style={{ textAlign: "inherit" }}
      aria-label={`${columnLabel(column)} of ${row.name}: ${text || "none"}. Edit`}
    >
      {text || <span className="text-graphite-500">—</span>}
    </button>
  );
}
