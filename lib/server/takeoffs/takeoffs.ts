import type { ProjectScope } from "@/db/queries/project-scope";
import { findTakeoff, listTakeoffRows, type TakeoffView } from "@/db/queries/takeoffs";
import { orNotFound } from "@/lib/errors";
import { requireProject } from "@/lib/server/projects/require-project";

export type { TakeoffView };

export const MISSING_TAKEOFF = "No such takeoff.";

/** The project's takeoffs with the headline figures only, not the whole result. */
export async function listTakeoffs(s: ProjectScope) {
  await requireProject(s);
  const rows = await listTakeoffRows(s);
  return rows.map(({ prices, result, ...r }) => ({
    ...r,
    priceBookName: prices.priceBook.name,
    openingsTotal: result.openingsTotal,
    bidTotal: result.bid.total,
  }));
}

/** One saved takeoff; its org and project are in the query, so another tenant's id is simply not found. */
export async function getTakeoff(s: ProjectScope, id: string): Promise<TakeoffView> {
  return orNotFound(await findTakeoff(s, id), MISSING_TAKEOFF);
}
