import { and, asc, eq } from "drizzle-orm";
import { db } from "../client";
import { isUniqueViolation } from "../errors";
import { unitTypes } from "../schema";
import { conflict, notFound } from "@/lib/errors";
import { assertProject, type ProjectScope } from "./project-scope";

const fields = { id: unitTypes.id, name: unitTypes.name, count: unitTypes.count } as const;
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

export async function updateUnitType(s: ProjectScope, id: string, input: { name?: string; count?: number }) {
  try {
    const [row] = await db.update(unitTypes).set(input).where(scoped(s, id)).returning(fields);
    if (!row) throw notFound("No such unit type.");
    return row;
  } catch (error) {
    throw duplicateName(error);
  }
}

/** Sheets of a deleted unit type fall back to counting once (common areas); the FK sets them to null. */
export async function deleteUnitType(s: ProjectScope, id: string) {
  const rows = await db.delete(unitTypes).where(scoped(s, id)).returning({ id: unitTypes.id });
  if (rows.length === 0) throw notFound("No such unit type.");
}
