"use client";

import { createColumnHelper, createSortedRowModel, metaHelper, rowSortingFeature, sortFn_alphanumeric, sortFn_basic, tableFeatures } from "@tanstack/react-table";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import { COLUMN_LABELS, type ColumnId, type EditableColumn } from "@/lib/plans/window-list/columns";
import { effectiveTrim } from "@/lib/plans/window-list/display";
import { RowActions } from "./row-actions";
import { WindowListCell } from "./window-list-cell";

/** A window-list line with how many of it the job has (from the tags), so the table can sort on it. */
export type WindowListRow = OpeningTypeView & {
  /** Openings of this type the job counts; `tags`: the tags placed for it on every sheet. */
  count: number;
  tags: number;
  gaps?: { message: string; fix: string }[];
};

type ColumnMeta = { align?: "end"; column?: ColumnId; width?: string };

export const features = tableFeatures({
  rowSortingFeature,
  sortedRowModel: createSortedRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric, basic: sortFn_basic },
  columnMeta: metaHelper<ColumnMeta>(),
});

const helper = createColumnHelper<typeof features, WindowListRow>();

const cell = (column: EditableColumn) =>
  function Cell({ row }: { row: { original: WindowListRow } }) {
    return <WindowListCell row={row.original} column={column} />;
  };

/** A column whose values are lengths: right-aligned, tabular, sorted by inches. */
const length = (column: EditableColumn, value: (r: WindowListRow) => number) =>
  helper.accessor(value, {
    id: column,
    header: COLUMN_LABELS[column],
    sortFn: "basic",
    cell: cell(column),
    meta: { align: "end", column },
  });

export const columns = helper.columns([
  helper.accessor("mark", { id: "mark", header: COLUMN_LABELS.mark, sortFn: "alphanumeric", cell: cell("mark"), meta: { column: "mark" } }),
  length("width", (r) => r.width),
  length("height", (r) => r.height),
  length("setback", (r) => r.setback),
  helper.accessor((r) => r.trimSpec.style, { id: "style", header: COLUMN_LABELS.style, sortFn: "alphanumeric", cell: cell("style"), meta: { column: "style" } }),
  length("casing", (r) => r.trimSpec.casingWidth * 1000 + r.trimSpec.casingThickness),
  length("reveal", (r) => effectiveTrim(r.trimSpec).reveal.value),
  length("horn", (r) => (r.trimSpec.style === "picture-frame" ? -1 : effectiveTrim(r.trimSpec).stoolHorn.value)),
  helper.accessor((r) => (r.trimSpec.style === "picture-frame" ? -1 : effectiveTrim(r.trimSpec).apronInset.value), {
    id: "apron",
    header: COLUMN_LABELS.apron,
    sortFn: "basic",
    cell: cell("apron"),
    meta: { column: "apron" },
  }),
  length("extension", (r) => effectiveTrim(r.trimSpec).extensionThickness.value),
  helper.accessor((r) => r.notes ?? "", { id: "notes", header: COLUMN_LABELS.notes, sortFn: "alphanumeric", cell: cell("notes"), meta: { column: "notes", width: "min-w-28 max-w-48" } }),
  helper.accessor("count", {
    id: "count",
    header: COLUMN_LABELS.count,
    sortFn: "basic",
    cell: ({ row }) => <span className="inline-block py-1 font-semibold">{row.original.count}</span>,
    meta: { align: "end", column: "count" },
  }),
  helper.display({
    id: "actions",
    header: () => <span className="sr-only">Actions</span>,
    enableSorting: false,
    cell: ({ row }) => <RowActions row={row.original} />,
  }),
]);
