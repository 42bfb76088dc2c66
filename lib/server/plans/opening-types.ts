import { db } from "@/db/client";
import { isForeignKeyViolation, isUniqueViolation } from "@/db/errors";
import {
  countTagsOfOpeningType,
  deleteOpeningTypeAt,
  deleteTagsOfOpeningType,
  findOpeningType,
  findOrganisationTrimDefaults,
  insertOpeningType,
  listOpeningTypes,
  OPENING_TYPE_MARK_KEY,
  updateOpeningTypeAt,
} from "@/db/queries/opening-types";
import type { ProjectScope } from "@/db/queries/project-scope";
import { conflict, orNotFound, stale, staleOrMissing } from "@/lib/errors";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import { FALLBACK_TRIM_SPEC } from "@/lib/plans/default-trim";
import type { OpeningTypeCreateInput, OpeningTypeUpdateInput } from "@/lib/validators/plans";
import { requireProject } from "@/lib/server/projects/require-project";
import { requireConfirmed } from "./confirm-removal";
import { tallyCounts } from "./counts";
import { kindShape } from "./opening-kind-shape";
import { assertCuttable, checkedSpec, resolveSetback } from "./opening-type-rules";

const MISSING = "No such opening type.";

const duplicateMark = (error: unknown) =>
  isUniqueViolation(error, OPENING_TYPE_MARK_KEY)
    ? conflict("This project already has an opening type with that mark.", { mark: "Mark already used in this project." })
    : error;

export async function openingTypesOf(s: ProjectScope): Promise<OpeningTypeView[]> {
  await requireProject(s);
  return listOpeningTypes(s);
}

/** Organisation defaults fill the spec; the setback comes from the wall when one is given; the window must be cuttable. */
export async function addOpeningType(s: ProjectScope, input: OpeningTypeCreateInput): Promise<OpeningTypeView> {
  await requireProject(s);
  const trimSpec = checkedSpec((await findOrganisationTrimDefaults(s.orgId)) ?? FALLBACK_TRIM_SPEC, input.trimSpec);
  const { kind, shape, width, height } = kindShape(input);
  // A door's casing covers no wall depth: it has no setback unless one is typed.
  const setback = kind === "door" && input.setback === undefined && !input.wallBuildUp ? 0 : resolveSetback(input.setback, input.wallBuildUp);
  assertCuttable({ width, height, setback, kind, shape }, trimSpec);
  const values = { mark: input.mark, width, height, setback, wallBuildUp: input.wallBuildUp ?? null, trimSpec, notes: input.notes ?? null, kind, shape };
  return insertOpeningType(s, values).catch((error) => {
    throw duplicateMark(error);
  });
}

/** Version-checked edit: a stale version is refused (409) with the row as it is now. */
export async function editOpeningType(s: ProjectScope, id: string, input: OpeningTypeUpdateInput): Promise<OpeningTypeView> {
  const current = orNotFound(await findOpeningType(s, id), MISSING);
  if (current.version !== input.version) throw stale(current);
  const { version, trimSpec, wallBuildUp, setback, kind: kindIn, widths, mullGap, sides, springHeight, rise, turn, ...rest } = input;
  // A new kind takes only what was sent with it; the same kind keeps its stored fields under what was sent.
  const kindChanged = kindIn !== undefined && kindIn !== current.kind;
  const sent = Object.fromEntries(Object.entries({ widths, mullGap, sides, springHeight, rise, turn }).filter(([, v]) => v !== undefined));
  const shaped = kindShape({
    kind: kindIn ?? current.kind,
    width: rest.width ?? current.width,
    height: rest.height ?? current.height,
    ...(kindChanged ? {} : (current.shape ?? {})),
    ...sent,
  });
  const wall = wallBuildUp === undefined ? current.wallBuildUp : wallBuildUp;
  const set = {
    ...rest,
    wallBuildUp: wall,
    // A typed setback replaces a derived one; otherwise a build-up keeps the setback in step with it.
    setback: setback !== undefined && wallBuildUp === undefined ? setback : resolveSetback(setback ?? current.setback, wall),
    trimSpec: trimSpec ? checkedSpec(current.trimSpec, trimSpec) : current.trimSpec,
    kind: shaped.kind,
    shape: shaped.shape,
    width: shaped.width,
    height: shaped.height,
  };
  if (setback !== undefined && wallBuildUp === undefined) set.wallBuildUp = null;
  assertCuttable({ width: set.width, height: set.height, setback: set.setback, kind: set.kind, shape: set.shape }, set.trimSpec);
  const row = await updateOpeningTypeAt(s, id, version, set).catch((error) => {
    throw duplicateMark(error);
  });
  return row ?? staleOrMissing(await findOpeningType(s, id), MISSING);
}

/**
 * Deletes an opening type and, once the person confirmed how many, the tags of that type with it (one
 * transaction). Without that confirmation a type in use is refused with what it would take.
 */
export async function removeOpeningType(s: ProjectScope, id: string, version: number, confirmedTags?: number) {
  const current = orNotFound(await findOpeningType(s, id), MISSING);
  if (current.version !== version) throw stale(current);
  const n = await countTagsOfOpeningType(s, id);
  const impact = { tags: n, openings: (await tallyCounts(s)).job[id] ?? 0 };
  requireConfirmed(current.mark, impact, confirmedTags, `${n} tag${n === 1 ? "" : "s"} on the drawings use ${current.mark} (${impact.openings} opening${impact.openings === 1 ? "" : "s"} counted in the job); deleting ${current.mark} removes them too.`);
  await db.transaction(async (tx) => {
    // A tag placed or removed since the count: the person agreed to a different number, so undo.
    if ((await deleteTagsOfOpeningType(tx, s, id)) !== n) throw conflict(`Tags of ${current.mark} changed while you confirmed. Check the count and confirm again.`);
    const deleted = await deleteOpeningTypeAt(tx, s, id, version).catch((error) => {
      throw isForeignKeyViolation(error) ? conflict(`Tags on the drawings use ${current.mark}. Check the count and confirm again.`) : error;
    });
    if (!deleted) throw stale(await findOpeningType(s, id));
  });
}
