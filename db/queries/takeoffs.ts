import { and, desc, eq } from "drizzle-orm";
import { db } from "../client";
import { organisations, priceBookItems, priceBooks, takeoffs, users } from "../schema";
import { AppError, invalid, notFound } from "@/lib/errors";
import { computeTakeoff, MissingItem, OpeningTypeProblem, PriceGaps } from "@/lib/takeoffs/compute";
import { DEFAULT_TAKEOFF_SETTINGS } from "@/lib/takeoffs/settings";
import type { TakeoffInputs, TakeoffPrices } from "@/lib/takeoffs/types";
import type { RunTakeoffInput } from "@/lib/validators/takeoff";
import { tallyCounts as getCounts } from "@/lib/server/plans/counts";
import { listOpeningTypes } from "./opening-types";
import { assertProject, type ProjectScope } from "./project-scope";
import { listUnitTypes } from "./unit-types";

/** The window list, unit types and counts as they are now, with the company's kerf and waste. */
async function snapshotInputs(s: ProjectScope, casingItemId: string | null, allowPlaceholders: boolean): Promise<TakeoffInputs> {
  const [[org], openingTypes, unitTypes, counts] = await Promise.all([
    db.select({ settings: organisations.takeoffSettings }).from(organisations).where(eq(organisations.id, s.orgId)),
    listOpeningTypes(s),
    listUnitTypes(s),
    getCounts(s),
  ]);
  return {
    settings: org?.settings ?? DEFAULT_TAKEOFF_SETTINGS,
    casingItemId,
    ...(allowPlaceholders ? { allowPlaceholders: true } : {}),
    unitTypes: unitTypes.map((u) => ({ id: u.id, name: u.name, count: u.count })),
    openingTypes: openingTypes.map((o) => ({ id: o.id, mark: o.mark, width: o.width, height: o.height, setback: o.setback, trimSpec: o.trimSpec })),
    counts: {
      perUnit: Object.fromEntries(counts.unitTypes.map((u) => [u.unitTypeId, u.perUnit])),
      commonAreas: counts.commonAreas,
      job: counts.job,
    },
  };
}

/** The price book's prices now: saved with the takeoff so a later price change never rewrites it. */
export async function snapshotPrices(orgId: string, priceBookId: string): Promise<TakeoffPrices> {
  const [book] = await db.select().from(priceBooks).where(and(eq(priceBooks.orgId, orgId), eq(priceBooks.id, priceBookId)));
  if (!book) throw invalid({ priceBookId: "No such price book." });
  const items = await db.select().from(priceBookItems).where(and(eq(priceBookItems.orgId, orgId), eq(priceBookItems.priceBookId, priceBookId)));
  return {
    priceBook: { id: book.id, name: book.name },
    items: items.map((i) => ({
      id: i.id,
      name: i.name,
      kind: i.kind,
      faceWidth: i.faceWidth,
      thickness: i.thickness,
      species: i.species,
      supplierCode: i.supplierCode,
      stock: i.stock,
    })),
    labour: book.labour,
    markup: book.markup,
    taxRate: book.taxRate,
    taxLabour: book.taxLabour,
  };
}

export async function runTakeoff(s: ProjectScope & { userId: string }, input: RunTakeoffInput) {
  await assertProject(s);
  const prices = await snapshotPrices(s.orgId, input.priceBookId);
  const inputs = await snapshotInputs(s, input.casingItemId ?? null, input.allowPlaceholders ?? false);
  if (inputs.openingTypes.length === 0) throw invalid({ _: "The window list is empty: add opening types and tag them first." });
  let result;
  try {
    result = await computeTakeoff(inputs, prices);
  } catch (error) {
    // A window that cannot be cut, or a size the price book does not carry, is the estimator's to fix, not a server fault.
    if (error instanceof OpeningTypeProblem) throw invalid({ [`openingTypes.${error.mark}.${error.field}`]: error.message }, error.message);
    if (error instanceof PriceGaps) {
      throw new AppError(422, error.message, { priceBookId: error.message }, { gaps: error.gaps.map(({ mark, material, kind, message, fix }) => ({ mark, material, kind, message, fix })) }, "price_gaps");
    }
    if (error instanceof MissingItem) throw invalid({ priceBookId: error.message }, error.message);
    throw error;
  }
  const [row] = await db
    .insert(takeoffs)
    .values({ orgId: s.orgId, projectId: s.projectId, name: input.name, note: input.note ?? null, priceBookId: input.priceBookId, inputs, prices, result, createdBy: s.userId })
    .returning({ id: takeoffs.id });
  return getTakeoff(s, row!.id);
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

export async function listTakeoffs(s: ProjectScope) {
  await assertProject(s);
  const rows = await db
    .select({ ...listFields, prices: takeoffs.prices, result: takeoffs.result })
    .from(takeoffs)
    .leftJoin(users, eq(users.id, takeoffs.createdBy))
    .where(and(eq(takeoffs.orgId, s.orgId), eq(takeoffs.projectId, s.projectId)))
    .orderBy(desc(takeoffs.createdAt));
  // The list needs the headline figures only, not the whole result.
  return rows.map(({ prices, result, ...r }) => ({
    ...r,
    priceBookName: prices.priceBook.name,
    openingsTotal: result.openingsTotal,
    bidTotal: result.bid.total,
  }));
}

export async function getTakeoff(s: ProjectScope, id: string) {
  const [row] = await db
    .select({ ...listFields, inputs: takeoffs.inputs, prices: takeoffs.prices, result: takeoffs.result })
    .from(takeoffs)
    .leftJoin(users, eq(users.id, takeoffs.createdBy))
    .where(and(eq(takeoffs.orgId, s.orgId), eq(takeoffs.projectId, s.projectId), eq(takeoffs.id, id)));
  if (!row) throw notFound("No such takeoff.");
  return row;
}

export type TakeoffView = Awaited<ReturnType<typeof getTakeoff>>;
