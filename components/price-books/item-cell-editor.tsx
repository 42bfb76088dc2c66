"use client";

import { useRef, useState, type FocusEvent, type FormEvent, type KeyboardEvent } from "react";
import { columnLabel, editText, priceColumnLength, type ItemColumn } from "@/lib/price-book/item-edit";
import { KIND_LABELS, MATERIAL_KINDS } from "@/lib/price-book/kinds";
import type { PriceBookItemView } from "@/lib/price-book/types";
import { useItemsControls } from "./items-context";

const input = "w-full min-w-0 rounded border border-graphite-400 bg-white px-1.5 py-1 text-sm text-graphite-900 aria-[invalid=true]:border-alarm-600";

const PLACEHOLDERS: Partial<Record<string, string>> = { faceWidth: "2 1/2", thickness: "11/16", species: "Poplar", supplierCode: "none" };

/** Messages from one save, this cell's own first; others are named by their column. */
function messages(column: ItemColumn, fields: Record<string, string>): string[] {
  const own = fields[column];
  const others = Object.entries(fields)
    .filter(([c]) => c !== column)
    .map(([c, m]) => `${columnLabel(c)}: ${m}`);
  return own ? [own, ...others] : others;
}

/**
 * A cell in edit mode: Enter or leaving the cell saves, Escape cancels. A refusal keeps the editor open
 * with what was typed and the message under it, so nothing typed is lost.
 */
export function ItemCellEditor({ row, column }: { row: PriceBookItemView; column: ItemColumn }) {
  const { commit, stopEdit } = useItemsControls();
  const [text, setText] = useState(() => editText(row, column));
  const [errors, setErrors] = useState<string[]>([]);
  const [saving, setSaving] = useState(false);
  // Escape closes the editor; a blur the browser may still deliver afterwards must not save.
  const cancelled = useRef(false);
  const id = `edit-${row.id}-${column}`;
  const isPrice = priceColumnLength(column) !== null;
  // Numbers sit at the right of their cells; their messages open leftwards so they stay on the page.
  const numeric = isPrice || column === "faceWidth" || column === "thickness";

  async function save(e?: FormEvent) {
    e?.preventDefault();
    if (saving || cancelled.current) return;
    setSaving(true);
    const fields = await commit(row, column, text);
    setSaving(false);
    if (fields) setErrors(messages(column, fields));
    else stopEdit(row.id, column);
  }
  const onKeyDown = (e: KeyboardEvent) => {
    if (e.key !== "Escape") return;
    e.preventDefault();
    cancelled.current = true;
    stopEdit(row.id, column);
  };
  const onBlur = (e: FocusEvent<HTMLFormElement>) => {
    if (!e.currentTarget.contains(e.relatedTarget as Node | null)) void save();
  };

  const invalid = errors.length > 0 ? true : undefined;
  const label = `${columnLabel(column)} of ${row.name}`;
  return (
    <form onSubmit={save} onKeyDown={onKeyDown} onBlur={onBlur} className="relative" noValidate>
      {column === "kind" ? (
        <select id={id} aria-label={label} autoFocus className={input} value={text} onChange={(e) => setText(e.target.value)} disabled={saving}>
          {MATERIAL_KINDS.map((k) => (
            <option key={k} value={k}>
              {KIND_LABELS[k]}
            </option>
          ))}
        </select>
      ) : (
        <input
          id={id}
          aria-label={isPrice ? `${label} (dollars; empty to stop selling this length)` : label}
          aria-invalid={invalid}
          aria-describedby={invalid ? `${id}-error` : undefined}
          autoFocus
          onFocus={(e) => e.currentTarget.select()}
          className={`${input} ${numeric ? "num" : ""}`}
          value={text}
          placeholder={isPrice ? "not sold" : PLACEHOLDERS[column]}
          onChange={(e) => setText(e.target.value)}
          readOnly={saving}
          size={column === "name" || column === "species" ? 22 : 8}
        />
      )}
      {saving && (
        <span className="sr-only" role="status">
          Saving…
        </span>
      )}
      {invalid && (
        <div
          id={`${id}-error`}
          role="alert"
          className={`absolute top-full z-20 mt-1 w-64 whitespace-normal rounded-md border border-alarm-600 bg-white px-2 py-1.5 text-left text-xs font-medium text-alarm-700 shadow-md ${numeric ? "right-0" : "left-0"}`}
        >
          {errors.map((m) => (
            <p key={m}>⚠ {m}</p>
          ))}
        </div>
      )}
    </form>
  );
}
