import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { db } from "../client";
import { planSets, sheets, tags, unitTypes } from "../schema";
import type { ProjectScope } from "./project-scope";

/** What a count is made from: the sheets in page order, tags per sheet and type, and the unit types by name. */
export async function listCountRows(s: ProjectScope) {
  const [sheetRows, tagRows, types] = await Promise.all([
    db
      .select({ id: sheets.id, label: sheets.label, unitTypeId: sheets.unitTypeId, countRole: sheets.countRole })
      .from(sheets)
      .innerJoin(planSets, eq(planSets.id, sheets.planSetId))
      .where(and(eq(sheets.orgId, s.orgId), eq(sheets.projectId, s.projectId)))
      .orderBy(asc(planSets.createdAt), asc(sheets.pageNumber)),
    db
      .select({ sheetId: tags.sheetId, openingTypeId: tags.openingTypeId, n: sql<number>`count(*)::int` })
      .from(tags)
      .where(and(eq(tags.orgId, s.orgId), eq(tags.projectId, s.projectId)))
      .groupBy(tags.sheetId, tags.openingTypeId),
    db
      .select({ id: unitTypes.id, name: unitTypes.name, count: unitTypes.count })
      .from(unitTypes)
      .where(and(eq(unitTypes.orgId, s.orgId), eq(unitTypes.projectId, s.projectId)))
      .orderBy(asc(unitTypes.name)),
  ]);
  return { sheetRows, tagRows, types };
}

/** Where each tag sits on these sheets (for comparing layouts). */
export async function listTagPositions(s: ProjectScope, sheetIds: string[]) {
  return db
    .select({ sheetId: tags.sheetId, openingTypeId: tags.openingTypeId, x: tags.x, y: tags.y })
    .from(tags)
    .where(and(eq(tags.orgId, s.orgId), eq(tags.projectId, s.projectId), inArray(tags.sheetId, sheetIds)));
}
