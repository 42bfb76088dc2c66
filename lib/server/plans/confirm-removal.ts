import { AppError } from "@/lib/errors";
import { describeImpact, type RemovalImpact } from "@/lib/plans/removal-impact";

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

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
  throw new AppError(409, message, undefined, { removes: impact }, "confirm_removal");
}
