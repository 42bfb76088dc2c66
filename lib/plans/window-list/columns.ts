import type { Style } from "@/takeoff";

/** The window list's columns, in display order. `count` is read-only (it comes from the tags). */
export const COLUMN_IDS = [
  "mark",
  "width",
  "height",
  "setback",
  "style",
  "casing",
  "reveal",
  "horn",
  "apron",
  "extension",
  "notes",
  "count",
] as const;
export type ColumnId = (typeof COLUMN_IDS)[number];
export type EditableColumn = Exclude<ColumnId, "count">;

export const COLUMN_LABELS: Record<ColumnId, string> = {
  mark: "Mark",
  width: "Width",
  height: "Height",
  setback: "Setback",
  style: "Style",
  casing: "Casing",
  reveal: "Reveal",
  horn: "Horn",
  apron: "Apron",
  extension: "Ext. thk.",
  notes: "Notes",
  count: "In job",
};

export const STYLE_LABELS: Record<Style, string> = {
  "stool-and-apron": "Stool & apron",
  "picture-frame": "Picture frame",
};

/**
 * Where a field error from the API (or the browser check) belongs, so the message sits next to the cell
 * that caused it. Keys are the API's dotted paths; null means "show it for the whole row".
 */
const FIELD_COLUMN: Record<string, EditableColumn> = {
  mark: "mark",
  width: "width",
  height: "height",
  setback: "setback",
  notes: "notes",
  "trimSpec.style": "style",
  "trimSpec.casingWidth": "casing",
  "trimSpec.casingThickness": "casing",
  "trimSpec.reveal": "reveal",
  "trimSpec.stoolHorn": "horn",
  "trimSpec.apronInset": "apron",
  "trimSpec.apronReturns": "apron",
  "trimSpec.extensionThickness": "extension",
};

export function columnForField(key: string): EditableColumn | null {
  if (key.startsWith("wallBuildUp")) return "setback";
  return FIELD_COLUMN[key] ?? null;
}

/** Field errors → one message per column, plus `row` for those that belong to no cell. */
export function errorsByColumn(fields: Record<string, string>): Partial<Record<EditableColumn | "row", string>> {
  const out: Partial<Record<EditableColumn | "row", string>> = {};
  for (const [key, message] of Object.entries(fields)) {
    const column = columnForField(key) ?? "row";
    out[column] = out[column] ? `${out[column]} ${message}` : message;
  }
  return out;
}
