import { createHash } from "node:crypto";
import { db } from "@/db/client";
import { deleteItems, insertItems, updateItemAt } from "@/db/queries/price-books/items";
import { recordChanges, type ChangeEntry } from "@/db/queries/price-books/changes";
import type { PriceBookScope, PriceBookWriter } from "@/db/queries/price-books/scope";
import { AppError } from "@/lib/errors";
import { readItemsCsv } from "@/lib/price-books/csv";
import { itemSummary } from "@/lib/price-books/describe";
import { itemDiff } from "@/lib/price-books/diff";
import { planImport, type ImportMode, type ImportPlan } from "@/lib/price-books/import-plan";
import type { PriceBookItemView } from "@/lib/price-books/types";
import { itemsOf as listItems, requireBook, requireLockedBook } from "./book-scope";

export type ImportPreview = ImportPlan & { previewToken: string };
interface ImportRequest {
  csv: string;
  mode: ImportMode;
  previewToken?: string;
}

/** Names the book's items as they are now; any write changes it, so a preview can tell it went stale. */
const tokenOf = (items: readonly PriceBookItemView[]) =>
  createHash("sha256")
    .update(items.map((i) => `${i.id}:${i.version}`).sort().join(","))
    .digest("base64url");

/** 422 with one message per bad cell, keyed `line 4.kind` (`line 4` for the row or file as a whole). */
function refused(preview: ImportPreview): AppError {
  const fields: Record<string, string> = {};
  for (const e of preview.fileErrors) fields[`line ${e.line}`] ??= e.message;
  for (const row of preview.rows) {
    for (const [column, message] of Object.entries(row.errors)) fields[column === "_row" ? `line ${row.line}` : `line ${row.line}.${column}`] = message;
  }
  const bad = preview.counts.error;
  const message = preview.fileErrors.length > 0 ? "The file cannot be read; nothing was imported." : `${bad} row${bad === 1 ? "" : "s"} need${bad === 1 ? "s" : ""} attention; nothing was imported.`;
  return new AppError(422, message, fields, { preview }, "import_refused");
}

/** What importing this CSV would do; nothing is written. */
export async function previewPriceBookImport(s: PriceBookScope, input: ImportRequest): Promise<ImportPreview> {
  await requireBook(s);
  const items = await listItems(s);
  return { ...planImport(items, readItemsCsv(input.csv), input.mode), previewToken: tokenOf(items) };
}

/**
 * Applies an import all or nothing: the plan is made again under the book's lock, and any bad row
 * refuses the whole file before a single row is written. With the preview's token, a book changed
 * since the preview is refused too (409), so what is applied is what was shown.
 */
export async function applyPriceBookImport(w: PriceBookWriter, input: ImportRequest): Promise<ImportPreview> {
  return db.transaction(async (tx) => {
    await requireLockedBook(tx, w);
    const items = await listItems(w, tx);
    const preview = { ...planImport(items, readItemsCsv(input.csv), input.mode), previewToken: tokenOf(items) };
    if (!preview.ok) throw refused(preview);
    if (input.previewToken && input.previewToken !== preview.previewToken) {
      throw new AppError(409, "The price book changed since your preview. Check the new preview, then apply again.", undefined, { preview }, "preview_changed");
    }
    const byId = new Map(items.map((i) => [i.id, i]));
    const log: ChangeEntry[] = [];
    const via = `CSV import`;

    const creates = preview.rows.filter((r) => r.action === "create");
    const created = await insertItems(tx, w, creates.map((r) => r.item!));
    creates.forEach((r, i) => log.push({ action: "item.create", itemId: created[i]!.id, summary: itemSummary("create", null, r.item, r.diff, via), diff: r.diff }));
    for (const r of preview.rows.filter((x) => x.action === "update")) {
      await updateItemAt(tx, w, r.itemId!, r.item!);
      log.push({ action: "item.update", itemId: r.itemId, summary: itemSummary("update", byId.get(r.itemId!)!, r.item, r.diff, via), diff: r.diff });
    }
    await deleteItems(tx, w, preview.deletions.map((d) => d.id));
    for (const d of preview.deletions) {
      const diff = itemDiff(d, null);
      log.push({ action: "item.delete", itemId: d.id, summary: itemSummary("delete", d, null, diff, via), diff });
    }
    if (log.length === 0) return preview;
    const c = preview.counts;
    log.push({
      action: "import",
      summary: `CSV import (${input.mode === "replace" ? "replaced the whole list" : "merged"}): ${c.create} added, ${c.update} changed, ${c.delete} removed, ${c.unchanged} unchanged`,
    });
    await recordChanges(tx, w, log);
    return { ...preview, previewToken: tokenOf(await listItems(w, tx)) };
  });
}
