import { db } from "@/db/client";
import type { ProjectScope } from "@/db/queries/project-scope";
import { countTagsOnSheet, deleteSheetAt, findSheet, hasOtherCountedSheet, listSheets, lockSheetAt, updateSheetAt, type SheetValues } from "@/db/queries/sheets";
import { findUnitType } from "@/db/queries/unit-types";
import { invalid, orNotFound, stale, staleOrMissing } from "@/lib/errors";
import type { SheetView } from "@/lib/plans/api-types";
import { inchesPerUnitFromPoints, inchesPerUnitFromScale, scaleMismatchPercent } from "@/lib/plans/calibration";
import { sheetsImpact } from "@/lib/plans/removal-impact";
import type { SheetUpdateInput } from "@/lib/validators/plans";
import { requireProject } from "@/lib/server/projects/require-project";
import { requireConfirmed } from "./confirm-removal";
import { tallyCounts } from "./counts";

const MISSING = "No such sheet.";

/** The 1% check: picked points against the chosen scale, when a sheet has both. */
const toView = (row: Omit<SheetView, "scaleMismatchPercent">): SheetView => {
  let mismatch: number | null = null;
  if (row.calibrationPoints && row.scaleRatio && row.inchesPerUnit) {
    const pct = scaleMismatchPercent(row.inchesPerUnit, inchesPerUnitFromScale(row.scaleRatio, row.userUnit));
    mismatch = Math.abs(pct) > 1 ? pct : null;
  }
  return { ...row, scaleMismatchPercent: mismatch };
};

export async function sheetsOf(s: ProjectScope): Promise<SheetView[]> {
  await requireProject(s);
  return (await listSheets(s)).map(toView);
}

export async function sheetOf(s: ProjectScope, id: string): Promise<SheetView> {
  return toView(orNotFound(await findSheet(s, id), MISSING));
}

/**
 * The role a sheet takes when it joins a unit type and nobody said which: it counts unless another
 * sheet already counts for that unit type, because a second sheet of one unit type is most often an
 * enlarged plan or a repeat, and counting it twice doubles every window of the type. Common-area
 * sheets count (each floor's corridor is its own openings).
 */
async function defaultRole(s: ProjectScope, id: string, unitTypeId: string | null): Promise<"counted" | "reference"> {
  if (!unitTypeId) return "counted";
  return (await hasOtherCountedSheet(s, unitTypeId, id)) ? "reference" : "counted";
}

/** Label, unit type, count role and calibration, with a version check so two estimators never overwrite each other. */
export async function editSheet(s: ProjectScope, id: string, input: SheetUpdateInput): Promise<SheetView> {
  const current = await sheetOf(s, id);
  if (current.version !== input.version) throw stale(current);

  const set: SheetValues = {};
  if (input.label !== undefined) set.label = input.label;
  if (input.unitTypeId !== undefined) {
    if (input.unitTypeId && !(await findUnitType(s, input.unitTypeId))) throw invalid({ unitTypeId: "No such unit type in this project." });
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

  if (!(await updateSheetAt(s, id, input.version, set))) staleOrMissing(await sheetOrNull(s, id), MISSING);
  return sheetOf(s, id);
}

async function sheetOrNull(s: ProjectScope, id: string): Promise<SheetView | null> {
  const row = await findSheet(s, id);
  return row && toView(row);
}

/**
 * Removes one sheet and its tags (the foreign key cascades). Version-checked like an edit, so a sheet
 * someone just tagged is not deleted on the strength of an older count.
 */
export async function removeSheet(s: ProjectScope, id: string, version: number, confirmedTags?: number): Promise<void> {
  const current = await sheetOf(s, id);
  if (current.version !== version) throw stale(current);
  const impact = sheetsImpact(await tallyCounts(s), new Set([id]));
  requireConfirmed(current.label, impact, confirmedTags);
  await db.transaction(async (tx) => {
    // The sheet row locked first, so a tag placed after the count above is seen here, not lost unseen.
    if (!(await lockSheetAt(tx, s, id, version))) throw stale(await sheetOrNull(s, id));
    const tagsNow = await countTagsOnSheet(tx, id);
    if (tagsNow !== impact.tags) requireConfirmed(current.label, { ...impact, tags: tagsNow }, confirmedTags);
    await deleteSheetAt(tx, s, id, version);
  });
}
