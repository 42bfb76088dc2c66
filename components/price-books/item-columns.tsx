"use client";

import {
  columnFilteringFeature,
  createColumnHelper,
  createFilteredRowModel,
  createSortedRowModel,
  filterFn_equals,
  filterFn_includesString,
  globalFilteringFeature,
  metaHelper,
  rowSortingFeature,
  sortFn_alphanumeric,
  sortFn_basic,
  tableFeatures,
} from "@tanstack/react-table";
import { COLUMN_LABELS, priceColumnId, type ItemColumn } from "@/lib/price-book/item-edit";
import { sameLength, stockLengthText } from "@/lib/price-book/length-text";
import type { PriceBookItemView } from "@/lib/price-book/types";
import { ItemCell } from "./item-cell";
import { ItemRowActions } from "./item-row-actions";

type ColumnMeta = { align?: "end"; width?: string };

export const features = tableFeatures({
  rowSortingFeature,
  columnFilteringFeature,
  globalFilteringFeature,
  sortedRowModel: createSortedRowModel(),
  filteredRowModel: createFilteredRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric, basic: sortFn_basic },
  filterFns: { includesString: filterFn_includesString, equals: filterFn_equals },
  columnMeta: metaHelper<ColumnMeta>(),
});

const helper = createColumnHelper<typeof features, PriceBookItemView>();

const cell = (column: ItemColumn) =>
  function Cell({ row }: { row: { original: PriceBookItemView } }) {
    return <ItemCell row={row.original} column={column} />;
  };

const text = (column: "name" | "species" | "supplierCode", width: string) =>
  helper.accessor((r) => r[column] ?? "", { id: column, header: COLUMN_LABELS[column], sortFn: "alphanumeric", cell: cell(column), meta: { width } });

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
    helper.display({
      id: "actions",
      header: () => <span className="sr-only">Actions</span>,
      enableSorting: false,
      cell: ({ row }) => <ItemRowActions row={row.original} />,
    }),
  ]);
}
