import { fieldErrors, invalid } from "@/lib/errors";
import { checkOpening, openingOf, type OpeningKindName, type OpeningShape } from "@/takeoff";
import { trimSpecSchema, wallSetback, type TrimSpec, type WallBuildUp } from "@/takeoff";

/** The spec as the engine will use it: organisation defaults under what was typed, checked by the engine's schema. */
export function checkedSpec(base: TrimSpec, patch: Partial<TrimSpec> | undefined): TrimSpec {
  const parsed = trimSpecSchema.safeParse({ ...base, ...patch });
  if (!parsed.success) {
    throw invalid(Object.fromEntries(Object.entries(fieldErrors(parsed.error)).map(([k, v]) => [`trimSpec.${k}`, v])));
  }
  return parsed.data;
}

/** Setback from the wall build-up when one is given (stud + wallboard − frame depth), else as typed. */
export function resolveSetback(setback: number | undefined, wall: WallBuildUp | null | undefined): number {
  if (!wall) return setback!;
  try {
    return wallSetback(wall);
  } catch (error) {
    throw invalid({ "wallBuildUp.frameDepth": (error as Error).message.replace(/^wall\.\w+: /, "") });
  }
}

/** The sizes and spec together must make a window that can be cut, or the first takeoff would fail on it. */
export function assertCuttable(
  opening: { width: number; height: number; setback: number; kind?: OpeningKindName; shape?: OpeningShape | null },
  trimSpec: TrimSpec,
) {
  const checked = checkOpening(openingOf({ ...opening, shape: opening.shape ?? undefined }), trimSpec);
  if ("problem" in checked) throw invalid({ [checked.problem.field]: checked.problem.message }, checked.problem.message);
}
