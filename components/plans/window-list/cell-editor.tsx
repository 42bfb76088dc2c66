"use client";

import { useRef, useState, type FocusEvent, type FormEvent, type KeyboardEvent } from "react";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import type { CellEdit } from "@/lib/plans/window-list/cell-patch";
import { COLUMN_LABELS, STYLE_LABELS, errorsByColumn, type EditableColumn } from "@/lib/plans/window-list/columns";
import { editText, effectiveTrim } from "@/lib/plans/window-list/display";
import { useWindowListControls } from "./window-list-context";

const input =
  "w-full min-w-0 rounded border border-graphite-400 bg-white px-1.5 py-1 text-sm text-graphite-900 aria-[invalid=true]:border-alarm-600";

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

/** Messages from one save, this cell's own first; others are named by their column. */
function messages(column: EditableColumn, fields: Record<string, string>): string[] {
  const byColumn = errorsByColumn(fields);
  const own = byColumn[column];
  const others = Object.entries(byColumn)
    .filter(([c]) => c !== column)
    .map(([c, m]) => (c === "row" ? m : `${COLUMN_LABELS[c as EditableColumn]}: ${m}`));
  return own ? [own, ...others] : others;
}

/**
 * A cell in edit mode: Enter or leaving the cell saves, Escape cancels. Problems keep the editor open
 * with what was typed, so nothing typed is lost to a refusal.
 */
export function CellEditor({ row, column }: { row: OpeningTypeView; column: EditableColumn }) {
  const { commit, stopEdit } = useWindowListControls();
  const [text, setText] = useState(() => editText(row, column));
  const [returns, setReturns] = useState(() => effectiveTrim(row.trimSpec).apronReturns.value);
  const [errors, setErrors] = useState<string[]>([]);
  const [saving, setSaving] = useState(false);
  // Escape closes the editor; a blur the browser may still deliver afterwards must not save.
  const cancelled = useRef(false);
  const id = `edit-${row.id}-${column}`;

  const edit = (): CellEdit => {
    if (column === "style") return { column, style: text === "picture-frame" ? "picture-frame" : "stool-and-apron" };
    if (column === "apron") return { column, text, returns };
    return { column, text };
  };

  async function save(e?: FormEvent) {
    e?.preventDefault();
    if (saving || cancelled.current) return;
    setSaving(true);
    const fields = await commit(row, edit());
    setSaving(false);
    if (fields) setErrors(messages(column, fields));
    else stopEdit(row.id, column);
  }

  const onKeyDown = (e: KeyboardEvent) => {
    if (e.key === "Escape") {
      e.preventDefault();
      cancelled.current = true;
      stopEdit(row.id, column);
    }
  };
  // Saving on blur only when focus leaves the whole editor (the apron has two controls).
  const onBlur = (e: FocusEvent<HTMLFormElement>) => {
    if (!e.currentTarget.contains(e.relatedTarget as Node | null)) void save();
  };

  const invalid = errors.length > 0 ? true : undefined;
  const described = invalid ? `${id}-error` : undefined;
  const label = `${COLUMN_LABELS[column]} of ${row.mark}`;

  return (
    <form onSubmit={save} onKeyDown={onKeyDown} onBlur={onBlur} className="relative" noValidate>
      {column === "style" ? (
        <select id={id} aria-label={label} autoFocus className={input} value={text} onChange={(e) => setText(e.target.value)} disabled={saving}>
          {Object.entries(STYLE_LABELS).map(([value, name]) => (
            <option key={value} value={value}>
              {name}
            </option>
          ))}
        </select>
      ) : (
        <input
          id={id}
          aria-label={column === "apron" ? `Apron inset of ${row.mark}` : label}
          aria-invalid={invalid}
          aria-describedby={described}
          autoFocus
          onFocus={(e) => e.currentTarget.select()}
          className={`${input} ${column === "mark" || column === "notes" ? "" : "num"}`}
          value={text}
          placeholder={PLACEHOLDERS[column]}
          onChange={(e) => setText(e.target.value)}
          readOnly={saving}
          size={column === "notes" ? 24 : 9}
        />
      )}
      {column === "apron" && (
        // Pressing on the label would take focus from the inset field (and so save); keep focus where it is.
        <label className="mt-1 flex items-center gap-1 text-xs text-graphite-700" onMouseDown={(e) => e.preventDefault()}>
          <input type="checkbox" checked={returns} onChange={(e) => setReturns(e.target.checked)} disabled={saving} />
          Return miters
        </label>
      )}
      {saving && <span className="sr-only" role="status">Saving…</span>}
      {invalid && (
        <div
          id={`${id}-error`}
          role="alert"
          className="absolute left-0 top-full z-20 mt-1 w-60 rounded-md border border-alarm-600 bg-white px-2 py-1.5 text-left text-xs font-medium text-alarm-700 shadow-md"
        >
          {errors.map((m) => (
            <p key={m}>⚠ {m}</p>
          ))}
        </div>
      )}
    </form>
  );
}
