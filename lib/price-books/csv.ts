import { formatLengthExact, parseLength } from "@/takeoff";
import { priceBookItemCreateSchema } from "@/lib/validators/price-books";
import { writeCsv } from "@/lib/csv/write";
import { parseCsv } from "./csv-grammar";
import { hasReplacementCharacter, SAVE_AS_UTF8 } from "./csv-encoding";
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
  /** What the import did to a value that is not an error, e.g. rounded a metric size to the 1/16. */
  notes: string[];
}

export interface CsvRead {
  rows: CsvItemRow[];
  /** Problems with the file as a whole: unreadable CSV, header mistakes, too many rows. */
  fileErrors: { line: number; message: string }[];
  /** What the import did with the file as a whole: tabs read as separators, metric columns rounded. */
  fileNotes: { line: number; message: string }[];
}

const METRIC = /\d\s*(?:mm|cm|m)\s*$/i;

/**
 * A metric size or stock length, read to the nearest 1/16 in (half up, as formatLength rounds): trim
 * is bought and cut in sixteenths, and 64 mm kept as 2.5196850393700787" would print as such on every
 * screen. Returns null for anything not written in millimetres, centimetres or metres.
 */
function metricToSixteenth(cell: string): { inches: number; note: (label: string) => string } | null {
  if (!METRIC.test(cell)) return null;
  let exact: number;
  try {
    exact = parseLength(cell);
  } catch {
    return null;
  }
  const inches = Math.round(exact * 16) / 16;
  return { inches, note: (label) => `${label} ${cell.trim()} read as ${formatLengthExact(inches)} (rounded to the nearest 1/16").` };
}

type Column = { kind: "base"; name: BaseColumn } | { kind: "price"; header: string; inches: number };

function readHeader(cells: string[]): { columns: Column[]; errors: string[]; notes: string[] } {
  const errors: string[] = [];
  const notes: string[] = [];
  const columns: Column[] = [];
  if (cells.length === 1 && (cells[0] ?? "").includes(";")) {
    return { columns, errors: ["Values are separated by semicolons; save the file as comma-separated CSV."], notes };
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
      const metric = metricToSixteenth(price[1]!);
      if (metric) {
        inches = metric.inches;
        notes.push(metric.note(`Column "${cell}":`));
      } else {
        try {
          inches = parseLength(price[1]!);
        } catch {
          // Not a length: `inches` stays NaN and the check below names the column.
        }
      }
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
  return { columns, errors, notes };
}

const FIELD_COLUMN: Record<string, BaseColumn> = { faceWidth: "face_width", supplierCode: "supplier_code", name: "name", kind: "kind", thickness: "thickness", species: "species" };

function readRow(line: number, cells: string[], columns: Column[]): CsvItemRow {
  const at = (name: BaseColumn) => unguard((cells[columns.findIndex((c) => c.kind === "base" && c.name === name)] ?? "").trim());
  const row: CsvItemRow = { line, name: at("name"), kind: at("kind"), item: null, errors: {}, notes: [] };
  const size = (column: "face_width" | "thickness", label: string) => {
    const metric = metricToSixteenth(at(column));
    if (!metric) return at(column);
    row.notes.push(metric.note(label));
    return metric.inches;
  };
  const extra = cells.slice(columns.length);
  if (cells.length < columns.length || extra.some((c) => c.trim() !== "")) {
    row.errors._row = `This row has ${cells.length} values; the header has ${columns.length} columns. Check for an unquoted comma.`;
    return row;
  }
  const priced = columns.flatMap((c, i) => (c.kind === "price" && (cells[i] ?? "").trim() !== "" ? [{ header: c.header, inches: c.inches, price: cells[i]!.trim() }] : []));
  const parsed = priceBookItemCreateSchema.safeParse({
    name: row.name,
    kind: readKind(row.kind) ?? row.kind,
    faceWidth: size("face_width", "Face width"),
    thickness: size("thickness", "Thickness"),
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

/** A header with tabs and no commas is tab-separated text (what spreadsheets save as "Text" or "TSV"). */
function delimiterOf(text: string): "," | "\t" {
  const header = text.split(/\r\n|\r|\n/, 1)[0] ?? "";
  return header.includes("\t") && !header.includes(",") ? "\t" : ",";
}

/** Reads an uploaded CSV (or tab-separated text) into checked rows, each with its line number and its problems by column. */
export function readItemsCsv(text: string): CsvRead {
  const fail = (line: number, message: string): CsvRead => ({ rows: [], fileErrors: [{ line, message }], fileNotes: [] });
  if (hasReplacementCharacter(text)) {
    const line = text.slice(0, text.indexOf("\uFFFD")).split(/\r\n|\r|\n/).length;
    return fail(line, `Some letters could not be read (shown as �): the file was saved in another encoding. ${SAVE_AS_UTF8}`);
  }
  const delimiter = delimiterOf(text);
  const parsed = parseCsv(text, delimiter);
  if (!parsed.ok) return fail(parsed.line, parsed.message);
  const records = parsed.records.filter((r) => r.fields.some((f) => f.trim() !== ""));
  const [head, ...body] = records;
  if (!head) return fail(1, "The file is empty: the first row names the columns.");
  const { columns, errors, notes } = readHeader(head.fields);
  if (errors.length > 0) return { rows: [], fileErrors: errors.map((message) => ({ line: head.line, message })), fileNotes: [] };
  if (body.length === 0) return fail(head.line, "The file has no items below the header row.");
  if (body.length > MAX_IMPORT_ROWS) return fail(body[MAX_IMPORT_ROWS]!.line, `At most ${MAX_IMPORT_ROWS} items can be imported at once.`);
  const fileNotes = [
    ...(delimiter === "\t" ? [{ line: head.line, message: "Values are separated by tabs; read as tab-separated." }] : []),
    ...notes.map((message) => ({ line: head.line, message })),
  ];
  return { rows: body.map((r) => readRow(r.line, r.fields, columns)), fileErrors: [], fileNotes };
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
