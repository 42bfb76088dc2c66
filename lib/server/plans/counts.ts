import { listCountRows, listTagPositions } from "@/db/queries/counts";
import type { ProjectScope } from "@/db/queries/project-scope";
import type { CountByType, CountsView, CountWarning } from "@/lib/plans/api-types";
import { duplicateLayouts, type LayoutTag } from "@/lib/plans/tag-layout";
import { requireProject } from "@/lib/server/projects/require-project";

const add = (into: CountByType, typeId: string, n: number) => {
  into[typeId] = (into[typeId] ?? 0) + n;
};
const listLabels = (labels: string[]) => (labels.length <= 2 ? labels.join(" and ") : `${labels.slice(0, -1).join(", ")} and ${labels.at(-1)}`);

/** The counts page and route: the project checked once, then counted. */
export async function countsOf(s: ProjectScope): Promise<CountsView> {
  await requireProject(s);
  return tallyCounts(s);
}

/**
 * Openings per sheet, per unit type and for the job. A unit type's counted sheets show one unit, so
 * their tags count once per unit of that type; counted sheets without a unit type (common areas) count
 * once; reference sheets (enlarged plans, repeats) count for nothing. Also the warnings an estimator
 * should see before a takeoff (see CountWarning). No project check: for a use case that made it already.
 */
export async function tallyCounts(s: ProjectScope): Promise<CountsView> {
  const { sheetRows, tagRows, types } = await listCountRows(s);

  const bySheet = new Map<string, CountByType>(sheetRows.map((r) => [r.id, {}]));
  for (const t of tagRows) add(bySheet.get(t.sheetId) ?? {}, t.openingTypeId, t.n);

  const perUnit = new Map<string, CountByType>(types.map((u) => [u.id, {}]));
  const commonAreas: CountByType = {};
  for (const sheet of sheetRows) {
    if (sheet.countRole !== "counted") continue;
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
      return { sheetId: r.id, label: r.label, unitTypeId: r.unitTypeId, countRole: r.countRole, byType, total: Object.values(byType).reduce((a, b) => a + b, 0) };
    }),
    unitTypes: unitTypeCounts,
    commonAreas,
    job,
    jobTotal: Object.values(job).reduce((a, b) => a + b, 0),
    warnings: await countWarnings(s, sheetRows, types),
  };
}

type SheetRow = { id: string; label: string; unitTypeId: string | null; countRole: "counted" | "reference" };

/** Same layout on two counted sheets of one unit type; a unit type whose sheets are all reference views. */
async function countWarnings(s: ProjectScope, sheetRows: SheetRow[], types: { id: string; name: string; count: number }[]): Promise<CountWarning[]> {
  const warnings: CountWarning[] = [];
  const label = new Map(sheetRows.map((r) => [r.id, r.label]));
  const byUnit = new Map<string, SheetRow[]>();
  for (const r of sheetRows) if (r.unitTypeId) byUnit.set(r.unitTypeId, [...(byUnit.get(r.unitTypeId) ?? []), r]);

  // Only unit types with two or more counted sheets can repeat themselves: read those sheets' tags only.
  const suspects = [...byUnit.values()].flatMap((rows) => {
    const counted = rows.filter((r) => r.countRole === "counted");
    return counted.length > 1 ? counted.map((r) => r.id) : [];
  });
  const positions = new Map<string, LayoutTag[]>();
  if (suspects.length > 0) {
    for (const r of await listTagPositions(s, suspects)) positions.set(r.sheetId, [...(positions.get(r.sheetId) ?? []), r]);
  }

  for (const u of types) {
    const rows = byUnit.get(u.id) ?? [];
    const counted = rows.filter((r) => r.countRole === "counted");
    if (rows.length > 0 && counted.length === 0) {
      warnings.push({
        kind: "no-counted-sheet",
        unitTypeId: u.id,
        sheetIds: rows.map((r) => r.id),
        message: `${u.name} counts no openings: ${listLabels(rows.map((r) => r.label))} ${rows.length === 1 ? "is a reference view" : "are all reference views"}. Make the sheet that shows one unit count.`,
      });
    }
    if (counted.length < 2) continue;
    for (const ids of duplicateLayouts(counted.map((r) => ({ sheetId: r.id, tags: positions.get(r.id) ?? [] })))) {
      warnings.push({
        kind: "same-layout",
        unitTypeId: u.id,
        sheetIds: ids,
        message: `${listLabels(ids.map((id) => label.get(id)!))} carry the same tags for ${u.name}, and each counts × ${u.count}. If they show the same unit, mark all but one as a reference view.`,
      });
    }
  }
  return warnings;
}
