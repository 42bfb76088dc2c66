import { parseLength } from "@/takeoff";
import { priceBookItemCreateSchema } from "@/lib/validators/price-book";
import { writeCsv } from "@/lib/csv/write";
import { parseCsv } from "./csv-grammar";
import { MATERIAL_KINDS, readKind } from "./kinds";
import { sameLength, sizeText, stockLengthText } from "./length-text";
import { moneyText } from "./numbers";
import type { ItemFields } from "./types";

/**
 * A price book's items as CSV. One row per item; one column per stock length, headed `price 8'`,
 * holding that length's price or nothing when the item is not sold in it. A spreadsheet user edits
 * a price in its own cell, sorts by it, or raises a column by a percentage with a formula, and a
 * new length is one more column. Lengths carry their inch marks (11/16") so spreadsheets keep them
 * as text instead of turning them into dates.
 */
export const BASE_COLUMNS = ["name", "kind", "face_width", "thickness", "species", "supplier_code"] as const;
type BaseColumn = (typeof BASE_COLUMNS)[number];

export const MAX_IMPORT_ROWS = 2000;
const PRICE_COLUMN = /^price[\s_]*(.+)$/i;

/**
 * The writer (lib/csv/write.ts) puts a value a spreadsheet would run as a formula (=, +, -, @) behind an
 * apostrophe, which spreadsheets hide; the import takes it off again, so the round trip is exact.
 */
const unguard = (v: string) => (/^'[=+\-@\t\r]/.test(v) ? v.slice(1) : v);

const KIND_ORDER = new Map(MATERIAL_KINDS.map((k, i) => [k, i]));
const byKindThenName = (a: ItemFields, b: ItemFields) =>
  (KIND_ORDER.get(a.kind)! - KIND_ORDER.get(b.kind)!) || a.name.localeCompare(b.name, "en", { sensitivity: "base" });

/** Every stock length any item is sold in, shortest first. */
export function stockLengths(items: readonly ItemFields[]): number[] {
  const out: number[] = [];
  for (const s of items.flatMap((i) => i.stock)) if (!out.some((l) => sameLength(l, s.length))) out.push(s.length);
  return out.sort((a, b) => a - b);
}

export const priceColumn = (inches: number) => `price ${stockLengthText(inches)}`;

/** The download: a BOM first so spreadsheets read the file as UTF-8 (× and accented species names). */
export function itemsToCsv(items: readonly ItemFields[]): string {
  const lengths = stockLengths(items);
  const header = [...BASE_COLUMNS, ...lengths.map(priceColumn)];
  const rows = [...items].sort(byKindThenName).map((i) => [
    i.name,
    i.kind,
    sizeText(i.faceWidth),
    sizeText(i.thickness),
    i.species ?? "",
    i.supplierCode ?? "",
    ...lengths.map((l) => {
      const s = i.stock.find((x) => sameLength(x.length, l));
      return s ? moneyText(s.price) : "";
    }),
  ]);
  return writeCsv([header, ...rows], { bom: true });
}

export interface CsvItemRow {
  line: number;
  /** As written, for naming the row in a preview even when it could not be read. */
  name: string;
  kind: string;
  item: ItemFields | null;
  /** Column → message, for the columns this row got wrong (`_row` for the row as a whole). */
  errors: Record<string, string>;
}

export interface CsvRead {
  rows: CsvItemRow[];
  /** Problems with the file as a whole: unreadable CSV, header mistakes, too many rows. */
  fileErrors: { line: number; message: string }[];
}

type Column = { kind: "base"; name: BaseColumn } | { kind: "price"; header: string; inches: number };

function readHeader(cells: string[]): { columns: Column[]; errors: string[] } {
  const errors: string[] = [];
  const columns: Column[] = [];
  if (cells.length === 1 && (cells[0] ?? "").includes(";")) {
    return { columns, errors: ["Values are separated by semicolons; save the file as comma-separated CSV."] };
  }
  for (const raw of cells) {
    const cell = raw.trim();
    const base = cell.toLowerCase().replace(/[\s_-]+/g, "_") as BaseColumn;
    const price = PRICE_COLUMN.exec(cell);
    if (BASE_COLUMNS.includes(base)) {
      if (columns.some((c) => c.kind === "base" && c.name === base)) errors.push(`Column ${base} appears twice.`);
      columns.push({ kind: "base", name: base });
    } else if (price) {
      let inches = NaN;
      try {
        inches = parseLength(price[1]!);
      } catch {}
      if (!(inches >= 12 && inches <= 12 * 100)) errors.push(`Column "${cell}": write the stock length in feet, like price 8'.`);
      else if (columns.some((c) => c.kind === "price" && sameLength(c.inches, inches))) errors.push(`Two columns price the ${stockLengthText(inches)} length.`);
      columns.push({ kind: "price", header: cell, inches });
    } else {
      errors.push(`Unknown column "${cell}". Columns are ${BASE_COLUMNS.join(", ")} and one "price <length>" per stock length.`);
    }
  }
  const missing = BASE_COLUMNS.filter((b) => !columns.some((c) => c.kind === "base" && c.name === b));
  if (missing.length > 0) errors.push(`Missing column${missing.length === 1 ? "" : "s"}: ${missing.join(", ")}.`);
  if (!columns.some((c) => c.kind === "price")) errors.push(`No price columns: add one per stock length, headed like price 8'.`);
  return { columns, errors };
}

const FIELD_COLUMN: Record<string, BaseColumn> = { faceWidth: "face_width", supplierCode: "supplier_code", name: "name", kind: "kind", thickness: "thickness", species: "species" };

function readRow(line: number, cells: string[], columns: Column[]): CsvItemRow {
  const at = (name: BaseColumn) => unguard((cells[columns.findIndex((c) => c.kind === "base" && c.name === name)] ?? "").trim());
  const row: CsvItemRow = { line, name: at("name"), kind: at("kind"), item: null, errors: {} };
  const extra = cells.slice(columns.length);
  if (cells.length < columns.length || extra.some((c) => c.trim() !== "")) {
    row.errors._row = `This row has ${cells.length} values; the header has ${columns.length} columns. Check for an unquoted comma.`;
    return row;
  }
  const priced = columns.flatMap((c, i) => (c.kind === "price" && (cells[i] ?? "").trim() !== "" ? [{ header: c.header, inches: c.inches, price: cells[i]!.trim() }] : []));
  const parsed = priceBookItemCreateSchema.safeParse({
    name: row.name,
    kind: readKind(row.kind) ?? row.kind,
    faceWidth: at("face_width"),
    thickness: at("thickness"),
    species: at("species"),
    supplierCode: at("supplier_code"),
    stock: priced.map((p) => ({ length: p.inches, price: p.price })),
  });
  if (parsed.success) {
    row.item = { ...parsed.data, species: parsed.data.species ?? null, supplierCode: parsed.data.supplierCode ?? null };
    return row;
  }
  for (const issue of parsed.error.issues) {
    const [field, index] = issue.path;
    const column = field === "stock" ? (typeof index === "number" ? (priced[index]?.header ?? "stock") : "stock") : (FIELD_COLUMN[String(field)] ?? "_row");
    const message = field === "stock" && index === undefined ? "Give a price in at least one price column." : issue.message;
    row.errors[column] ??= message;
  }
  return row;
}

/** Reads an uploaded CSV into checked rows, each with its line number and its problems by column. */
export function readItemsCsv(text: string): CsvRead {
  const parsed = parseCsv(text);
  if (!parsed.ok) return { rows: [], fileErrors: [{ line: parsed.line, message: parsed.message }] };
  const records = parsed.records.filter((r) => r.fields.some((f) => f.trim() !== ""));
  const [head, ...body] = records;
  if (!head) return { rows: [], fileErrors: [{ line: 1, message: "The file is empty: the first row names the columns." }] };
  const { columns, errors } = readHeader(head.fields);
  if (errors.length > 0) return { rows: [], fileErrors: errors.map((message) => ({ line: head.line, message })) };
  if (body.length === 0) return { rows: [], fileErrors: [{ line: head.line, message: "The file has no items below the header row." }] };
  if (body.length > MAX_IMPORT_ROWS) {
    return { rows: [], fileErrors: [{ line: body[MAX_IMPORT_ROWS]!.line, message: `At most ${MAX_IMPORT_ROWS} items can be imported at once.` }] };
  }
  return { rows: body.map((r) => readRow(r.line, r.fields, columns)), fileErrors: [] };
}

/** "Alder Bend Millwork — 2027" on 5 Jan 2027 → alder-bend-millwork-2027-items-2027-01-05.csv (ASCII, for the header). */
export function csvFileName(bookName: string, on: Date): string {
  const slug = bookName
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60)
    .replace(/-+$/, "");
  return `${slug || "price-book"}-items-${on.toISOString().slice(0, 10)}.csv`;
}
