import type { Tx } from "@/db/client";
import { projectExists, type ProjectScope } from "@/db/queries/project-scope";
import { notFound } from "@/lib/errors";

/**
 * 404 unless the project belongs to the organisation. A use case calls it once, first; the queries after
 * it still carry the organisation in every WHERE, so a skipped check can leak nothing.
 */
export async function requireProject(s: ProjectScope, tx?: Tx): Promise<void> {
  if (!(await projectExists(s, tx))) throw notFound("No such project.");
}
