import { and, eq } from "drizzle-orm";
import { db, type Tx } from "../client";
import { projects } from "../schema";

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

