"use client";

import { EditableCell } from "@/components/ui/editable-table/editable-cell";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import { COLUMN_LABELS, type EditableColumn } from "@/lib/plans/window-list/columns";
import { cellText, isDefaultCell } from "@/lib/plans/window-list/display";
import { CellEditor } from "./cell-editor";

/** One cell of the window list; defaults the row does not set itself are marked (explained under the table). */
export function WindowListCell({ row, column }: { row: OpeningTypeView; column: EditableColumn }) {
  return (
    <EditableCell
      rowId={row.id}
      column={column}
      label={`${COLUMN_LABELS[column]} of ${row.mark}`}
      text={cellText(row, column)}
      defaulted={isDefaultCell(row, column)}
      editor={<CellEditor row={row} column={column} />}
    />
  );
}
