import { and, desc, eq, isNull, sql } from "drizzle-orm";
import { db, type Tx } from "../client";
import { projects } from "../schema";
import { invalid, notFound } from "@/lib/errors";
import type { CreateProjectInput, UpdateProjectInput } from "@/lib/validators/project";

/** What the API and pages show of a project; the tenant id stays on the server. */
const projectFields = {
  id: projects.id,
  name: projects.name,
  generalContractor: projects.generalContractor,
  bidDue: projects.bidDue,
  status: projects.status,
  archivedAt: projects.archivedAt,
  createdAt: projects.createdAt,
  updatedAt: projects.updatedAt,
  /** The takeoff submitted as this project's bid, if any: what the status follows from. */
  // Written out: drizzle leaves a column of the only table unqualified, which inside the subquery would name t's own.
  submittedTakeoff: sql<{ id: string; name: string } | null>`(
    select json_build_object('id', t.id, 'name', t.name) from takeoffs t
    where t.project_id = projects.id and t.org_id = projects.org_id and t.status = 'submitted' limit 1)`,
} as const;

/** Holds the project row until the transaction ends, so status changes and submits take turns. */
export async function lockProject({ orgId, projectId }: { orgId: string; projectId: string }, tx: Tx) {
  const [row] = await tx
    .select({ id: projects.id })
    .from(projects)
    .where(and(eq(projects.orgId, orgId), eq(projects.id, projectId)))
    .for("update");
  if (!row) throw notFound("No such project.");
}

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

export async function listProjects({ orgId, includeArchived = false }: { orgId: string; includeArchived?: boolean }) {
  return db
    .select(projectFields)
    .from(projects)
    .where(and(eq(projects.orgId, orgId), includeArchived ? undefined : isNull(projects.archivedAt)))
    .orderBy(sql`${projects.bidDue} asc nulls last`, desc(projects.createdAt));
}

export async function getProject({ orgId, projectId }: { orgId: string; projectId: string }) {
  const [row] = await db
    .select(projectFields)
    .from(projects)
    .where(and(eq(projects.orgId, orgId), eq(projects.id, projectId)))
    .limit(1);
  if (!row) throw notFound("No such project.");
  return row;
}

export async function createProject({ orgId, userId, input }: { orgId: string; userId: string; input: CreateProjectInput }) {
  const [row] = await db
    .insert(projects)
    .values({
      orgId,
      createdBy: userId,
      name: input.name,
      generalContractor: input.generalContractor ?? null,
      bidDue: input.bidDue ?? null,
    })
    .returning(projectFields);
  return row!;
}

export async function updateProject({ orgId, projectId, input }: { orgId: string; projectId: string; input: UpdateProjectInput }) {
  const { archived, ...fields } = input;
  await db.transaction(async (tx) => {
    if (fields.status !== undefined) {
      await lockProject({ orgId, projectId }, tx);
      const [row] = await tx.select({ submitted: projectFields.submittedTakeoff }).from(projects).where(and(eq(projects.orgId, orgId), eq(projects.id, projectId)));
      const refusal = statusRefusal(fields.status, row?.submitted ?? null);
      if (refusal) throw invalid({ status: refusal }, "The status follows from the project's takeoffs.");
    }
    const rows = await tx
      .update(projects)
      .set({
        ...fields,
        ...(archived === undefined ? {} : { archivedAt: archived ? new Date() : null }),
        updatedAt: new Date(),
      })
      .where(and(eq(projects.orgId, orgId), eq(projects.id, projectId)))
      .returning({ id: projects.id });
    if (rows.length === 0) throw notFound("No such project.");
  });
  return getProject({ orgId, projectId });
}

export type ProjectView = Awaited<ReturnType<typeof getProject>>;
