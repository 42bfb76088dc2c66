import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "../client";
import { openingTypes, sheets, tags } from "../schema";
import { invalid, notFound, stale } from "@/lib/errors";
import type { TagView } from "@/lib/plans/api-types";
import type { TagCreateInput, TagUpdateInput } from "@/lib/validators/plans";
import { assertProject, type ProjectScope } from "./project-scope";

/** A measured width more than this far from the type's width is flagged (inches). */
export const WIDTH_CHECK_TOLERANCE = 1;

const fields = {
  id: tags.id,
  sheetId: tags.sheetId,
  openingTypeId: tags.openingTypeId,
  x: tags.x,
  y: tags.y,
  measuredWidth: tags.measuredWidth,
  widthMismatch: sql<boolean>`coalesce(abs(${tags.measuredWidth} - ${openingTypes.width}) > ${WIDTH_CHECK_TOLERANCE}, false)`,
  version: tags.version,
} as const;

const scoped = (s: ProjectScope, id?: string) =>
  and(eq(tags.orgId, s.orgId), eq(tags.projectId, s.projectId), id ? eq(tags.id, id) : undefined);

const select = () => db.select(fields).from(tags).innerJoin(openingTypes, eq(openingTypes.id, tags.openingTypeId));

export async function listTags(s: ProjectScope, sheetId?: string): Promise<TagView[]> {
  await assertProject(s);
  return select()
    .where(and(scoped(s), sheetId ? eq(tags.sheetId, sheetId) : undefined))
    .orderBy(asc(tags.createdAt), asc(tags.id));
}

export async function getTag(s: ProjectScope, id: string): Promise<TagView> {
  const [row] = await select().where(scoped(s, id));
  if (!row) throw notFound("No such tag.");
  return row;
}

/** Sheet and opening type must both belong to this project; naming another's is a field error, not a leak. */
async function assertParts(s: ProjectScope, parts: { sheetId?: string; openingTypeId?: string }) {
  if (parts.sheetId) {
    const [row] = await db.select({ id: sheets.id }).from(sheets).where(and(eq(sheets.orgId, s.orgId), eq(sheets.projectId, s.projectId), eq(sheets.id, parts.sheetId)));
    if (!row) throw invalid({ sheetId: "No such sheet in this project." });
  }
  if (parts.openingTypeId) {
    const [row] = await db
      .select({ id: openingTypes.id })
      .from(openingTypes)
      .where(and(eq(openingTypes.orgId, s.orgId), eq(openingTypes.projectId, s.projectId), eq(openingTypes.id, parts.openingTypeId)));
    if (!row) throw invalid({ openingTypeId: "No such opening type in this project." });
  }
}

export async function createTag(s: ProjectScope & { userId: string }, input: TagCreateInput): Promise<TagView> {
  await assertProject(s);
  await assertParts(s, input);
  const [row] = await db
    .insert(tags)
    .values({
      orgId: s.orgId,
      projectId: s.projectId,
      sheetId: input.sheetId,
      openingTypeId: input.openingTypeId,
      x: input.x,
      y: input.y,
      measuredWidth: input.measuredWidth ?? null,
      createdBy: s.userId,
    })
    .returning({ id: tags.id });
  return getTag(s, row!.id);
}

/** Move, retype or re-measure one tag; a stale version is refused with the tag as it is now. */
export async function updateTag(s: ProjectScope, id: string, input: TagUpdateInput): Promise<TagView> {
  const { version, ...set } = input;
  await assertParts(s, { openingTypeId: set.openingTypeId });
  const rows = await db
    .update(tags)
    .set({ ...set, version: sql`${tags.version} + 1`, updatedAt: new Date() })
    .where(and(scoped(s, id), eq(tags.version, version)))
    .returning({ id: tags.id });
  // A tag deleted meanwhile answers 404 like one that never was: "gone" and "not yours" must look the same.
  if (rows.length === 0) throw stale(await getTag(s, id));
  return getTag(s, id);
}

export async function deleteTag(s: ProjectScope, id: string, version: number) {
  const rows = await db.delete(tags).where(and(scoped(s, id), eq(tags.version, version))).returning({ id: tags.id });
  // A tag deleted meanwhile answers 404 like one that never was: "gone" and "not yours" must look the same.
  if (rows.length === 0) throw stale(await getTag(s, id));
}
