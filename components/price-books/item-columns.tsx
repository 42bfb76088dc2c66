"use client";

import { deleteColumn, editableColumns } from "@/components/ui/editable-table/columns";
import { DeleteRowButton } from "@/components/ui/delete-row-button";
import { COLUMN_LABELS, priceColumnId, type ItemColumn } from "@/lib/price-books/item-edit";
import { sameLength, stockLengthText } from "@/lib/price-books/length-text";
import type { PriceBookItemView } from "@/lib/price-books/types";
import { ItemCell } from "./item-cell";

const helper = editableColumns<PriceBookItemView>();

const cell = (column: ItemColumn) =>
  function Cell({ row }: { row: { original: PriceBookItemView } }) {
    return <ItemCell row={row.original} column={column} />;
  };

const text = (column: "name" | "species" | "supplierCode", className: string) =>
  helper.accessor((r) => r[column] ?? "", { id: column, header: COLUMN_LABELS[column], sortFn: "alphanumeric", cell: cell(column), meta: { className } });

const size = (column: "faceWidth" | "thickness") =>
  helper.accessor(column, { id: column, header: COLUMN_LABELS[column], sortFn: "basic", enableGlobalFilter: false, cell: cell(column), meta: { align: "end" } });

/**
 * The columns for a book whose items are sold in `lengths` (inches): one price column per length, so
 * the table reads like the CSV and a price is edited in its own cell.
 */
export function buildColumns(lengths: number[]) {
  return helper.columns([
    text("name", "min-w-44"),
    helper.accessor("kind", { id: "kind", header: COLUMN_LABELS.kind, sortFn: "alphanumeric", filterFn: "equals", enableGlobalFilter: false, cell: cell("kind") }),
    size("faceWidth"),
    size("thickness"),
    text("species", "min-w-28"),
    text("supplierCode", "whitespace-nowrap"),
    ...lengths.map((inches) =>
      helper.accessor((r) => r.stock.find((s) => sameLength(s.length, inches))?.price ?? -1, {
        id: priceColumnId(inches),
        header: stockLengthText(inches),
        sortFn: "basic",
        enableGlobalFilter: false,
        cell: cell(priceColumnId(inches)),
        meta: { align: "end" },
      }),
    ),
    deleteColumn<PriceBookItemView>((row, { busy, onDelete }) => (
      <DeleteRowButton what={row.name} question={`Delete "${row.name}" from this price book?`} busy={busy} onDelete={onDelete} />
    )),
  ]);
}
