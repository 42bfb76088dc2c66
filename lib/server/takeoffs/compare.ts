import { findTakeoffsByIds, listOrganisationTakeoffs as organisationTakeoffs } from "@/db/queries/takeoff-compare";
import { orNotFound } from "@/lib/errors";
import type { ComparedTakeoff } from "@/lib/takeoffs/compare";
import { MISSING_TAKEOFF } from "./takeoffs";

/** Takeoffs of any of the organisation's projects, in the order asked; one that is not the org's is "not found". */
export async function getTakeoffsToCompare(orgId: string, ids: string[]): Promise<ComparedTakeoff[]> {
  const byId = new Map((await findTakeoffsByIds(orgId, ids)).map((r) => [r.id, r]));
  return ids.map((id) => orNotFound(byId.get(id), MISSING_TAKEOFF));
}

export const listOrganisationTakeoffs = (orgId: string) => organisationTakeoffs(orgId);
