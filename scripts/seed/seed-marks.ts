import { eq } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { seedMarks } from "@/db/schema";

/** The row seeded under `key`, or null when the demo has not seeded it yet. */
export async function seededRow(key: string, tx: Tx = db): Promise<string | null> {
  const [row] = await tx.select({ id: seedMarks.rowId }).from(seedMarks).where(eq(seedMarks.key, key));
  return row?.id ?? null;
}

export async function markSeeded(key: string, rowId: string, tx: Tx = db) {
  await tx.insert(seedMarks).values({ key, rowId }).onConflictDoNothing();
}

/**
 * Seeds once per key: the marked row if there is one; else `adopt` (a row seeded before marks existed, found
 * the old way) or `create`, and marks it. A row people deleted stays deleted.
 */
export async function seedOnce(key: string, adopt: () => Promise<string | null>, create: () => Promise<string>) {
  const marked = await seededRow(key);
  if (marked) return { id: marked, created: false };
  const adopted = await adopt();
  const id = adopted ?? (await create());
  await markSeeded(key, id);
  return { id, created: adopted === null };
}
