import type { CountsView } from "./api-types";

/** What a delete takes with it: tags on the drawings and the openings they count in the job. */
export interface RemovalImpact {
  tags: number;
  openings: number;
}

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
export const describeImpact = (i: RemovalImpact) => `${plural(i.tags, "tag")} (${plural(i.openings, "opening")} counted in the job)`;

/** Openings the job counts from these sheets: a counted unit-type sheet's tags × its units, a common area's once, a reference view's none. */
export function sheetsImpact(counts: CountsView, sheetIds: ReadonlySet<string>): RemovalImpact {
  const units = new Map(counts.unitTypes.map((u) => [u.unitTypeId, u.unitCount]));
  let tags = 0;
  let openings = 0;
  for (const s of counts.sheets) {
    if (!sheetIds.has(s.sheetId)) continue;
    tags += s.total;
    if (s.countRole === "counted") openings += s.total * (s.unitTypeId ? (units.get(s.unitTypeId) ?? 0) : 1);
  }
  return { tags, openings };
}
