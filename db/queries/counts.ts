import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "../client";
import { planSets, sheets, tags, unitTypes } from "../schema";
import type { CountByType, CountsView } from "@/lib/plans/api-types";
import { assertProject, type ProjectScope } from "./project-scope";

const add = (into: CountByType, typeId: string, n: number) => {
  into[typeId] = (into[typeId] ?? 0) + n;
};

/**
 * Openings per sheet, per unit type and for the job. A unit type's sheets show one unit, so their
 * tags count once per unit of that type; sheets without a unit type (common areas) count once.
 */
export async function getCounts(s: ProjectScope): Promise<CountsView> {
  await assertProject(s);
  const scope = and(eq(sheets.orgId, s.orgId), eq(sheets.projectId, s.projectId));
  const [sheetRows, tagRows, types] = await Promise.all([
    db
      .select({ id: sheets.id, label: sheets.label, unitTypeId: sheets.unitTypeId })
      .from(sheets)
      .innerJoin(planSets, eq(planSets.id, sheets.planSetId))
      .where(scope)
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

  const bySheet = new Map<string, CountByType>(sheetRows.map((r) => [r.id, {}]));
  for (const t of tagRows) add(bySheet.get(t.sheetId) ?? {}, t.openingTypeId, t.n);

  const perUnit = new Map<string, CountByType>(types.map((u) => [u.id, {}]));
  const commonAreas: CountByType = {};
  for (const sheet of sheetRows) {
    const target = (sheet.unitTypeId && perUnit.get(sheet.unitTypeId)) || commonAreas;
    for (const [typeId, n] of Object.entries(bySheet.get(sheet.id)!)) add(target, typeId, n);
  }

  const job: CountByType = { ...commonAreas };
  const unitTypeCounts = types.map((u) => {
    const one = perUnit.get(u.id)!;
    const all: CountByType = {};
    for (const [typeId, n] of Object.entries(one)) {
      add(all, typeId, n * u.count);
      add(job, typeId, n * u.count);
    }
    return { unitTypeId: u.id, name: u.name, unitCount: u.count, perUnit: one, allUnits: all };
  });

  return {
    sheets: sheetRows.map((r) => {
      const byType = bySheet.get(r.id)!;
      return { sheetId: r.id, label: r.label, unitTypeId: r.unitTypeId, byType, total: Object.values(byType).reduce((a, b) => a + b, 0) };
    }),
    unitTypes: unitTypeCounts,
    commonAreas,
    job,
    jobTotal: Object.values(job).reduce((a, b) => a + b, 0),
  };
}
