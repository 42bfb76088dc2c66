import { and, eq } from "drizzle-orm";
import { db, type Tx } from "../client";
import { projects } from "../schema";
import { notFound } from "@/lib/errors"; // transitional: goes with assertProject

export interface ProjectScope {
  orgId: string;
  projectId: string;
}

/** Whether the project belongs to the organisation; the use case turns `false` into a 404. */
export async function projectExists({ orgId, projectId }: ProjectScope, tx: Tx = db): Promise<boolean> {
  const [row] = await tx
    .select({ id: projects.id })
    .from(projects)
    .where(and(eq(projects.orgId, orgId), eq(projects.id, projectId)))
    .limit(1);
  return row !== undefined;
}

/** @deprecated Transitional while queries move to lib/server: use requireProject there. */
export async function assertProject(s: ProjectScope, tx: Tx = db) {
  if (!(await projectExists(s, tx))) throw notFound("No such project.");
}
