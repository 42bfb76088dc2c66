import type { CsvRead } from "./csv";
import { itemDiff } from "./diff";
import { codeKey, findClash, nameKey } from "./identity";
import { KIND_LABELS } from "./kinds";
import type { FieldDiff, ItemFields, PriceBookItemView } from "./types";

export type ImportMode = "merge" | "replace";
export type ImportAction = "create" | "update" | "unchanged" | "error";

export interface ImportRowPlan {
  line: number;
  action: ImportAction;
  name: string;
  kind: string;
  /** The book's item this row updates (or leaves unchanged). */
  itemId: string | null;
  /** The item as the row describes it; null when the row could not be read. */
  item: ItemFields | null;
  diff: FieldDiff;
  errors: Record<string, string>;
  /** Values the import adjusted (a metric size rounded to the 1/16), shown beside the row. */
  notes: string[];
}

export interface ImportPlan {
  mode: ImportMode;
  ok: boolean;
  rows: ImportRowPlan[];
  /** Items the file does not mention: removed only when the whole list is replaced. */
  deletions: PriceBookItemView[];
  fileErrors: CsvRead["fileErrors"];
  fileNotes: CsvRead["fileNotes"];
  counts: Record<ImportAction | "delete", number>;
}

/**
 * What an import would do to a book, decided before anything is written. Rows are matched to items by
 * supplier code first and then, among the items no code claimed, by name and kind; a row that matches
 * nothing is a new item. Rows that contradict each other, or would leave two items the import could not
 * tell apart, are errors on the later row.
 */
export function planImport(current: readonly PriceBookItemView[], read: CsvRead, mode: ImportMode): ImportPlan {
  const rows: ImportRowPlan[] = read.rows.map((r) => ({
    line: r.line,
    action: "error",
    name: r.name,
    kind: r.kind,
    itemId: null,
    item: r.item,
    diff: {},
    errors: { ...r.errors },
    notes: r.notes,
  }));
  const readable = rows.filter((r) => r.item);
  const claimedBy = new Map<string, ImportRowPlan>();
  const claim = (row: ImportRowPlan, matches: PriceBookItemView[], how: string) => {
    const match = matches[0];
    const other = match && claimedBy.get(match.id);
    if (matches.length > 1) {
      row.errors._row = `${matches.length} items of this book have ${how}; remove the duplicate first.`;
    } else if (match && other) {
      row.errors._row = `Matches the same item as line ${other.line} ("${match.name}").`;
    } else if (match) {
      claimedBy.set(match.id, row);
      row.itemId = match.id;
    }
  };

  duplicatesWithin(readable);
  const clean = (row: ImportRowPlan) => Object.keys(row.errors).length === 0;
  for (const row of readable) {
    const code = codeKey(row.item!.supplierCode);
    if (code && clean(row)) claim(row, current.filter((i) => codeKey(i.supplierCode) === code), `supplier code ${row.item!.supplierCode}`);
  }
  for (const row of readable) {
    if (row.itemId || !clean(row)) continue;
    const key = nameKey(row.item!);
    const free = current.filter((i) => !claimedBy.has(i.id) && nameKey(i) === key);
    claim(row, free, `this name and kind`);
  }

  // After a merge the items the file leaves alone stay; a row must not collide with one of them.
  const kept = mode === "merge" ? current.filter((i) => !claimedBy.has(i.id)) : [];
  for (const row of readable) {
    if (!clean(row)) continue;
    const clash = findClash(kept, row.item!);
    if (clash) row.errors[clash.field === "supplierCode" ? "supplier_code" : "name"] = `${clash.message} Change one, or use "replace the whole list".`;
  }

  for (const row of rows) {
    if (!row.item || !clean(row)) {
      row.action = "error";
      row.itemId = null;
      continue;
    }
    const before = row.itemId ? current.find((i) => i.id === row.itemId)! : null;
    row.diff = itemDiff(before, row.item);
    row.action = !before ? "create" : Object.keys(row.diff).length === 0 ? "unchanged" : "update";
  }

  const deletions = mode === "replace" ? current.filter((i) => !claimedBy.has(i.id) || claimedBy.get(i.id)!.action === "error") : [];
  const counts = { create: 0, update: 0, unchanged: 0, error: 0, delete: deletions.length };
  for (const r of rows) counts[r.action]++;
  return { mode, ok: read.fileErrors.length === 0 && counts.error === 0, rows, deletions, fileErrors: read.fileErrors, fileNotes: read.fileNotes, counts };
}

/** Two rows of one file naming the same supplier code, or the same name and kind: the later one is wrong. */
function duplicatesWithin(rows: ImportRowPlan[]) {
  const codes = new Map<string, number>();
  const names = new Map<string, number>();
  for (const row of rows) {
    const code = codeKey(row.item!.supplierCode);
    const name = nameKey(row.item!);
    const codeLine = code ? codes.get(code) : undefined;
    const nameLine = names.get(name);
    if (codeLine) row.errors.supplier_code = `Supplier code ${row.item!.supplierCode} is also on line ${codeLine}.`;
    else if (nameLine) row.errors.name = `Line ${nameLine} has the same name and kind (${KIND_LABELS[row.item!.kind].toLowerCase()}).`;
    if (code && !codes.has(code)) codes.set(code, row.line);
    if (!names.has(name)) names.set(name, row.line);
  }
}
