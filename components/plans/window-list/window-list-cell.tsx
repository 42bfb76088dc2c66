"use client";

import type { OpeningTypeView } from "@/lib/plans/api-types";
import { COLUMN_LABELS, type EditableColumn } from "@/lib/plans/window-list/columns";
import { cellText, isDefaultCell } from "@/lib/plans/window-list/display";
import { CellEditor } from "./cell-editor";
import { useWindowListControls } from "./window-list-context";

/**
 * One cell of the window list. Defaults the row does not set itself are shown in italics (explained
 * under the table) so the marking does not rest on colour; writers click the value to edit it.
 */
export function WindowListCell({ row, column }: { row: OpeningTypeView; column: EditableColumn }) {
  const { canWrite, editing, startEdit } = useWindowListControls();
  const text = cellText(row, column);
  const fallback = isDefaultCell(row, column);
  const look = fallback ? "italic text-graphite-600" : "";

  if (editing?.rowId === row.id && editing.column === column) return <CellEditor row={row} column={column} />;
  if (!canWrite) {
    return (
      <span className={look}>
        {text || <span className="text-graphite-500">—</span>}
        {fallback && <span className="sr-only"> (default)</span>}
      </span>
    );
  }
  return (
    <button
      type="button"
      onClick={() => startEdit(row.id, column)}
      className={`-mx-1.5 block w-[calc(100%+0.75rem)] rounded px-1.5 py-1 text-inherit hover:bg-maple-100 focus-visible:bg-maple-100 ${look}`}
      style={{ textAlign: "inherit" }}
      aria-label={`${COLUMN_LABELS[column]} of ${row.mark}: ${text || "none"}${fallback ? " (default)" : ""}. Edit`}
    >
      {text || <span className="text-graphite-500">—</span>}
    </button>
  );
}
