import { and, desc, eq, sql } from "drizzle-orm";
import { db, type Tx } from "../../client";
import { priceBookChanges, users } from "../../schema";
import type { PriceBookScope, PriceBookWriter } from "./scope";

export type ChangeAction = "book.create" | "book.update" | "book.delete" | "item.create" | "item.update" | "item.delete" | "import";

/** Field → before and after, as the log stores it. */
export type FieldDiff = Record<string, { before: unknown; after: unknown }>;

export interface ChangeEntry {
  action: ChangeAction;
  itemId?: string | null;
  summary: string;
  diff?: FieldDiff | null;
}

/** Writes log rows inside the caller's transaction, so a change and its record stand or fall together. */
export async function recordChanges(tx: Tx, w: PriceBookWriter, entries: ChangeEntry[]) {
  if (entries.length === 0) return;
  await tx.insert(priceBookChanges).values(
    entries.map((e) => ({
      orgId: w.orgId,
      priceBookId: w.priceBookId,
      userId: w.userId,
      action: e.action,
      itemId: e.itemId ?? null,
      summary: e.summary,
      diff: e.diff && Object.keys(e.diff).length > 0 ? e.diff : null,
      // now() is the transaction's start for every row; the wall clock keeps an import's rows in order.
      at: sql`clock_timestamp()`,
    })),
  );
}

export const MAX_CHANGES = 500;

/** The book's log, newest first. */
export async function listChangeRows(s: PriceBookScope & { limit?: number }) {
  return db
    .select({
      id: priceBookChanges.id,
      action: priceBookChanges.action,
      itemId: priceBookChanges.itemId,
      summary: priceBookChanges.summary,
      diff: priceBookChanges.diff,
      at: priceBookChanges.at,
      userId: priceBookChanges.userId,
      userName: users.name,
    })
    .from(priceBookChanges)
    .leftJoin(users, eq(users.id, priceBookChanges.userId))
    .where(and(eq(priceBookChanges.orgId, s.orgId), eq(priceBookChanges.priceBookId, s.priceBookId)))
    .orderBy(desc(priceBookChanges.at), desc(priceBookChanges.id))
    .limit(Math.min(s.limit ?? 200, MAX_CHANGES));
}
