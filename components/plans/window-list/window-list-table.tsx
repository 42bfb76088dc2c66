"use client";

import { useTable, type SortingState } from "@tanstack/react-table";
import { Fragment, useState } from "react";
import { columns, features, type WindowListRow } from "./table-columns";
import { useWindowListControls } from "./window-list-context";
import { SortableTh } from "@/components/ui/sortable-th";

/** On a narrow screen the list scrolls sideways; the mark stays in view so each row stays named. */
const STICKY = "sticky left-0 z-10";

/** The window list as a dense, sortable table; rows must be stable (memoised) between renders. */
export function WindowListTable({ rows }: { rows: WindowListRow[] }) {
  const { canWrite, notices, dismiss } = useWindowListControls();
  const [sorting, setSorting] = useState<SortingState>([{ id: "mark", desc: false }]);
  const table = useTable({
    features,
    columns,
    data: rows,
    getRowId: (r) => r.id,
    state: { sorting },
    onSortingChange: setSorting,
  });
  const visible = table.getAllLeafColumns().filter((c) => canWrite || c.id !== "actions");

  // `relative`: the sr-only labels in cells are absolutely placed and would otherwise widen the page.
  return (
    <div className="relative overflow-x-auto rounded-lg border border-maple-200 bg-white">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">Window list: opening types of this project. Column headers sort the list.</caption>
        <thead className="bg-maple-100 text-graphite-700">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers
                .filter((h) => visible.includes(h.column))
                .map((header) => {
                  const sorted = header.column.getIsSorted();
                  const end = header.column.columnDef.meta?.align === "end";
                  return (
                    <SortableTh
                      key={header.id}
                      sorted={sorted}
                      end={end}
                      sticky={header.column.id === "mark"}
                      onToggle={header.column.getCanSort() ? header.column.getToggleSortingHandler() : undefined}
                    >
                      <table.FlexRender header={header} />
                    </SortableTh>
                  );
                })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => {
            const notice = notices[row.id];
            return (
              <Fragment key={row.id}>
                <tr className="border-b border-maple-100 align-top last:border-0 hover:bg-maple-50">
                  {row
                    .getAllCells()
                    .filter((c) => visible.includes(c.column))
                    .map((c) => {
                      const meta = c.column.columnDef.meta;
                      const kind = meta?.align === "end" ? "num whitespace-nowrap" : meta?.column === "notes" ? "" : "whitespace-nowrap";
                      return (
                        <td key={c.id} className={`px-1.5 py-1 ${kind} ${meta?.width ?? ""} ${meta?.column === "mark" ? `${STICKY} bg-white font-semibold` : ""}`}>
                          <table.FlexRender cell={c} />
                        </td>
                      );
                    })}
                </tr>
                {(row.original.gaps ?? []).map((g) => (
                  <tr key={g.message} data-gap={row.original.mark}>
                    <td colSpan={visible.length} className="px-1.5 pb-2 text-xs text-graphite-900">
                      <span className="rounded border border-brass-500 bg-maple-100 px-1.5 py-0.5">
                        <span aria-hidden>△ </span>
                        <strong>Price book gap:</strong> {g.message} {g.fix}
                      </span>
                    </td>
                  </tr>
                ))}
                {notice && (
                  <tr>
                    <td colSpan={visible.length} className={`px-1.5 pb-2 text-xs font-medium ${notice.tone === "error" ? "text-alarm-700" : "text-graphite-700"}`} role="alert">
                      {notice.tone === "error" ? "⚠ " : ""}
                      {row.original.mark}: {notice.text}{" "}
                      <button type="button" className="ml-1 font-semibold text-graphite-700 underline" onClick={() => dismiss(row.id)}>
                        Dismiss
                      </button>
                    </td>
                  </tr>
                )}
              </Fragment>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
