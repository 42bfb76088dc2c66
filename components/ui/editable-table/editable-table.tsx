"use client";

import { useTable, type ColumnDef, type ColumnFiltersState, type SortingState } from "@tanstack/react-table";
import { Fragment, useState, type ReactNode } from "react";
import { SortableTh } from "@/components/ui/sortable-th";
import { DELETE_COLUMN, features } from "./columns";
import { EditableControlsContext, type EditableControls, type RowNotice } from "./context";
import { TableFilter, type SelectFilter } from "./table-filter";

/** On a narrow screen the table scrolls sideways; the naming column stays in view so each row stays named. */
const STICKY = "sticky left-0 z-10";
// A pinned delete stays at the right edge, however many columns push the table wide.
const PIN_END = "sticky right-0 z-10 bg-white shadow-[-6px_0_6px_-6px_rgba(31,34,37,0.25)]";

type Filter = { placeholder: string; empty: string; selects?: SelectFilter[] };

/** What stays the same for one table from render to render: keep it at module scope. */
export interface EditableTableSpec<Row> {
  /** For screen readers: what the table lists and that its headers sort it. */
  caption: string;
  /** The column that names a row (a field of the row of the same name): kept in view when the table scrolls sideways, and names the row in its notice. */
  nameColumn: keyof Row & string;
  initialSorting?: SortingState;
  /** Keep the delete column at the right edge of a table wider than its frame. */
  pinDelete?: boolean;
  /** A text filter (and select filters) above the table. */
  filter?: Filter;
  /** Extra lines under a row, spanning `span` columns. */
  afterRow?: (row: Row, span: number) => ReactNode;
}

const NO_SORTING: SortingState = [];

/**
 * A dense table edited in place: headers sort, cells open their editors (EditableCell), a row's notice
 * (a refusal, a stale edit) shows under it with a Dismiss, and the delete column shows to writers only.
 * `columns` and `rows` must be stable (memoised) between renders.
 */
export function EditableTable<Row extends { id: string }>({
  rows,
  columns,
  controls,
  spec,
}: {
  rows: Row[];
  // `any`: each column keeps its own value type, as TanStack's column helper returns them.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- see above
  columns: ColumnDef<typeof features, Row, any>[];
  controls: EditableControls<Row>;
  spec: EditableTableSpec<Row>;
}) {
  const { nameColumn, pinDelete = false, filter, afterRow } = spec;
  const [sorting, setSorting] = useState<SortingState>(spec.initialSorting ?? NO_SORTING);
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const [globalFilter, setGlobalFilter] = useState("");
  const table = useTable({
    features,
    columns,
    data: rows,
    getRowId: (r) => r.id,
    state: { sorting, columnFilters, globalFilter },
    onSortingChange: setSorting,
    onColumnFiltersChange: setColumnFilters,
    onGlobalFilterChange: setGlobalFilter,
    globalFilterFn: "includesString",
  });
  const visible = table.getAllLeafColumns().filter((c) => controls.canWrite || c.id !== DELETE_COLUMN);
  const shown = table.getRowModel().rows;
  const span = visible.length;

  const grid = (
    // `relative`: the sr-only labels in cells are absolutely placed and would otherwise widen the page.
    <div className="relative overflow-x-auto rounded-lg border border-maple-200 bg-white">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">{spec.caption}</caption>
        <thead className="bg-maple-100 text-graphite-700">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers
                .filter((h) => visible.includes(h.column))
                .map((header) => (
                  <SortableTh
                    key={header.id}
                    sorted={header.column.getIsSorted()}
                    end={header.column.columnDef.meta?.align === "end"}
                    sticky={header.column.id === nameColumn}
                    pinEnd={pinDelete && header.column.id === DELETE_COLUMN}
                    onToggle={header.column.getCanSort() ? header.column.getToggleSortingHandler() : undefined}
                  >
                    <table.FlexRender header={header} />
                  </SortableTh>
                ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {shown.map((row) => (
            <Fragment key={row.id}>
              <tr className="border-b border-maple-100 align-top last:border-0 hover:bg-maple-50">
                {row
                  .getAllCells()
                  .filter((c) => visible.includes(c.column))
                  .map((c) => {
                    const meta = c.column.columnDef.meta;
                    const named = c.column.id === nameColumn ? `${STICKY} bg-white font-semibold` : "";
                    const actions = c.column.id === DELETE_COLUMN ? (pinDelete ? PIN_END : "whitespace-nowrap") : "";
                    return (
                      <td key={c.id} className={`px-1.5 py-1 ${meta?.align === "end" ? "num whitespace-nowrap" : ""} ${meta?.className ?? ""} ${named} ${actions}`}>
                        <table.FlexRender cell={c} />
                      </td>
                    );
                  })}
              </tr>
              {afterRow?.(row.original, span)}
              <NoticeRow notice={controls.notices[row.id]} name={String(row.original[nameColumn])} span={span} onDismiss={() => controls.dismiss(row.id)} />
            </Fragment>
          ))}
          {filter && shown.length === 0 && (
            <tr>
              <td colSpan={span} className="px-3 py-4 text-sm text-graphite-600">
                {filter.empty}
              </td>
            </tr>
          )}
        </tbody>
      </table>
    </div>
  );

  return (
    <EditableControlsContext value={controls}>
      {filter ? (
        <div className="space-y-2">
          <TableFilter
            placeholder={filter.placeholder}
            text={globalFilter}
            onText={setGlobalFilter}
            selects={(filter.selects ?? []).map((f) => ({
              filter: f,
              value: (columnFilters.find((cf) => cf.id === f.column)?.value as string | undefined) ?? "",
              onChange: (value: string) => table.getColumn(f.column)?.setFilterValue(value || undefined),
            }))}
            shown={shown.length}
            total={rows.length}
          />
          {grid}
        </div>
      ) : (
        grid
      )}
    </EditableControlsContext>
  );
}

function NoticeRow({ notice, name, span, onDismiss }: { notice: RowNotice | undefined; name: string; span: number; onDismiss: () => void }) {
  if (!notice) return null;
  return (
    <tr>
      <td colSpan={span} role="alert" className={`px-1.5 pb-2 text-xs font-medium ${notice.tone === "error" ? "text-alarm-700" : "text-graphite-700"}`}>
        {notice.tone === "error" ? "⚠ " : ""}
        {name}: {notice.text}{" "}
        <button type="button" className="ml-1 font-semibold text-graphite-700 underline" onClick={onDismiss}>
          Dismiss
        </button>
      </td>
    </tr>
  );
}
