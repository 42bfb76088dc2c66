import { AppError } from "@/lib/errors";
import type { CountsView } from "@/lib/plans/api-types";

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

/**
 * A delete that takes tags with it must say so, and the caller must say it agreed: `confirmedTags`
 * is the tag count the person was shown (`?tags=N`). Missing or different (someone tagged meanwhile)
 * → 409 with what it would remove now, and nothing is deleted.
 */
export function requireConfirmed(what: string, impact: RemovalImpact, confirmedTags: number | undefined, lead?: string) {
  if (impact.tags === 0 || confirmedTags === impact.tags) return;
  const message =
    confirmedTags === undefined
      ? `${lead ?? `Deleting ${what} removes ${describeImpact(impact)}.`} Confirm to delete them with it.`
      : `${what} now carries ${describeImpact(impact)}, not ${plural(confirmedTags, "tag")} as you were shown. Check and confirm again.`;
  throw new AppError(409, message, undefined, { code: "confirm_removal", removes: impact });
}
