import { isUniqueViolation } from "@/db/errors";
import type { ProjectScope } from "@/db/queries/project-scope";
import { deleteUnitTypeAt, findUnitType, insertUnitType, listUnitTypes, UNIT_TYPE_NAME_KEY, updateUnitTypeAt } from "@/db/queries/unit-types";
import { conflict, staleOrMissing } from "@/lib/errors";
import { requireProject } from "@/lib/server/projects/require-project";

const MISSING = "No such unit type.";

/** A second unit type of the same name in one project is refused on the name field. */
function duplicateName(error: unknown): unknown {
  return isUniqueViolation(error, UNIT_TYPE_NAME_KEY)
    ? conflict("This project already has a unit type with that name.", { name: "Name already used in this project." })
    : error;
}

export async function unitTypesOf(s: ProjectScope) {
  await requireProject(s);
  return listUnitTypes(s);
}

export async function addUnitType(s: ProjectScope, input: { name: string; count: number }) {
  await requireProject(s);
  return insertUnitType(s, input).catch((error) => {
    throw duplicateName(error);
  });
}

/** Rename or recount; a stale version is refused (409) with the unit type as it is now, so no count is lost. */
export async function editUnitType(s: ProjectScope, id: string, input: { version: number; name?: string; count?: number }) {
  const row = await updateUnitTypeAt(s, id, input).catch((error) => {
    throw duplicateName(error);
  });
  return row ?? staleOrMissing(await findUnitType(s, id), MISSING);
}

export async function removeUnitType(s: ProjectScope, id: string, version: number) {
  if (!(await deleteUnitTypeAt(s, id, version))) staleOrMissing(await findUnitType(s, id), MISSING);
}
