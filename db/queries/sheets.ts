import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "../client";
import { planSets, sheets, tags, unitTypes } from "../schema";
import { invalid, notFound, stale } from "@/lib/errors";
import { inchesPerUnitFromPoints, inchesPerUnitFromScale, scaleMismatchPercent } from "@/lib/plans/calibration";
import type { SheetView } from "@/lib/plans/api-types";
import type { SheetUpdateInput } from "@/lib/validators/plans";
import { getCounts } from "./counts";
import { assertProject, type ProjectScope } from "./project-scope";
import { sheetsImpact } from "@/lib/plans/removal-impact";
import { requireConfirmed } from "./removal-impact";

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

/** The 1% check: picked points against the chosen scale, when a sheet has both. */
const toView = (row: Omit<SheetView, "scaleMismatchPercent">): SheetView => {
  let mismatch: number | null = null;
  if (row.calibrationPoints && row.scaleRatio && row.inchesPerUnit) {
    const pct = scaleMismatchPercent(row.inchesPerUnit, inchesPerUnitFromScale(row.scaleRatio, row.userUnit));
    mismatch = Math.abs(pct) > 1 ? pct : null;
  }
  return { ...row, scaleMismatchPercent: mismatch };
};

const scoped = (s: ProjectScope, id?: string) =>
  and(eq(sheets.orgId, s.orgId), eq(sheets.projectId, s.projectId), id ? eq(sheets.id, id) : undefined);

export async function listSheets(s: ProjectScope): Promise<SheetView[]> {
  await assertProject(s);
  const rows = await db
    .select(fields)
    .from(sheets)
    .innerJoin(planSets, eq(planSets.id, sheets.planSetId))
    .where(scoped(s))
    .orderBy(asc(planSets.createdAt), asc(sheets.pageNumber));
  return rows.map(toView);
}

export async function getSheet(s: ProjectScope, id: string): Promise<SheetView> {
  const [row] = await db.select(fields).from(sheets).innerJoin(planSets, eq(planSets.id, sheets.planSetId)).where(scoped(s, id));
  if (!row) throw notFound("No such sheet.");
  return toView(row);
}

/**
 * The role a sheet takes when it joins a unit type and nobody said which: it counts unless another
 * sheet already counts for that unit type, because a second sheet of one unit type is most often an
 * enlarged plan or a repeat, and counting it twice doubles every window of the type. Common-area
 * sheets count (each floor's corridor is its own openings).
 */
async function defaultRole(s: ProjectScope, id: string, unitTypeId: string | null): Promise<"counted" | "reference"> {
  if (!unitTypeId) return "counted";
  const [other] = await db
    .select({ id: sheets.id })
    .from(sheets)
    .where(and(scoped(s), eq(sheets.unitTypeId, unitTypeId), eq(sheets.countRole, "counted"), sql`${sheets.id} <> ${id}`))
    .limit(1);
  return other ? "reference" : "counted";
}

/** Label, unit type, count role and calibration, with a version check so two estimators never overwrite each other. */
export async function updateSheet(s: ProjectScope, id: string, input: SheetUpdateInput): Promise<SheetView> {
  const current = await getSheet(s, id);
  if (current.version !== input.version) throw stale(current);

  const set: Partial<typeof sheets.$inferInsert> = {};
  if (input.label !== undefined) set.label = input.label;
  if (input.unitTypeId !== undefined) {
    if (input.unitTypeId) {
      const [ut] = await db
        .select({ id: unitTypes.id })
        .from(unitTypes)
        .where(and(eq(unitTypes.orgId, s.orgId), eq(unitTypes.projectId, s.projectId), eq(unitTypes.id, input.unitTypeId)));
      if (!ut) throw invalid({ unitTypeId: "No such unit type in this project." });
    }
    set.unitTypeId = input.unitTypeId;
    if (input.countRole === undefined && input.unitTypeId !== current.unitTypeId) set.countRole = await defaultRole(s, id, input.unitTypeId);
  }
  if (input.countRole !== undefined) set.countRole = input.countRole;
  if (input.scale !== undefined) {
    set.scaleRatio = input.scale?.ratio ?? null;
    set.scaleLabel = input.scale?.label ?? null;
  }
  if (input.calibrationPoints !== undefined) {
    const p = input.calibrationPoints;
    set.calibrationPoints = p ? { ax: p.ax, ay: p.ay, bx: p.bx, by: p.by, inches: p.length } : null;
  }
  // What is in effect: picked points win over a chosen scale, because they were measured on this sheet.
  const points = set.calibrationPoints !== undefined ? set.calibrationPoints : current.calibrationPoints;
  const ratio = set.scaleRatio !== undefined ? set.scaleRatio : current.scaleRatio;
  set.inchesPerUnit = points
    ? inchesPerUnitFromPoints({ x: points.ax, y: points.ay }, { x: points.bx, y: points.by }, points.inches)
    : ratio
      ? inchesPerUnitFromScale(ratio, current.userUnit)
      : null;

  const updated = await db
    .update(sheets)
    .set({ ...set, version: sql`${sheets.version} + 1`, updatedAt: new Date() })
    .where(and(scoped(s, id), eq(sheets.version, input.version)))
    .returning({ id: sheets.id });
  if (updated.length === 0) throw stale(await getSheet(s, id));
  return getSheet(s, id);
}

/**
 * Removes one sheet and its tags (the foreign key cascades). Version-checked like an edit, so a sheet
 * someone just tagged is not deleted on the strength of an older count.
 */
export async function deleteSheet(s: ProjectScope, id: string, version: number, confirmedTags?: number): Promise<void> {
  const current = await getSheet(s, id);
  if (current.version !== version) throw stale(current);
  const impact = sheetsImpact(await getCounts(s), new Set([id]));
  requireConfirmed(current.label, impact, confirmedTags);
  await db.transaction(async (tx) => {
    // The sheet row locked first, so a tag placed after the count above is seen here, not lost unseen.
    const locked = await tx.select({ id: sheets.id }).from(sheets).where(and(scoped(s, id), eq(sheets.version, version))).for("update");
    if (locked.length === 0) throw stale(await getSheet(s, id).catch(() => null));
    const [now] = await tx.select({ n: sql<number>`count(*)::int` }).from(tags).where(eq(tags.sheetId, id));
    if ((now?.n ?? 0) !== impact.tags) requireConfirmed(current.label, { ...impact, tags: now?.n ?? 0 }, confirmedTags);
    await tx.delete(sheets).where(and(scoped(s, id), eq(sheets.version, version)));
  });
}
