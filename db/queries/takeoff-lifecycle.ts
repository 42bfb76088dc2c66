import { and, eq, ne } from "drizzle-orm";
import { db, type Tx } from "../client";
import { projects, takeoffs } from "../schema";
import type { ProjectScope } from "./project-scope";

/** The partial unique index that lets a project have one submitted takeoff, whatever races the app loses. */
export const ONE_SUBMITTED_KEY = "takeoffs_one_submitted_per_project";

const scoped = (s: ProjectScope, id: string) =>
  and(eq(takeoffs.orgId, s.orgId), eq(takeoffs.projectId, s.projectId), eq(takeoffs.id, id));

/** Renames or re-notes a draft; false when it is not (any longer) a draft of this project. */
export async function updateDraftTakeoff(s: ProjectScope, id: string, values: { name?: string; note?: string | null }): Promise<boolean> {
  const rows = await db.update(takeoffs).set(values).where(and(scoped(s, id), eq(takeoffs.status, "draft"))).returning({ id: takeoffs.id });
  return rows.length > 0;
}

export async function deleteDraftTakeoff(s: ProjectScope, id: string): Promise<boolean> {
  const rows = await db.delete(takeoffs).where(and(scoped(s, id), eq(takeoffs.status, "draft"))).returning({ id: takeoffs.id });
  return rows.length > 0;
}

/** The name of the project's submitted takeoff other than `exceptId`, if there is one. */
export async function findSubmittedName(s: ProjectScope, exceptId: string | null, tx: Tx = db): Promise<string | null> {
  const [row] = await tx
    .select({ name: takeoffs.name })
    .from(takeoffs)
    .where(and(eq(takeoffs.orgId, s.orgId), eq(takeoffs.projectId, s.projectId), eq(takeoffs.status, "submitted"), exceptId ? ne(takeoffs.id, exceptId) : undefined))
    .limit(1);
  return row?.name ?? null;
}

export async function takeoffExists(s: ProjectScope, id: string, tx: Tx = db): Promise<boolean> {
  const [row] = await tx.select({ id: takeoffs.id }).from(takeoffs).where(scoped(s, id));
  return row !== undefined;
}

/** Marks a draft as submitted; false when it is not a draft of this project. */
export async function markSubmitted(s: ProjectScope, id: string, userId: string, tx: Tx): Promise<boolean> {
  const rows = await tx
    .update(takeoffs)
    .set({ status: "submitted", submittedAt: new Date(), submittedBy: userId })
    .where(and(scoped(s, id), eq(takeoffs.status, "draft")))
    .returning({ id: takeoffs.id });
  return rows.length > 0;
}

/** A draft project becomes "submitted"; one already won or lost keeps its status. */
export async function markProjectSubmitted(s: ProjectScope, tx: Tx) {
  await tx
    .update(projects)
    .set({ status: "submitted", updatedAt: new Date() })
    .where(and(eq(projects.orgId, s.orgId), eq(projects.id, s.projectId), eq(projects.status, "draft")));
}
