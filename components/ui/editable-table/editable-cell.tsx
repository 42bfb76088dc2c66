"use client";

import type { ReactNode } from "react";
import { useEditableControls } from "./context";

/**
 * One cell of an editable table: plain text for readers; for writers a button that opens `editor`.
 * A `defaulted` value (one the row inherits rather than sets) is shown in italics and said as
 * "(default)", so the marking does not rest on colour.
 */
export function EditableCell({
  rowId,
  column,
  label,
  text,
  defaulted = false,
  editor,
}: {
  rowId: string;
  column: string;
  /** Names the cell to screen readers: "Width of W1". */
  label: string;
  text: string;
  defaulted?: boolean;
  editor: ReactNode;
}) {
  const { canWrite, editing, startEdit } = useEditableControls();
  if (editing?.rowId === rowId && editing.column === column) return editor;
  const look = defaulted ? "italic text-graphite-600" : "";

  if (!canWrite) {
    return (
      <span className={look}>
        {text || (
          <span className="text-graphite-500">
            —<span className="sr-only">none</span>
          </span>
        )}
        {defaulted && <span className="sr-only"> (default)</span>}
      </span>
    );
  }
  return (
    <button
      type="button"
      onClick={() => startEdit(rowId, column)}
      className={`-mx-1.5 block w-[calc(100%+0.75rem)] rounded px-1.5 py-1 text-inherit hover:bg-maple-100 focus-visible:bg-maple-100 ${look}`}
      style={{ textAlign: "inherit" }}
      aria-label={`${label}: ${text || "none"}${defaulted ? " (default)" : ""}. Edit`}
    >
      {text || <span className="text-graphite-500">—</span>}
    </button>
  );
}
