import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "../client";
import { unitTypes } from "../schema";
import type { ProjectScope } from "./project-scope";

const fields = { id: unitTypes.id, name: unitTypes.name, count: unitTypes.count, version: unitTypes.version } as const;
const scoped = (s: ProjectScope, id?: string) =>
  and(eq(unitTypes.orgId, s.orgId), eq(unitTypes.projectId, s.projectId), id ? eq(unitTypes.id, id) : undefined);

/** The unique constraint a second unit type of the same name breaks. */
export const UNIT_TYPE_NAME_KEY = "unit_types_project_name_key";

export async function listUnitTypes(s: ProjectScope) {
  return db.select(fields).from(unitTypes).where(scoped(s)).orderBy(asc(unitTypes.name));
}

export async function insertUnitType(s: ProjectScope, input: { name: string; count: number }) {
  const [row] = await db.insert(unitTypes).values({ ...s, ...input }).returning(fields);
  return row!;
}

export async function findUnitType(s: ProjectScope, id: string) {
  const [row] = await db.select(fields).from(unitTypes).where(scoped(s, id));
  return row ?? null;
}

/** The row after the update, or null when no row had this id and version. */
export async function updateUnitTypeAt(s: ProjectScope, id: string, input: { version: number; name?: string; count?: number }) {
  const { version, ...set } = input;
  const [row] = await db
    .update(unitTypes)
    .set({ ...set, version: sql`${unitTypes.version} + 1` })
    .where(and(scoped(s, id), eq(unitTypes.version, version)))
    .returning(fields);
  return row ?? null;
}

/** Sheets of a deleted unit type fall back to counting once (common areas): the FK sets them to null. */
export async function deleteUnitTypeAt(s: ProjectScope, id: string, version: number): Promise<boolean> {
  const rows = await db.delete(unitTypes).where(and(scoped(s, id), eq(unitTypes.version, version))).returning({ id: unitTypes.id });
  return rows.length > 0;
}
