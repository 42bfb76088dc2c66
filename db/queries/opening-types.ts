import { and, asc, eq, sql } from "drizzle-orm";
import { db, type Tx } from "../client";
import { openingTypes, organisations, tags } from "../schema";
import type { TrimSpec, WallBuildUp } from "@/takeoff";
import type { OpeningKindName, OpeningShape } from "@/takeoff/job/types";
import type { ProjectScope } from "./project-scope";

const fields = {
  id: openingTypes.id,
  mark: openingTypes.mark,
  width: openingTypes.width,
  height: openingTypes.height,
  setback: openingTypes.setback,
  wallBuildUp: openingTypes.wallBuildUp,
  trimSpec: openingTypes.trimSpec,
  notes: openingTypes.notes,
  kind: openingTypes.kind,
  shape: openingTypes.shape,
  version: openingTypes.version,
} as const;

const scoped = (s: ProjectScope, id?: string) =>
  and(eq(openingTypes.orgId, s.orgId), eq(openingTypes.projectId, s.projectId), id ? eq(openingTypes.id, id) : undefined);

/** The unique constraint a second opening type with the same mark breaks. */
export const OPENING_TYPE_MARK_KEY = "opening_types_project_mark_key";

/** An opening type as stored: sizes and setback resolved, the spec complete. */
export interface OpeningTypeValues {
  mark: string;
  width: number;
  height: number;
  setback: number;
  wallBuildUp: WallBuildUp | null;
  trimSpec: TrimSpec;
  notes: string | null;
  /** What the opening is; "window" for rows made before kinds existed. */
  kind: OpeningKindName;
  /** The kind's own fields (see OpeningShape); null for a plain window. */
  shape: OpeningShape | null;
}

/** The organisation's trim defaults, or null when it has none saved. */
export async function findOrganisationTrimDefaults(orgId: string): Promise<TrimSpec | null> {
  const [org] = await db.select({ d: organisations.trimDefaults }).from(organisations).where(eq(organisations.id, orgId));
  return org?.d ?? null;
}

export async function listOpeningTypes(s: ProjectScope) {
  return db.select(fields).from(openingTypes).where(scoped(s)).orderBy(asc(openingTypes.mark));
}

export async function findOpeningType(s: ProjectScope, id: string) {
  const [row] = await db.select(fields).from(openingTypes).where(scoped(s, id));
  return row ?? null;
}

export async function insertOpeningType(s: ProjectScope, values: OpeningTypeValues) {
  const [row] = await db.insert(openingTypes).values({ orgId: s.orgId, projectId: s.projectId, ...values }).returning(fields);
  return row!;
}

/** The row after the update, or null when no row had this id and version. */
export async function updateOpeningTypeAt(s: ProjectScope, id: string, version: number, set: Partial<OpeningTypeValues>) {
  const [row] = await db
    .update(openingTypes)
    .set({ ...set, version: sql`${openingTypes.version} + 1`, updatedAt: new Date() })
    .where(and(scoped(s, id), eq(openingTypes.version, version)))
    .returning(fields);
  return row ?? null;
}

/** Tags anywhere in the organisation that use this opening type. */
export async function countTagsOfOpeningType(s: ProjectScope, id: string): Promise<number> {
  const [used] = await db.select({ n: sql<number>`count(*)::int` }).from(tags).where(and(eq(tags.orgId, s.orgId), eq(tags.openingTypeId, id)));
  return used?.n ?? 0;
}

/** Deletes the project's tags of this type; returns how many went. */
export async function deleteTagsOfOpeningType(tx: Tx, s: ProjectScope, id: string): Promise<number> {
  const removed = await tx
    .delete(tags)
    .where(and(eq(tags.orgId, s.orgId), eq(tags.projectId, s.projectId), eq(tags.openingTypeId, id)))
    .returning({ id: tags.id });
  return removed.length;
}

/** False when no row had this id and version. A tag still using the type raises the foreign-key violation. */
export async function deleteOpeningTypeAt(tx: Tx, s: ProjectScope, id: string, version: number): Promise<boolean> {
  const rows = await tx.delete(openingTypes).where(and(scoped(s, id), eq(openingTypes.version, version))).returning({ id: openingTypes.id });
  return rows.length > 0;
}
