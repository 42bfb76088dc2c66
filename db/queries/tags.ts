import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "../client";
import { openingTypes, sheets, tags } from "../schema";
import type { ProjectScope } from "./project-scope";

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

/** A tag as placed: where, of which type, and the width measured on the drawing if any. */
export interface TagValues {
  sheetId: string;
  openingTypeId: string;
  x: number;
  y: number;
  measuredWidth?: number | null;
}

/** The project's tags (of one sheet when given), in the order they were placed. */
export async function listTags(s: ProjectScope, sheetId?: string) {
  return select()
    .where(and(scoped(s), sheetId ? eq(tags.sheetId, sheetId) : undefined))
    .orderBy(asc(tags.createdAt), asc(tags.id));
}

export async function findTag(s: ProjectScope, id: string) {
  const [row] = await select().where(scoped(s, id));
  return row ?? null;
}

export async function isSheetInProject(s: ProjectScope, sheetId: string): Promise<boolean> {
  const [row] = await db.select({ id: sheets.id }).from(sheets).where(and(eq(sheets.orgId, s.orgId), eq(sheets.projectId, s.projectId), eq(sheets.id, sheetId)));
  return row !== undefined;
}

export async function isOpeningTypeInProject(s: ProjectScope, openingTypeId: string): Promise<boolean> {
  const [row] = await db
    .select({ id: openingTypes.id })
    .from(openingTypes)
    .where(and(eq(openingTypes.orgId, s.orgId), eq(openingTypes.projectId, s.projectId), eq(openingTypes.id, openingTypeId)));
  return row !== undefined;
}

/** Returns the new tag's id. */
export async function insertTag(s: ProjectScope & { userId: string }, values: TagValues): Promise<string> {
  const [row] = await db
    .insert(tags)
    .values({
      orgId: s.orgId,
      projectId: s.projectId,
      sheetId: values.sheetId,
      openingTypeId: values.openingTypeId,
      x: values.x,
      y: values.y,
      measuredWidth: values.measuredWidth ?? null,
      createdBy: s.userId,
    })
    .returning({ id: tags.id });
  return row!.id;
}

/** False when no row had this id and version. */
export async function updateTagAt(s: ProjectScope, id: string, version: number, set: Partial<Omit<TagValues, "sheetId">>): Promise<boolean> {
  const rows = await db
    .update(tags)
    .set({ ...set, version: sql`${tags.version} + 1`, updatedAt: new Date() })
    .where(and(scoped(s, id), eq(tags.version, version)))
    .returning({ id: tags.id });
  return rows.length > 0;
}

export async function deleteTagAt(s: ProjectScope, id: string, version: number): Promise<boolean> {
  const rows = await db.delete(tags).where(and(scoped(s, id), eq(tags.version, version))).returning({ id: tags.id });
  return rows.length > 0;
}
