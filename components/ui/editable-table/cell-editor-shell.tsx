"use client";

import { useRef, useState, type FocusEvent, type FormEvent, type KeyboardEvent, type ReactNode } from "react";
import { useEditableControls, type FieldErrors } from "./context";

/** What the shell tells the controls inside it. */
export interface CellField {
  id: string;
  saving: boolean;
  invalid: true | undefined;
  describedBy: string | undefined;
}

/** Messages from one save, the edited cell's own first; others are named by their column (`null`: the whole row's). */
export function cellMessages(column: string, byColumn: Partial<Record<string, string>>, labelOf: (column: string) => string | null): string[] {
  const own = byColumn[column];
  const others = Object.entries(byColumn).flatMap(([c, m]) => {
    if (c === column || !m) return [];
    const label = labelOf(c);
    return [label === null ? m : `${label}: ${m}`];
  });
  return own ? [own, ...others] : others;
}

/**
 * A cell in edit mode: Enter or leaving the cell saves, Escape cancels. A refusal keeps the editor open
 * with what was typed and the messages under it, so nothing typed is lost. A 409 is the page's to settle
 * (`save` resolves null; the row then shows the server's current values).
 */
export function CellEditorShell({
  rowId,
  column,
  save,
  byColumn,
  labelOf,
  errorsAtEnd = false,
  children,
}: {
  rowId: string;
  column: string;
  /** Resolves to the messages to show, or null when the edit is done. */
  save: () => Promise<FieldErrors | null>;
  /** Where each message belongs, when the save keys them otherwise than by column (API paths). */
  byColumn?: (fields: FieldErrors) => Partial<Record<string, string>>;
  labelOf: (column: string) => string | null;
  /** Numbers sit at the right of their cells; their messages open leftwards so they stay on the page. */
  errorsAtEnd?: boolean;
  children: (field: CellField) => ReactNode;
}) {
  const { stopEdit } = useEditableControls();
  const [errors, setErrors] = useState<string[]>([]);
  const [saving, setSaving] = useState(false);
  // Escape closes the editor; a blur the browser may still deliver afterwards must not save.
  const cancelled = useRef(false);
  const id = `edit-${rowId}-${column}`;

  async function submit(e?: FormEvent) {
    e?.preventDefault();
    if (saving || cancelled.current) return;
    setSaving(true);
    const fields = await save();
    setSaving(false);
    if (fields) setErrors(cellMessages(column, byColumn ? byColumn(fields) : fields, labelOf));
    else stopEdit(rowId, column);
  }
  const onKeyDown = (e: KeyboardEvent) => {
    if (e.key !== "Escape") return;
    e.preventDefault();
    cancelled.current = true;
    stopEdit(rowId, column);
  };
  // Saving on blur only when focus leaves the whole editor (one may hold two controls).
  const onBlur = (e: FocusEvent<HTMLFormElement>) => {
    if (!e.currentTarget.contains(e.relatedTarget as Node | null)) void submit();
  };

  const invalid = errors.length > 0 ? true : undefined;
  const describedBy = invalid ? `${id}-error` : undefined;
  return (
    <form onSubmit={submit} onKeyDown={onKeyDown} onBlur={onBlur} className="relative" noValidate>
      {children({ id, saving, invalid, describedBy })}
      {saving && (
        <span className="sr-only" role="status">
          Saving…
        </span>
      )}
      {invalid && (
        <div
          id={describedBy}
          role="alert"
          className={`absolute top-full z-20 mt-1 w-64 whitespace-normal rounded-md border border-alarm-600 bg-white px-2 py-1.5 text-left text-xs font-medium text-alarm-700 shadow-md ${errorsAtEnd ? "right-0" : "left-0"}`}
        >
          {errors.map((m) => (
            <p key={m}>⚠ {m}</p>
          ))}
        </div>
      )}
    </form>
  );
}
