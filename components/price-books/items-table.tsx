"use client";

import { useTable, type ColumnFiltersState, type SortingState } from "@tanstack/react-table";
import { Fragment, useMemo, useState } from "react";
import { KIND_LABELS, MATERIAL_KINDS } from "@/lib/price-book/kinds";
import type { PriceBookItemView } from "@/lib/price-book/types";
import { buildColumns, features } from "./item-columns";
import { useItemsControls } from "./items-context";
import { SortableTh } from "@/components/ui/sortable-th";

/** On a narrow screen the table scrolls sideways; the name stays in view so each row stays named. */
const STICKY = "sticky left-0 z-10";
// The delete button stays at the right edge, however many stock-length columns push the table wide.
const PIN_END = "sticky right-0 z-10 bg-white shadow-[-6px_0_6px_-6px_rgba(31,34,37,0.25)]";
const filterInput = "rounded-md border border-graphite-400 bg-white px-2.5 py-1.5 text-sm text-graphite-900 placeholder:text-graphite-500";

/** The book's items: sortable by any column, filtered by text and kind, edited in place by admins. */
export function ItemsTable({ items, lengths }: { items: PriceBookItemView[]; lengths: number[] }) {
  const { canWrite, notices, dismiss } = useItemsControls();
  const [sorting, setSorting] = useState<SortingState>([]);
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const [globalFilter, setGlobalFilter] = useState("");
  // TanStack Table rebuilds its models when columns change: only when the set of lengths does.
  const columns = useMemo(() => buildColumns(lengths), [lengths]);
  const table = useTable({
    features,
    columns,
    data: items,
    getRowId: (r) => r.id,
    state: { sorting, columnFilters, globalFilter },
    onSortingChange: setSorting,
    onColumnFiltersChange: setColumnFilters,
    onGlobalFilterChange: setGlobalFilter,
    globalFilterFn: "includesString",
  });
  const visible = table.getAllLeafColumns().filter((c) => canWrite || c.id !== "actions");
  const kind = (columnFilters.find((f) => f.id === "kind")?.value as string | undefined) ?? "";
  const shown = table.getRowModel().rows;

  return (
    <div className="space-y-2">
      <div className="flex flex-wrap items-end gap-3">
        <label className="space-y-1 text-sm">
          <span className="block font-medium text-graphite-700">Filter</span>
          <input type="search" className={filterInput} placeholder="Name, species or code" value={globalFilter} onChange={(e) => setGlobalFilter(e.target.value)} />
        </label>
        <label className="space-y-1 text-sm">
          <span className="block font-medium text-graphite-700">Kind</span>
          <select className={filterInput} value={kind} onChange={(e) => table.getColumn("kind")?.setFilterValue(e.target.value || undefined)}>
            <option value="">All kinds</option>
            {MATERIAL_KINDS.map((k) => (
              <option key={k} value={k}>
                {KIND_LABELS[k]}
              </option>
            ))}
          </select>
        </label>
        <p className="pb-1.5 text-sm text-graphite-700" role="status">
          Showing <span className="num font-semibold">{shown.length}</span> of <span className="num">{items.length}</span>
        </p>
      </div>
      <div className="relative overflow-x-auto rounded-lg border border-maple-200 bg-white">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">Materials of this price book with their price per stock length. Column headers sort the list.</caption>
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
                        sticky={header.column.id === "name"}
                        pinEnd={header.column.id === "actions"}
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
            {shown.map((row) => {
              const notice = notices[row.id];
              return (
                <Fragment key={row.id}>
                  <tr className="border-b border-maple-100 align-top last:border-0 hover:bg-maple-50">
                    {row
                      .getAllCells()
                      .filter((c) => visible.includes(c.column))
                      .map((c) => {
                        const meta = c.column.columnDef.meta;
                        const name = c.column.id === "name";
                        const actions = c.column.id === "actions";
                        return (
                          <td key={c.id} className={`px-1.5 py-1 ${meta?.align === "end" ? "num whitespace-nowrap" : ""} ${meta?.width ?? ""} ${name ? `${STICKY} bg-white font-semibold` : ""} ${actions ? PIN_END : ""}`}>
                            <table.FlexRender cell={c} />
                          </td>
                        );
                      })}
                  </tr>
                  {notice && (
                    <tr>
                      <td colSpan={visible.length} role="alert" className={`px-1.5 pb-2 text-xs font-medium ${notice.tone === "error" ? "text-alarm-700" : "text-graphite-700"}`}>
                        {notice.tone === "error" ? "⚠ " : ""}
                        {row.original.name}: {notice.text}{" "}
                        <button type="button" className="ml-1 font-semibold text-graphite-700 underline" onClick={() => dismiss(row.id)}>
                          Dismiss
                        </button>
                      </td>
                    </tr>
                  )}
                </Fragment>
              );
            })}
            {shown.length === 0 && (
              <tr>
                <td colSpan={visible.length} className="px-3 py-4 text-sm text-graphite-600">
                  No items match the filter.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
    </div>
  );
}
