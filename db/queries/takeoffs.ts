import { and, asc, desc, eq } from "drizzle-orm";
import { db } from "../client";
import { priceBookItems, priceBooks, takeoffs, users } from "../schema";
import type { ProjectScope } from "./project-scope";

type NewTakeoff = typeof takeoffs.$inferInsert;

export async function findPriceBookRow(orgId: string, priceBookId: string) {
  const [book] = await db.select().from(priceBooks).where(and(eq(priceBooks.orgId, orgId), eq(priceBooks.id, priceBookId)));
  return book ?? null;
}

export async function listPriceBookItemRows(orgId: string, priceBookId: string) {
  // In the order they were added (ties in the item choice keep going to the earlier one), and always the same order, so the same book hashes the same.
  return db
    .select()
    .from(priceBookItems)
    .where(and(eq(priceBookItems.orgId, orgId), eq(priceBookItems.priceBookId, priceBookId)))
    .orderBy(asc(priceBookItems.createdAt), asc(priceBookItems.id));
}

export async function insertTakeoff(values: NewTakeoff): Promise<string> {
  const [row] = await db.insert(takeoffs).values(values).returning({ id: takeoffs.id });
  return row!.id;
}

/**
 * The result of the newest takeoff of this organisation computed from exactly these inputs (by their
 * hash), to reuse instead of solving again; null when there is none.
 */
export async function findResultByInputHash(orgId: string, inputHash: string) {
  const [row] = await db
    .select({ result: takeoffs.result })
    .from(takeoffs)
    .where(and(eq(takeoffs.orgId, orgId), eq(takeoffs.inputHash, inputHash)))
    .orderBy(desc(takeoffs.createdAt))
    .limit(1);
  return row?.result ?? null;
}

const listFields = {
  id: takeoffs.id,
  name: takeoffs.name,
  note: takeoffs.note,
  status: takeoffs.status,
  createdAt: takeoffs.createdAt,
  createdByName: users.name,
  submittedAt: takeoffs.submittedAt,
} as const;

export async function listTakeoffRows(s: ProjectScope) {
  return db
    .select({ ...listFields, prices: takeoffs.prices, result: takeoffs.result })
    .from(takeoffs)
    .leftJoin(users, eq(users.id, takeoffs.createdBy))
    .where(and(eq(takeoffs.orgId, s.orgId), eq(takeoffs.projectId, s.projectId)))
    .orderBy(desc(takeoffs.createdAt));
}

/** The takeoff's own fields without its snapshots: what can change after it ran (name, note, status). */
export async function findTakeoffHeader(s: ProjectScope, id: string) {
  const [row] = await db
    .select(listFields)
    .from(takeoffs)
    .leftJoin(users, eq(users.id, takeoffs.createdBy))
    .where(and(eq(takeoffs.orgId, s.orgId), eq(takeoffs.projectId, s.projectId), eq(takeoffs.id, id)));
  return row ?? null;
}

export async function findTakeoff(s: ProjectScope, id: string) {
  const [row] = await db
    .select({ ...listFields, inputs: takeoffs.inputs, prices: takeoffs.prices, result: takeoffs.result })
    .from(takeoffs)
    .leftJoin(users, eq(users.id, takeoffs.createdBy))
    .where(and(eq(takeoffs.orgId, s.orgId), eq(takeoffs.projectId, s.projectId), eq(takeoffs.id, id)));
  return row ?? null;
}

export type TakeoffView = NonNullable<Awaited<ReturnType<typeof findTakeoff>>>;
