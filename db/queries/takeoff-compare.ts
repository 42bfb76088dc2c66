import { and, desc, eq, inArray } from "drizzle-orm";
import { db } from "../client";
import { projects, takeoffs } from "../schema";
import { notFound } from "@/lib/errors";
import type { ComparedTakeoff } from "@/lib/takeoffs/compare";

/** Takeoffs of any of the organisation's projects, in the order asked; one that is not the org's is "not found". */
export async function getTakeoffsToCompare(orgId: string, ids: string[]): Promise<ComparedTakeoff[]> {
  const rows = await db
    .select({
      id: takeoffs.id,
      name: takeoffs.name,
      projectName: projects.name,
      status: takeoffs.status,
      createdAt: takeoffs.createdAt,
      inputs: takeoffs.inputs,
      prices: takeoffs.prices,
      result: takeoffs.result,
    })
    .from(takeoffs)
    .innerJoin(projects, eq(projects.id, takeoffs.projectId))
    .where(and(eq(takeoffs.orgId, orgId), inArray(takeoffs.id, ids)));
  const byId = new Map(rows.map((r) => [r.id, r]));
  return ids.map((id) => {
    const row = byId.get(id);
    if (!row) throw notFound("No such takeoff.");
    return row;
  });
}

/** Every takeoff of the organisation, newest first, for the picker. */
export async function listOrganisationTakeoffs(orgId: string) {
  return db
    .select({ id: takeoffs.id, name: takeoffs.name, status: takeoffs.status, createdAt: takeoffs.createdAt, projectId: projects.id, projectName: projects.name })
    .from(takeoffs)
    .innerJoin(projects, eq(projects.id, takeoffs.projectId))
    .where(eq(takeoffs.orgId, orgId))
    .orderBy(desc(takeoffs.createdAt));
}
