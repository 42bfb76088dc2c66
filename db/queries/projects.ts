import { and, desc, eq, isNull, sql } from "drizzle-orm";
import { db, type Tx } from "../client";
import { projects } from "../schema";
import type { ProjectScope } from "./project-scope";

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

const scoped = ({ orgId, projectId }: ProjectScope) => and(eq(projects.orgId, orgId), eq(projects.id, projectId));

export type ProjectStatus = (typeof projects.status.enumValues)[number];

export interface ProjectValues {
  name?: string;
  generalContractor?: string | null;
  bidDue?: string | null;
  status?: ProjectStatus;
  archivedAt?: Date | null;
}

/** Holds the project row until the transaction ends, so status changes and submits take turns; false if there is none. */
export async function lockProject(s: ProjectScope, tx: Tx): Promise<boolean> {
  const [row] = await tx.select({ id: projects.id }).from(projects).where(scoped(s)).for("update");
  return row !== undefined;
}

export async function listProjects({ orgId, includeArchived = false }: { orgId: string; includeArchived?: boolean }) {
  return db
    .select(projectFields)
    .from(projects)
    .where(and(eq(projects.orgId, orgId), includeArchived ? undefined : isNull(projects.archivedAt)))
    .orderBy(sql`${projects.bidDue} asc nulls last`, desc(projects.createdAt));
}

export async function findProject(s: ProjectScope, tx: Tx = db) {
  const [row] = await tx.select(projectFields).from(projects).where(scoped(s)).limit(1);
  return row ?? null;
}

export async function insertProject(orgId: string, createdBy: string, values: { name: string; generalContractor: string | null; bidDue: string | null }) {
  const [row] = await db.insert(projects).values({ orgId, createdBy, ...values }).returning(projectFields);
  return row!;
}

/** Writes the given columns (and updatedAt); false when the project is not there. */
export async function updateProjectRow(s: ProjectScope, values: ProjectValues, tx: Tx = db): Promise<boolean> {
  const rows = await tx.update(projects).set({ ...values, updatedAt: new Date() }).where(scoped(s)).returning({ id: projects.id });
  return rows.length > 0;
}

export type ProjectView = NonNullable<Awaited<ReturnType<typeof findProject>>>;
