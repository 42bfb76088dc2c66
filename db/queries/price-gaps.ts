import { and, asc, desc, eq, isNotNull } from "drizzle-orm";
import { db } from "../client";
import { organisations, priceBooks, takeoffs } from "../schema";
import { DEFAULT_TAKEOFF_SETTINGS } from "@/lib/takeoffs/settings";
import { assessOpeningType } from "@/lib/takeoffs/price-gaps";
import { listOpeningTypes } from "./opening-types";
import { assertProject, type ProjectScope } from "./project-scope";
import { snapshotPrices } from "./takeoffs";

export interface PriceGapsView {
  /** The book checked: the one asked for, else the one this project's last takeoff used, else the organisation's first. */
  priceBook: { id: string; name: string } | null;
  /** Per opening type: what the book cannot supply (with the fix), or why the window cannot be cut at all. */
  gaps: { openingTypeId: string; mark: string; material: string; kind: "no-item" | "too-long" | "cannot-cut"; message: string; fix: string }[];
}

async function defaultBook(s: ProjectScope): Promise<string | null> {
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

/**
 * The window list against a price book, as the takeoff will see it — shown on the openings list so a
 * missing size is found while the list is being made, not after Run.
 */
export async function listPriceGaps(s: ProjectScope, priceBookId?: string): Promise<PriceGapsView> {
  await assertProject(s);
  const bookId = priceBookId ?? (await defaultBook(s));
  if (!bookId) return { priceBook: null, gaps: [] };
  const [prices, types, [org]] = await Promise.all([
    snapshotPrices(s.orgId, bookId),
    listOpeningTypes(s),
    db.select({ settings: organisations.takeoffSettings }).from(organisations).where(eq(organisations.id, s.orgId)),
  ]);
  const kerf = (org?.settings ?? DEFAULT_TAKEOFF_SETTINGS).kerf;
  const gaps: PriceGapsView["gaps"] = [];
  for (const ot of types) {
    const a = assessOpeningType(ot, prices, kerf, null);
    if (!a.ok) {
      gaps.push({ openingTypeId: ot.id, mark: ot.mark, material: "", kind: "cannot-cut", message: `${ot.mark}: ${a.problem.message}`, fix: `Change ${a.problem.field.replace(/^trimSpec\./, "")} on this line.` });
      continue;
    }
    for (const g of a.gaps) gaps.push({ openingTypeId: ot.id, mark: ot.mark, material: g.material, kind: g.kind, message: g.message, fix: g.fix });
  }
  return { priceBook: prices.priceBook, gaps };
}
