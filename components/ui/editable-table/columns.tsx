"use client";

import {
  type RowData,
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
import type { ReactNode } from "react";
import { useEditableControls } from "./context";

/** `align: "end"` for numbers (right-aligned, tabular, never wrapped); `className` for the column's cells. */
type ColumnMeta = { align?: "end"; className?: string };

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

/** The column helper for an editable table of `Row`s. */
export const editableColumns = <Row extends RowData>() => createColumnHelper<typeof features, Row>();

export const DELETE_COLUMN = "actions";

/** Draws a row's delete button; `onDelete` when the person has confirmed. */
export type DeleteButton<Row> = (row: Row, remove: { busy: boolean; onDelete: () => void }) => ReactNode;

function DeleteCell<Row extends { id: string }>({ row, button }: { row: Row; button: DeleteButton<Row> }) {
  const { canWrite, remove, removing } = useEditableControls();
  if (!canWrite) return null;
  return button(row, { busy: removing === row.id, onDelete: () => remove(row) });
}

/** The last column: the row's delete, for writers only (<EditableTable> hides it from readers). */
export function deleteColumn<Row extends { id: string }>(button: DeleteButton<Row>) {
  return editableColumns<Row>().display({
    id: DELETE_COLUMN,
    header: () => <span className="sr-only">Actions</span>,
    enableSorting: false,
    cell: ({ row }) => <DeleteCell row={row.original} button={button} />,
  });
}
