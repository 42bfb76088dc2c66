import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { db } from "../client";
import { planSets, sheets, tags } from "../schema";
import { notFound } from "@/lib/errors";
import type { PlanSetView } from "@/lib/plans/api-types";
import { getCounts } from "./counts";
import { assertProject, type ProjectScope } from "./project-scope";
import { sheetsImpact } from "@/lib/plans/removal-impact";
import { requireConfirmed } from "./removal-impact";

const fields = {
  id: planSets.id,
  name: planSets.name,
  sizeBytes: planSets.sizeBytes,
  pageCount: planSets.pageCount,
  contentHash: planSets.contentHash,
  createdAt: planSets.createdAt,
} as const;

const scoped = (s: ProjectScope, id?: string) =>
  and(eq(planSets.orgId, s.orgId), eq(planSets.projectId, s.projectId), id ? eq(planSets.id, id) : undefined);

export async function listPlanSets(s: ProjectScope): Promise<PlanSetView[]> {
  await assertProject(s);
  const rows = await db.select(fields).from(planSets).where(scoped(s)).orderBy(asc(planSets.createdAt));
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}

/** The upload service's key for the file, only for a member of the owning organisation. */
export async function getPlanSetFile(s: ProjectScope, id: string) {
  const [row] = await db.select({ fileKey: planSets.fileKey, name: planSets.name }).from(planSets).where(scoped(s, id));
  if (!row) throw notFound("No such plan set.");
  return row;
}

export interface InspectedPage {
  pageNumber: number;
  width: number;
  height: number;
  rotation: number;
  userUnit: number;
  label: string | null;
}

/** The plan set and one sheet per page, in one transaction: a failure leaves neither. */
export async function createPlanSet(
  s: ProjectScope & { userId: string },
  file: { name: string; key: string; size: number; contentHash?: string },
  pages: InspectedPage[],
) {
  return db.transaction(async (tx) => {
    await assertProject(s, tx);
    const [set] = await tx
      .insert(planSets)
      .values({ orgId: s.orgId, projectId: s.projectId, name: file.name, fileKey: file.key, contentHash: file.contentHash ?? null, sizeBytes: file.size, pageCount: pages.length, uploadedBy: s.userId })
      .returning({ id: planSets.id });
    await tx.insert(sheets).values(
      pages.map((p) => ({
        orgId: s.orgId,
        projectId: s.projectId,
        planSetId: set!.id,
        pageNumber: p.pageNumber,
        label: p.label ?? `Page ${p.pageNumber}`,
        width: p.width,
        height: p.height,
        rotation: p.rotation,
        userUnit: p.userUnit,
      })),
    );
    return set!.id;
  });
}

/**
 * Removes the plan set, its sheets and their tags once the person confirmed how many tags go with it;
 * returns the file key so the caller can delete the bytes.
 */
export async function deletePlanSet(s: ProjectScope, id: string, confirmedTags?: number): Promise<string> {
  const [set] = await db.select({ name: planSets.name }).from(planSets).where(scoped(s, id));
  if (!set) throw notFound("No such plan set.");
  const ids = await db.select({ id: sheets.id }).from(sheets).where(and(eq(sheets.orgId, s.orgId), eq(sheets.planSetId, id)));
  const impact = sheetsImpact(await getCounts(s), new Set(ids.map((r) => r.id)));
  requireConfirmed(set.name, impact, confirmedTags);
  return db.transaction(async (tx) => {
    // Re-count inside the transaction with the set's sheets locked (a new tag's foreign key waits on
    // that lock), so a tag placed since the person was asked is never deleted unseen.
    const locked = await tx.select({ id: sheets.id }).from(sheets).where(and(eq(sheets.orgId, s.orgId), eq(sheets.planSetId, id))).for("update");
    const [now] = locked.length
      ? await tx.select({ n: sql<number>`count(*)::int` }).from(tags).where(and(eq(tags.orgId, s.orgId), inArray(tags.sheetId, locked.map((r) => r.id))))
      : [{ n: 0 }];
    if ((now?.n ?? 0) !== impact.tags) requireConfirmed(set.name, { ...impact, tags: now?.n ?? 0 }, confirmedTags);
    const rows = await tx.delete(planSets).where(scoped(s, id)).returning({ fileKey: planSets.fileKey });
    if (rows.length === 0) throw notFound("No such plan set.");
    return rows[0]!.fileKey;
  });
}
