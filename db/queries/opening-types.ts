import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "../client";
import { isForeignKeyViolation, isUniqueViolation } from "../errors";
import { openingTypes, organisations, tags } from "../schema";
import { conflict, fieldErrors, invalid, notFound, stale } from "@/lib/errors";
import { FALLBACK_TRIM_SPEC } from "@/lib/plans/default-trim";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import type { OpeningTypeCreateInput, OpeningTypeUpdateInput } from "@/lib/validators/plans";
import { trimSpecSchema, wallSetback, type TrimSpec, type WallBuildUp } from "@/takeoff";
import { getCounts } from "./counts";
import { checkOpening } from "@/takeoff";
import { assertProject, type ProjectScope } from "./project-scope";
import { requireConfirmed } from "./removal-impact";

const fields = {
  id: openingTypes.id,
  mark: openingTypes.mark,
  width: openingTypes.width,
  height: openingTypes.height,
  setback: openingTypes.setback,
  wallBuildUp: openingTypes.wallBuildUp,
  trimSpec: openingTypes.trimSpec,
  notes: openingTypes.notes,
  version: openingTypes.version,
} as const;

const scoped = (s: ProjectScope, id?: string) =>
  and(eq(openingTypes.orgId, s.orgId), eq(openingTypes.projectId, s.projectId), id ? eq(openingTypes.id, id) : undefined);

const duplicateMark = (error: unknown) =>
  isUniqueViolation(error, "opening_types_project_mark_key")
    ? conflict("This project already has an opening type with that mark.", { mark: "Mark already used in this project." })
    : error;

/** The spec as the engine will use it: organisation defaults under what was typed, checked by the engine's schema. */
function checkedSpec(base: TrimSpec, patch: Partial<TrimSpec> | undefined): TrimSpec {
  const parsed = trimSpecSchema.safeParse({ ...base, ...patch });
  if (!parsed.success) {
    throw invalid(Object.fromEntries(Object.entries(fieldErrors(parsed.error)).map(([k, v]) => [`trimSpec.${k}`, v])));
  }
  return parsed.data;
}

/** Setback from the wall build-up when one is given (stud + wallboard − frame depth), else as typed. */
function resolveSetback(setback: number | undefined, wall: WallBuildUp | null | undefined): number {
  if (!wall) return setback!;
  try {
    return wallSetback(wall);
  } catch (error) {
    throw invalid({ "wallBuildUp.frameDepth": (error as Error).message.replace(/^wall\.\w+: /, "") });
  }
}

/** The sizes and spec together must make a window that can be cut, or the first takeoff would fail on it. */
function assertCuttable(opening: { width: number; height: number; setback: number }, trimSpec: TrimSpec) {
  const checked = checkOpening(opening, trimSpec);
  if ("problem" in checked) throw invalid({ [checked.problem.field]: checked.problem.message }, checked.problem.message);
}

async function organisationTrimDefaults(orgId: string): Promise<TrimSpec> {
  const [org] = await db.select({ d: organisations.trimDefaults }).from(organisations).where(eq(organisations.id, orgId));
  return org?.d ?? FALLBACK_TRIM_SPEC;
}

export async function listOpeningTypes(s: ProjectScope): Promise<OpeningTypeView[]> {
  await assertProject(s);
  return db.select(fields).from(openingTypes).where(scoped(s)).orderBy(asc(openingTypes.mark));
}

export async function getOpeningType(s: ProjectScope, id: string): Promise<OpeningTypeView> {
  const [row] = await db.select(fields).from(openingTypes).where(scoped(s, id));
  if (!row) throw notFound("No such opening type.");
  return row;
}

export async function createOpeningType(s: ProjectScope, input: OpeningTypeCreateInput): Promise<OpeningTypeView> {
  await assertProject(s);
  const trimSpec = checkedSpec(await organisationTrimDefaults(s.orgId), input.trimSpec);
  const setback = resolveSetback(input.setback, input.wallBuildUp);
  assertCuttable({ width: input.width, height: input.height, setback }, trimSpec);
  try {
    const [row] = await db
      .insert(openingTypes)
      .values({
        ...s,
        mark: input.mark,
        width: input.width,
        height: input.height,
        setback,
        wallBuildUp: input.wallBuildUp ?? null,
        trimSpec,
        notes: input.notes ?? null,
      })
      .returning(fields);
    return row!;
  } catch (error) {
    throw duplicateMark(error);
  }
}

export async function updateOpeningType(s: ProjectScope, id: string, input: OpeningTypeUpdateInput): Promise<OpeningTypeView> {
  const current = await getOpeningType(s, id);
  if (current.version !== input.version) throw stale(current);
  const { version, trimSpec, wallBuildUp, setback, ...rest } = input;
  const wall = wallBuildUp === undefined ? current.wallBuildUp : wallBuildUp;
  const set = {
    ...rest,
    wallBuildUp: wall,
    // A typed setback replaces a derived one; otherwise a build-up keeps the setback in step with it.
    setback: setback !== undefined && wallBuildUp === undefined ? setback : resolveSetback(setback ?? current.setback, wall),
    trimSpec: trimSpec ? checkedSpec(current.trimSpec, trimSpec) : current.trimSpec,
  };
  if (setback !== undefined && wallBuildUp === undefined) set.wallBuildUp = null;
  assertCuttable({ width: set.width ?? current.width, height: set.height ?? current.height, setback: set.setback }, set.trimSpec);
  try {
    const rows = await db
      .update(openingTypes)
      .set({ ...set, version: sql`${openingTypes.version} + 1`, updatedAt: new Date() })
      .where(and(scoped(s, id), eq(openingTypes.version, version)))
      .returning(fields);
    if (rows.length === 0) throw stale(await getOpeningType(s, id));
    return rows[0]!;
  } catch (error) {
    throw duplicateMark(error);
  }
}

/**
 * Deletes an opening type and, once the person confirmed how many, the tags of that type with it (one
 * transaction). Without that confirmation a type in use is refused with what it would take.
 */
export async function deleteOpeningType(s: ProjectScope, id: string, version: number, confirmedTags?: number) {
  const current = await getOpeningType(s, id);
  if (current.version !== version) throw stale(current);
  const [used] = await db.select({ n: sql<number>`count(*)::int` }).from(tags).where(and(eq(tags.orgId, s.orgId), eq(tags.openingTypeId, id)));
  const impact = { tags: used?.n ?? 0, openings: (await getCounts(s)).job[id] ?? 0 };
  const n = impact.tags;
  requireConfirmed(current.mark, impact, confirmedTags, `${n} tag${n === 1 ? "" : "s"} on the drawings use ${current.mark} (${impact.openings} opening${impact.openings === 1 ? "" : "s"} counted in the job); deleting ${current.mark} removes them too.`);
  await db.transaction(async (tx) => {
    const removed = await tx.delete(tags).where(and(eq(tags.orgId, s.orgId), eq(tags.projectId, s.projectId), eq(tags.openingTypeId, id))).returning({ id: tags.id });
    // A tag placed or removed since the count: the person agreed to a different number, so undo.
    if (removed.length !== n) throw conflict(`Tags of ${current.mark} changed while you confirmed. Check the count and confirm again.`);
    const rows = await tx
      .delete(openingTypes)
      .where(and(scoped(s, id), eq(openingTypes.version, version)))
      .returning({ id: openingTypes.id })
      .catch((error) => {
        throw isForeignKeyViolation(error) ? conflict(`Tags on the drawings use ${current.mark}. Check the count and confirm again.`) : error;
      });
    if (rows.length === 0) throw stale(await getOpeningType(s, id).catch(() => null));
  });
}
