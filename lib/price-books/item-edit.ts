import { fieldErrorsOf } from "@/lib/plans/window-list/field-errors";
import { priceBookItemUpdateSchema } from "@/lib/validators/price-books";
import { itemDiff } from "./diff";
import { KIND_LABELS, MATERIAL_KINDS } from "./kinds";
import { sameLength, sizeText, stockLengthText } from "./length-text";
import { formatMoney, moneyText } from "./numbers";
import type { PriceBookItemView } from "./types";

/**
 * One cell of the items table being edited: what its editor starts with, the PATCH it makes, and the
 * browser-side check (the API's own schema) that keeps a bad value from ever leaving the page.
 * Price columns are named `price:<inches>`, one per stock length.
 */
export type TextColumn = "name" | "faceWidth" | "thickness" | "species" | "supplierCode";
export type ItemColumn = TextColumn | "kind" | `price:${number}`;

export const COLUMN_LABELS: Record<TextColumn | "kind", string> = {
  name: "Name",
  kind: "Kind",
  faceWidth: "Face",
  thickness: "Thick.",
  species: "Species / finish",
  supplierCode: "Supplier code",
};

/** The kinds as `[value, name]` pairs, for the kind cell's editor and the table's kind filter. */
export const KIND_OPTIONS = MATERIAL_KINDS.map((k) => [k, KIND_LABELS[k]] as const);

export const priceColumnId = (inches: number): `price:${number}` => `price:${inches}`;
export const priceColumnLength = (column: string): number | null => (column.startsWith("price:") ? Number(column.slice(6)) : null);

/** The header of a column, also used to name a cell to screen readers and in messages. */
export function columnLabel(column: string): string {
  const inches = priceColumnLength(column);
  if (inches !== null) return `${stockLengthText(inches)} price`;
  return COLUMN_LABELS[column as TextColumn] ?? column;
}

const priceAt = (row: PriceBookItemView, inches: number) => row.stock.find((s) => sameLength(s.length, inches));

/** The cell as the table shows it. */
export function cellText(row: PriceBookItemView, column: ItemColumn): string {
  const inches = priceColumnLength(column);
  if (inches !== null) {
    const s = priceAt(row, inches);
    return s ? formatMoney(s.price) : "";
  }
  if (column === "kind") return KIND_LABELS[row.kind];
  if (column === "faceWidth" || column === "thickness") return sizeText(row[column]);
  return row[column as "name" | "species" | "supplierCode"] ?? "";
}

/** What the editor starts with: lengths as a tape reads them, prices without the "$". */
export function editText(row: PriceBookItemView, column: ItemColumn): string {
  const inches = priceColumnLength(column);
  if (inches !== null) {
    const s = priceAt(row, inches);
    return s ? moneyText(s.price) : "";
  }
  if (column === "kind") return row.kind;
  return cellText(row, column);
}

export type CellPlan = { kind: "unchanged" } | { kind: "invalid"; fields: Record<string, string> } | { kind: "patch"; body: Record<string, unknown> };

function bodyFor(row: PriceBookItemView, column: ItemColumn, text: string): { body: Record<string, unknown>; lengths: number[] } {
  const inches = priceColumnLength(column);
  if (inches === null) return { body: { version: row.version, [column]: text }, lengths: [] };
  // Emptying a price cell takes that length off the item; sorted as the server stores it, so indexes agree.
  const stock: { length: number; price: number | string }[] = row.stock.filter((s) => !sameLength(s.length, inches));
  if (text.trim() !== "") stock.push({ length: inches, price: text });
  stock.sort((a, b) => a.length - b.length);
  return { body: { version: row.version, stock }, lengths: stock.map((s) => s.length) };
}

/** An API field key (`stock.2.price`, `faceWidth`) → the table column it belongs to. */
export function columnOfField(key: string, lengths: number[], edited: ItemColumn): string {
  const m = /^stock\.(\d+)\./.exec(key);
  if (m) {
    const inches = lengths[Number(m[1])];
    return inches === undefined ? edited : priceColumnId(inches);
  }
  if (key === "stock" || key === "_" || key === "version") return edited;
  return key;
}

export function planItemEdit(row: PriceBookItemView, column: ItemColumn, text: string): CellPlan {
  const { body, lengths } = bodyFor(row, column, text);
  const parsed = priceBookItemUpdateSchema.safeParse(body);
  if (!parsed.success) {
    const fields: Record<string, string> = {};
    for (const [key, message] of Object.entries(fieldErrorsOf(parsed.error))) {
      const at = columnOfField(key, lengths, column);
      fields[at] ??= key === "stock" && lengths.length === 0 ? "An item needs at least one price; delete the item instead." : message;
    }
    return { kind: "invalid", fields };
  }
  const { version: _, ...set } = parsed.data;
  const after = { ...row, ...set };
  return Object.keys(itemDiff(row, after)).length === 0 ? { kind: "unchanged" } : { kind: "patch", body };
}
