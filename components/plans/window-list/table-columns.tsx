"use client";

import { deleteColumn, editableColumns } from "@/components/ui/editable-table/columns";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import { COLUMN_LABELS, type EditableColumn } from "@/lib/plans/window-list/columns";
import { effectiveTrim } from "@/lib/plans/window-list/display";
import { KindCell } from "./kind-cell";
import { RowActions } from "./row-actions";
import { WindowListCell } from "./window-list-cell";

/** A window-list line with how many of it the job has (from the tags), so the table can sort on it. */
export type WindowListRow = OpeningTypeView & {
  /** Openings of this type the job counts; `tags`: the tags placed for it on every sheet. */
  count: number;
  tags: number;
  gaps?: { message: string; fix: string }[];
};

const helper = editableColumns<WindowListRow>();
const NOWRAP = { className: "whitespace-nowrap" };

const cell = (column: EditableColumn) =>
  function Cell({ row }: { row: { original: WindowListRow } }) {
    return <WindowListCell row={row.original} column={column} />;
  };

/** A column whose values are lengths: right-aligned, tabular, sorted by inches. */
const length = (column: EditableColumn, value: (r: WindowListRow) => number) =>
  helper.accessor(value, { id: column, header: COLUMN_LABELS[column], sortFn: "basic", cell: cell(column), meta: { align: "end" } });

export const columns = helper.columns([
  helper.accessor("mark", { id: "mark", header: COLUMN_LABELS.mark, sortFn: "alphanumeric", cell: cell("mark"), meta: NOWRAP }),
  helper.accessor("kind", { id: "kind", header: "Kind", sortFn: "alphanumeric", cell: ({ row }) => <KindCell row={row.original} />, meta: { className: "min-w-24 max-w-56" } }),
  length("width", (r) => r.width),
  length("height", (r) => r.height),
  length("setback", (r) => r.setback),
  helper.accessor((r) => r.trimSpec.style, { id: "style", header: COLUMN_LABELS.style, sortFn: "alphanumeric", cell: cell("style"), meta: NOWRAP }),
  length("casing", (r) => r.trimSpec.casingWidth * 1000 + r.trimSpec.casingThickness),
  length("reveal", (r) => effectiveTrim(r.trimSpec).reveal.value),
  length("horn", (r) => (r.trimSpec.style === "picture-frame" ? -1 : effectiveTrim(r.trimSpec).stoolHorn.value)),
  helper.accessor((r) => (r.trimSpec.style === "picture-frame" ? -1 : effectiveTrim(r.trimSpec).apronInset.value), {
    id: "apron",
    header: COLUMN_LABELS.apron,
    sortFn: "basic",
    cell: cell("apron"),
    meta: NOWRAP,
  }),
  length("extension", (r) => effectiveTrim(r.trimSpec).extensionThickness.value),
  helper.accessor((r) => r.notes ?? "", { id: "notes", header: COLUMN_LABELS.notes, sortFn: "alphanumeric", cell: cell("notes"), meta: { className: "min-w-28 max-w-48" } }),
  helper.accessor("count", {
    id: "count",
    header: COLUMN_LABELS.count,
    sortFn: "basic",
    cell: ({ row }) => <span className="inline-block py-1 font-semibold">{row.original.count}</span>,
    meta: { align: "end" },
  }),
  deleteColumn<WindowListRow>((row, remove) => <RowActions row={row} {...remove} />),
]);
