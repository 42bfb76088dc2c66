import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { db, type Tx } from "../client";
import { planSets, sheets, tags } from "../schema";
import type { ProjectScope } from "./project-scope";

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

export async function listPlanSets(s: ProjectScope) {
  return db.select(fields).from(planSets).where(scoped(s)).orderBy(asc(planSets.createdAt));
}

/** The upload service's key for the file and the set's name, or null. */
export async function findPlanSetFile(s: ProjectScope, id: string) {
  const [row] = await db.select({ fileKey: planSets.fileKey, name: planSets.name }).from(planSets).where(scoped(s, id));
  return row ?? null;
}

export interface InspectedPage {
  pageNumber: number;
  width: number;
  height: number;
  rotation: number;
  userUnit: number;
  label: string | null;
}

/** The plan set and one sheet per page, all or nothing (a savepoint when `tx` is a transaction); returns its id. */
export async function insertPlanSet(
  s: ProjectScope & { userId: string },
  file: { name: string; key: string; size: number; contentHash?: string },
  pages: InspectedPage[],
  tx: Tx = db,
): Promise<string> {
  return tx.transaction(async (t) => {
    const [set] = await t
      .insert(planSets)
      .values({ orgId: s.orgId, projectId: s.projectId, name: file.name, fileKey: file.key, contentHash: file.contentHash ?? null, sizeBytes: file.size, pageCount: pages.length, uploadedBy: s.userId })
      .returning({ id: planSets.id });
    await t.insert(sheets).values(
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

export async function listSheetIdsOfPlanSet(s: ProjectScope, id: string): Promise<string[]> {
  const rows = await db.select({ id: sheets.id }).from(sheets).where(and(eq(sheets.orgId, s.orgId), eq(sheets.planSetId, id)));
  return rows.map((r) => r.id);
}

/** Locks the set's sheet rows for the rest of the transaction (a new tag's foreign key waits on the lock). */
export async function lockSheetsOfPlanSet(tx: Tx, s: ProjectScope, id: string): Promise<string[]> {
  const rows = await tx.select({ id: sheets.id }).from(sheets).where(and(eq(sheets.orgId, s.orgId), eq(sheets.planSetId, id))).for("update");
  return rows.map((r) => r.id);
}

export async function countTagsOnSheets(tx: Tx, s: ProjectScope, sheetIds: string[]): Promise<number> {
  if (sheetIds.length === 0) return 0;
  const [now] = await tx.select({ n: sql<number>`count(*)::int` }).from(tags).where(and(eq(tags.orgId, s.orgId), inArray(tags.sheetId, sheetIds)));
  return now?.n ?? 0;
}

/** Deletes the set (its sheets and their tags cascade); returns its file key, or null when there was no such set. */
export async function deletePlanSetRow(tx: Tx, s: ProjectScope, id: string): Promise<string | null> {
  const rows = await tx.delete(planSets).where(scoped(s, id)).returning({ fileKey: planSets.fileKey });
  return rows[0]?.fileKey ?? null;
}
