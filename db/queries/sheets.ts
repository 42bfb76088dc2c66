import { and, asc, eq, sql } from "drizzle-orm";
import { db, type Tx } from "../client";
import { planSets, sheets, tags, type CalibrationPoints, type SheetCountRole } from "../schema";
import type { ProjectScope } from "./project-scope";

const tagCount = sql<number>`(select count(*)::int from ${tags} where ${tags.sheetId} = ${sheets.id})`;

const fields = {
  id: sheets.id,
  planSetId: sheets.planSetId,
  planSetName: planSets.name,
  pageNumber: sheets.pageNumber,
  label: sheets.label,
  unitTypeId: sheets.unitTypeId,
  countRole: sheets.countRole,
  width: sheets.width,
  height: sheets.height,
  rotation: sheets.rotation,
  userUnit: sheets.userUnit,
  scaleRatio: sheets.scaleRatio,
  scaleLabel: sheets.scaleLabel,
  calibrationPoints: sheets.calibrationPoints,
  inchesPerUnit: sheets.inchesPerUnit,
  tagCount,
  version: sheets.version,
} as const;

const scoped = (s: ProjectScope, id?: string) =>
  and(eq(sheets.orgId, s.orgId), eq(sheets.projectId, s.projectId), id ? eq(sheets.id, id) : undefined);

/** What an edit may set on a sheet; `inchesPerUnit` is whatever calibration is in effect. */
export interface SheetValues {
  label?: string;
  unitTypeId?: string | null;
  countRole?: SheetCountRole;
  scaleRatio?: number | null;
  scaleLabel?: string | null;
  calibrationPoints?: CalibrationPoints | null;
  inchesPerUnit?: number | null;
}

/** Every sheet of the project, plan sets in upload order and pages in order. */
export async function listSheets(s: ProjectScope) {
  return db
    .select(fields)
    .from(sheets)
    .innerJoin(planSets, eq(planSets.id, sheets.planSetId))
    .where(scoped(s))
    .orderBy(asc(planSets.createdAt), asc(sheets.pageNumber));
}

export async function findSheet(s: ProjectScope, id: string) {
  const [row] = await db.select(fields).from(sheets).innerJoin(planSets, eq(planSets.id, sheets.planSetId)).where(scoped(s, id));
  return row ?? null;
}

/** Whether a sheet other than `exceptId` already counts for this unit type. */
export async function hasOtherCountedSheet(s: ProjectScope, unitTypeId: string, exceptId: string): Promise<boolean> {
  const [other] = await db
    .select({ id: sheets.id })
    .from(sheets)
    .where(and(scoped(s), eq(sheets.unitTypeId, unitTypeId), eq(sheets.countRole, "counted"), sql`${sheets.id} <> ${exceptId}`))
    .limit(1);
  return other !== undefined;
}

/** False when no row had this id and version. */
export async function updateSheetAt(s: ProjectScope, id: string, version: number, set: SheetValues): Promise<boolean> {
  const updated = await db
    .update(sheets)
    .set({ ...set, version: sql`${sheets.version} + 1`, updatedAt: new Date() })
    .where(and(scoped(s, id), eq(sheets.version, version)))
    .returning({ id: sheets.id });
  return updated.length > 0;
}

/** Locks the sheet row at this version for the rest of the transaction; false when no row had this id and version. */
export async function lockSheetAt(tx: Tx, s: ProjectScope, id: string, version: number): Promise<boolean> {
  const locked = await tx.select({ id: sheets.id }).from(sheets).where(and(scoped(s, id), eq(sheets.version, version))).for("update");
  return locked.length > 0;
}

export async function countTagsOnSheet(tx: Tx, sheetId: string): Promise<number> {
  const [now] = await tx.select({ n: sql<number>`count(*)::int` }).from(tags).where(eq(tags.sheetId, sheetId));
  return now?.n ?? 0;
}

/** Its tags go with it (the foreign key cascades). */
export async function deleteSheetAt(tx: Tx, s: ProjectScope, id: string, version: number) {
  await tx.delete(sheets).where(and(scoped(s, id), eq(sheets.version, version)));
}
