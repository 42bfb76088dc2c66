"use client";

import type { CellField } from "./cell-editor-shell";

const INPUT =
  "w-full min-w-0 rounded border border-graphite-400 bg-white px-1.5 py-1 text-sm text-graphite-900 aria-[invalid=true]:border-alarm-600";

/** A cell's text editor: takes focus with its text selected, so typing replaces the value. */
export function CellInput({
  field,
  label,
  value,
  onChange,
  placeholder,
  numeric = false,
  size,
}: {
  field: CellField;
  label: string;
  value: string;
  onChange: (text: string) => void;
  placeholder?: string;
  /** Lengths and prices: tabular figures. */
  numeric?: boolean;
  size: number;
}) {
  return (
    <input
      id={field.id}
      aria-label={label}
      aria-invalid={field.invalid}
      aria-describedby={field.describedBy}
      autoFocus
      onFocus={(e) => e.currentTarget.select()}
      className={`${INPUT} ${numeric ? "num" : ""}`}
      value={value}
      placeholder={placeholder}
      onChange={(e) => onChange(e.target.value)}
      readOnly={field.saving}
      size={size}
    />
  );
}

/** A cell's choice among fixed values, as `[value, name]` pairs. */
export function CellSelect({
  field,
  label,
  value,
  onChange,
  options,
}: {
  field: CellField;
  label: string;
  value: string;
  onChange: (value: string) => void;
  options: readonly (readonly [string, string])[];
}) {
  return (
    <select id={field.id} aria-label={label} autoFocus className={INPUT} value={value} onChange={(e) => onChange(e.target.value)} disabled={field.saving}>
      {options.map(([v, name]) => (
        <option key={v} value={v}>
          {name}
        </option>
      ))}
    </select>
  );
}
