"use client";

import { useState } from "react";
import { CellEditorShell } from "@/components/ui/editable-table/cell-editor-shell";
import { CellInput, CellSelect } from "@/components/ui/editable-table/cell-fields";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import type { CellEdit } from "@/lib/plans/window-list/cell-patch";
import { COLUMN_LABELS, STYLE_LABELS, errorsByColumn, type EditableColumn } from "@/lib/plans/window-list/columns";
import { editText, effectiveTrim } from "@/lib/plans/window-list/display";
import { useWindowListControls } from "./window-list-context";

/** Lengths are typed as people write them; a hint in the placeholder shows how. */
const PLACEHOLDERS: Partial<Record<EditableColumn, string>> = {
  width: `35 1/2 or 2'-11 1/2"`,
  height: `59 1/2 or 4'-11 1/2"`,
  setback: "4 9/16",
  casing: "2 1/2 x 11/16",
  reveal: "default",
  horn: "2 × thickness",
  extension: "default",
  apron: "inset",
};

const STYLE_OPTIONS = Object.entries(STYLE_LABELS);

/** Messages about no one cell (`row`) go unnamed. */
const labelOf = (column: string) => (column === "row" ? null : COLUMN_LABELS[column as EditableColumn]);

/** A window-list cell in edit mode; the apron's holds its inset and whether it has return miters. */
export function CellEditor({ row, column }: { row: OpeningTypeView; column: EditableColumn }) {
  const { commit } = useWindowListControls();
  const [text, setText] = useState(() => editText(row, column));
  const [returns, setReturns] = useState(() => effectiveTrim(row.trimSpec).apronReturns.value);
  const label = `${COLUMN_LABELS[column]} of ${row.mark}`;

  const edit = (): CellEdit => {
    if (column === "style") return { column, style: text === "picture-frame" ? "picture-frame" : "stool-and-apron" };
    if (column === "apron") return { column, text, returns };
    return { column, text };
  };

  return (
    <CellEditorShell rowId={row.id} column={column} save={() => commit(row, edit())} byColumn={errorsByColumn} labelOf={labelOf}>
      {(field) => (
        <>
          {column === "style" ? (
            <CellSelect field={field} label={label} value={text} onChange={setText} options={STYLE_OPTIONS} />
          ) : (
            <CellInput
              field={field}
              label={column === "apron" ? `Apron inset of ${row.mark}` : label}
              value={text}
              onChange={setText}
              placeholder={PLACEHOLDERS[column]}
              numeric={column !== "mark" && column !== "notes"}
              size={column === "notes" ? 24 : 9}
            />
          )}
          {column === "apron" && (
            // Pressing on the label would take focus from the inset field (and so save); keep focus where it is.
            <label className="mt-1 flex items-center gap-1 text-xs text-graphite-700" onMouseDown={(e) => e.preventDefault()}>
              <input type="checkbox" checked={returns} onChange={(e) => setReturns(e.target.checked)} disabled={field.saving} />
              Return miters
            </label>
          )}
        </>
      )}
    </CellEditorShell>
  );
}
