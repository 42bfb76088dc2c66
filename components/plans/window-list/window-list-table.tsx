"use client";

import { EditableTable, type EditableTableSpec } from "@/components/ui/editable-table/editable-table";
import { columns, type WindowListRow } from "./table-columns";
import { useWindowListControls } from "./window-list-context";

const SPEC: EditableTableSpec<WindowListRow> = {
  caption: "Window list: opening types of this project. Column headers sort the list.",
  nameColumn: "mark",
  initialSorting: [{ id: "mark", desc: false }],
  afterRow: (row, span) =>
    (row.gaps ?? []).map((g) => (
      <tr key={g.message} data-gap={row.mark}>
        <td colSpan={span} className="px-1.5 pb-2 text-xs text-graphite-900">
          <span className="rounded border border-brass-500 bg-maple-100 px-1.5 py-0.5">
            <span aria-hidden>△ </span>
            <strong>Price book gap:</strong> {g.message} {g.fix}
          </span>
        </td>
      </tr>
    )),
};

/** The window list as a dense, sortable table; rows must be stable (memoised) between renders. */
export function WindowListTable({ rows }: { rows: WindowListRow[] }) {
  const controls = useWindowListControls();
  return <EditableTable rows={rows} columns={columns} controls={controls} spec={SPEC} />;
}
