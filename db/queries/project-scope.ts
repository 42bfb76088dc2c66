import { and, eq } from "drizzle-orm";
import { db, type Tx } from "../client";
import { projects } from "../schema";
import { notFound } from "@/lib/errors";

export interface ProjectScope {
  orgId: string;
  projectId: string;
}

/** Throws 404 unless the project belongs to the organisation; every plans query starts here or filters the same way. */
export async function assertProject({ orgId, projectId }: ProjectScope, tx: Tx = db) {
  const [row] = await tx
    .select({ id: projects.id })
    .from(projects)
    .where(and(eq(projects.orgId, orgId), eq(projects.id, projectId)))
    .limit(1);
  if (!row) throw notFound("No such project.");
}
