import { and, desc, eq, isNull, sql } from "drizzle-orm";
import { db } from "../client";
import { projects } from "../schema";
import { notFound } from "@/lib/errors";
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
} as const;

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
  const [row] = await db
    .update(projects)
    .set({
      ...fields,
      ...(archived === undefined ? {} : { archivedAt: archived ? new Date() : null }),
      updatedAt: new Date(),
    })
    .where(and(eq(projects.orgId, orgId), eq(projects.id, projectId)))
    .returning(projectFields);
  if (!row) throw notFound("No such project.");
  return row;
}

export type ProjectView = Awaited<ReturnType<typeof getProject>>;
