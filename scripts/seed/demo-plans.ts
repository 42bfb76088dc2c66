import { and, eq } from "drizzle-orm";
import { UTApi, UTFile } from "uploadthing/server";
import { db } from "@/db/client";
import { planSets, projects } from "@/db/schema";
import { insertPlanSet } from "@/db/queries/plan-sets";
import { listSheets } from "@/db/queries/sheets";
import { insertUnitType as createUnitType } from "@/db/queries/unit-types";
import { insertTag } from "@/db/queries/tags";
import { inspectPdf } from "@/lib/pdf/inspect";
import { DEMO_WINDOW_TYPES, generatePlanSet, type WindowMark } from "@/scripts/demo-plan";
import { pointAtUploadStandInUnlessConfigured } from "@/lib/uploads/config";
// The window list and calibration go through their use cases: setbacks and scales are derived there.
import { addOpeningType } from "@/lib/server/plans/opening-types";
import { editSheet } from "@/lib/server/plans/sheets";
import type { TrimSpec } from "@/takeoff";

/** Invented counts for the invented building: how many of each unit the job has. */
const UNIT_COUNTS: Record<string, number> = { "Type A": 18, "Type B": 12, "Type C": 6 };

/** Window-list trim: the bathroom window W4 is picture-framed, the rest stool-and-apron (invented). */
const SPEC: Record<WindowMark, TrimSpec> = {
  W1: { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.6875 },
  W2: { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.6875 },
  W3: { style: "stool-and-apron", casingWidth: 3.5, casingThickness: 0.75 },
  W4: { style: "picture-frame", casingWidth: 2.5, casingThickness: 0.6875 },
};

/**
 * Openings of the other kinds on the same job (invented): a twin mulled unit in the living rooms, interior
 * doors cased both sides, the unit entry door cased on the room side only, a round-top over the stair
 * landing and a three-unit bay. Tagged beside the drawn windows on the tagged unit plans, at `at` (a
 * fraction of the sheet's width and height), since the generated drawings show windows only.
 */
const OTHER_KINDS = [
  { input: { mark: "M1", kind: "mulled", widths: [35.5, 35.5], mullGap: 1.5, height: 60, notes: "TWIN SINGLE HUNG, MULLED" }, at: [0.3, 0.42] },
  { input: { mark: "D1", kind: "door", width: 30, height: 80, sides: 2, setback: 0, notes: "INTERIOR PASSAGE DOOR" }, at: [0.45, 0.5] },
  { input: { mark: "D2", kind: "door", width: 36, height: 80, sides: 1, setback: 0, notes: "UNIT ENTRY DOOR" }, at: [0.55, 0.58] },
  { input: { mark: "R1", kind: "round-top", width: 48, springHeight: 40, notes: "HALF-ROUND OVER STAIR LANDING" }, at: [0.62, 0.35] },
  { input: { mark: "B1", kind: "bay", widths: [24, 48, 24], mullGap: 3, turn: 45, height: 54, notes: "45° BAY, LIVING ROOM" }, at: [0.38, 0.62] },
] as const;

/**
 * The demo project's drawings: a generated plan set stored through the upload service (the local
 * stand-in), its sheets, unit types and window list, most sheets calibrated and some tagged — so a
 * newcomer sees the workflow under way. Skips a project that already has plan sets.
 */
export async function seedDemoPlans(orgId: string, projectId: string | null, userId: string) {
  const [project] = projectId ? await db.select({ id: projects.id }).from(projects).where(and(eq(projects.orgId, orgId), eq(projects.id, projectId))) : [];
  if (!project) return false;
  const scope = { orgId, projectId: project.id, userId };
  const existing = await db.select({ id: planSets.id }).from(planSets).where(eq(planSets.projectId, project.id)).limit(1);
  if (existing.length > 0) return false;

  const { bytes, sheets: drawn } = await generatePlanSet();
  pointAtUploadStandInUnlessConfigured();
  const name = "Larkspur-Commons-Bldg-C-Architectural.pdf";
  const [uploaded] = await new UTApi().uploadFiles([new UTFile([Buffer.from(bytes)], name, { type: "application/pdf" })]);
  if (!uploaded?.data) throw new Error(`could not store the demo plan set: ${uploaded?.error?.message ?? "no answer"}`);
  const inspection = await inspectPdf(bytes);
  await insertPlanSet(scope, { key: uploaded.data.key, name, size: bytes.byteLength }, inspection.pages);

  const unitTypes = new Map<string, string>();
  for (const [typeName, count] of Object.entries(UNIT_COUNTS)) unitTypes.set(typeName, (await createUnitType(scope, { name: typeName, count })).id);
  const openingTypes = new Map<string, string>();
  for (const [mark, size] of Object.entries(DEMO_WINDOW_TYPES) as [WindowMark, (typeof DEMO_WINDOW_TYPES)[WindowMark]][]) {
    const created = await addOpeningType(scope, {
      mark,
      width: size.widthInches,
      height: size.heightInches,
      wallBuildUp: { stud: "2x6", wallboard: "1/2", frameDepth: 4.5625 },
      trimSpec: SPEC[mark],
      notes: size.description,
    });
    openingTypes.set(mark, created.id);
  }
  const wall = { stud: "2x6", wallboard: "1/2", frameDepth: 4.5625 } as const;
  for (const { input } of OTHER_KINDS) {
    const spec = SPEC.W1;
    const created = await addOpeningType(scope, { ...input, widths: "widths" in input ? [...input.widths] : undefined, ...(input.kind === "door" ? {} : { wallBuildUp: wall }), trimSpec: spec });
    openingTypes.set(input.mark, created.id);
  }

  // Calibrate all but the last sheet (by the overall dimension; the first also gets its printed scale) and tag the first two.
  const stored = await listSheets(scope);
  for (const [i, sheet] of stored.entries()) {
    const plan = drawn[i]!;
    const unitTypeId = plan.unitTypeName ? (unitTypes.get(plan.unitTypeName) ?? null) : null;
    if (i === stored.length - 1) {
      await editSheet(scope, sheet.id, { version: sheet.version, unitTypeId });
      continue;
    }
    const k = plan.knownDimension;
    await editSheet(scope, sheet.id, {
      version: sheet.version,
      unitTypeId,
      calibrationPoints: { ax: k.ax, ay: k.ay, bx: k.bx, by: k.by, length: k.inches },
      ...(i === 0 ? { scale: { ratio: 48, label: `1/4" = 1'-0"` } } : {}),
    });
    if (i < 2) {
      for (const w of plan.windows) {
        await insertTag(scope, { sheetId: sheet.id, openingTypeId: openingTypes.get(w.mark)!, x: w.x, y: w.y });
      }
      const page = inspection.pages[i]!;
      for (const { input, at } of OTHER_KINDS) {
        await insertTag(scope, { sheetId: sheet.id, openingTypeId: openingTypes.get(input.mark)!, x: page.width * at[0], y: page.height * at[1] });
      }
    }
  }
  return true;
}
