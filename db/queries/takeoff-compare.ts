import { and, desc, eq, inArray } from "drizzle-orm";
import { db } from "../client";
import { projects, takeoffs } from "../schema";

/** Takeoffs of any of the organisation's projects with these ids (in no particular order). */
export async function findTakeoffsByIds(orgId: string, ids: string[]) {
  return db
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
