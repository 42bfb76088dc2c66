import { and, asc, desc, eq, isNotNull } from "drizzle-orm";
import { db } from "../client";
import { priceBooks, takeoffs } from "../schema";
import type { ProjectScope } from "./project-scope";

/** The book this project's last takeoff used, else the organisation's first; null when it has none. */
export async function defaultPriceBookId(s: ProjectScope): Promise<string | null> {
  const [last] = await db
    .select({ id: takeoffs.priceBookId })
    .from(takeoffs)
    .innerJoin(priceBooks, eq(priceBooks.id, takeoffs.priceBookId))
    .where(and(eq(takeoffs.orgId, s.orgId), eq(takeoffs.projectId, s.projectId), isNotNull(takeoffs.priceBookId)))
    .orderBy(desc(takeoffs.createdAt))
    .limit(1);
  if (last?.id) return last.id;
  const [first] = await db.select({ id: priceBooks.id }).from(priceBooks).where(eq(priceBooks.orgId, s.orgId)).orderBy(asc(priceBooks.createdAt)).limit(1);
  return first?.id ?? null;
}
