import { db } from "@/db/client";
import { findProject, insertProject, listProjects as projectRows, lockProject, updateProjectRow, type ProjectView } from "@/db/queries/projects";
import type { ProjectScope } from "@/db/queries/project-scope";
import { invalid, notFound, orNotFound } from "@/lib/errors";
import type { CreateProjectInput, UpdateProjectInput } from "@/lib/validators/project";

export type { ProjectView };

const MISSING = "No such project.";

/**
 * The status follows from the takeoffs: "draft" until one is submitted, then "submitted" — which
 * the team may move on to "won" or "lost" (and back) once the award is known. A hand-set status
 * that contradicts the takeoffs is refused rather than stored.
 */
function statusRefusal(status: string, submitted: { name: string } | null): string | null {
  if (submitted && status === "draft") return `"${submitted.name}" is submitted as the bid, so the project is no longer a draft.`;
  if (!submitted && status !== "draft") return `Submit one of the project's takeoffs first: the status becomes "submitted" with it, and won or lost after that.`;
  return null;
}

export const listProjects = (args: { orgId: string; includeArchived?: boolean }) => projectRows(args);

export async function getProject(s: ProjectScope): Promise<ProjectView> {
  return orNotFound(await findProject(s), MISSING);
}

export async function createProject({ orgId, userId, input }: { orgId: string; userId: string; input: CreateProjectInput }) {
  return insertProject(orgId, userId, { name: input.name, generalContractor: input.generalContractor ?? null, bidDue: input.bidDue ?? null });
}

export async function updateProject({ orgId, projectId, input }: ProjectScope & { input: UpdateProjectInput }) {
  const s = { orgId, projectId };
  const { archived, ...fields } = input;
  await db.transaction(async (tx) => {
    if (fields.status !== undefined) {
      if (!(await lockProject(s, tx))) throw notFound(MISSING);
      const current = await findProject(s, tx);
      const refusal = statusRefusal(fields.status, current?.submittedTakeoff ?? null);
      if (refusal) throw invalid({ status: refusal }, "The status follows from the project's takeoffs.");
    }
    const values = { ...fields, ...(archived === undefined ? {} : { archivedAt: archived ? new Date() : null }) };
    if (!(await updateProjectRow(s, values, tx))) throw notFound(MISSING);
  });
  return getProject(s);
}
