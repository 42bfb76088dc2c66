import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "../client";
import { isUniqueViolation } from "../errors";
import { unitTypes } from "../schema";
import { conflict, notFound, stale } from "@/lib/errors";
import { assertProject, type ProjectScope } from "./project-scope";

const fields = { id: unitTypes.id, name: unitTypes.name, count: unitTypes.count, version: unitTypes.version } as const;
const scoped = (s: ProjectScope, id?: string) =>
  and(eq(unitTypes.orgId, s.orgId), eq(unitTypes.projectId, s.projectId), id ? eq(unitTypes.id, id) : undefined);

const duplicateName = (error: unknown) => {
  if (isUniqueViolation(error, "unit_types_project_name_key")) {
    return conflict("This project already has a unit type with that name.", { name: "Name already used in this project." });
  }
  return error;
};

export async function listUnitTypes(s: ProjectScope) {
  await assertProject(s);
  return db.select(fields).from(unitTypes).where(scoped(s)).orderBy(asc(unitTypes.name));
}

export async function createUnitType(s: ProjectScope, input: { name: string; count: number }) {
  await assertProject(s);
  try {
    const [row] = await db.insert(unitTypes).values({ ...s, ...input }).returning(fields);
    return row!;
  } catch (error) {
    throw duplicateName(error);
  }
}

async function getUnitType(s: ProjectScope, id: string) {
  const [row] = await db.select(fields).from(unitTypes).where(scoped(s, id));
  if (!row) throw notFound("No such unit type.");
  return row;
}

/** Rename or recount; a stale version is refused (409) with the unit type as it is now, so no count is lost. */
export async function updateUnitType(s: ProjectScope, id: string, input: { version: number; name?: string; count?: number }) {
  const { version, ...set } = input;
  try {
    const [row] = await db
      .update(unitTypes)
      .set({ ...set, version: sql`${unitTypes.version} + 1` })
      .where(and(scoped(s, id), eq(unitTypes.version, version)))
      .returning(fields);
    // Deleted meanwhile answers 404 like one that never was: "gone" and "not yours" must look the same.
    if (!row) throw stale(await getUnitType(s, id));
    return row;
  } catch (error) {
    throw duplicateName(error);
  }
}

/** Sheets of a deleted unit type fall back to counting once (common areas); the FK sets them to null. */
export async function deleteUnitType(s: ProjectScope, id: string, version: number) {
  const rows = await db.delete(unitTypes).where(and(scoped(s, id), eq(unitTypes.version, version))).returning({ id: unitTypes.id });
  if (rows.length === 0) throw stale(await getUnitType(s, id));
}
