import type { ProjectScope } from "@/db/queries/project-scope";
import { deleteTagAt, findTag, insertTag, isOpeningTypeInProject, isSheetInProject, listTags, updateTagAt } from "@/db/queries/tags";
import { invalid, orNotFound, staleOrMissing } from "@/lib/errors";
import type { TagView } from "@/lib/plans/api-types";
import type { TagCreateInput, TagUpdateInput } from "@/lib/validators/plans";
import { requireProject } from "@/lib/server/projects/require-project";

const MISSING = "No such tag.";

export async function tagsOf(s: ProjectScope, sheetId?: string): Promise<TagView[]> {
  await requireProject(s);
  return listTags(s, sheetId);
}

/** Sheet and opening type must both belong to this project; naming another's is a field error, not a leak. */
async function assertParts(s: ProjectScope, parts: { sheetId?: string; openingTypeId?: string }) {
  if (parts.sheetId && !(await isSheetInProject(s, parts.sheetId))) throw invalid({ sheetId: "No such sheet in this project." });
  if (parts.openingTypeId && !(await isOpeningTypeInProject(s, parts.openingTypeId))) {
    throw invalid({ openingTypeId: "No such opening type in this project." });
  }
}

export async function addTag(s: ProjectScope & { userId: string }, input: TagCreateInput): Promise<TagView> {
  await requireProject(s);
  await assertParts(s, input);
  const id = await insertTag(s, input);
  return orNotFound(await findTag(s, id), MISSING);
}

/** Move, retype or re-measure one tag; a stale version is refused with the tag as it is now. */
export async function editTag(s: ProjectScope, id: string, input: TagUpdateInput): Promise<TagView> {
  const { version, ...set } = input;
  await assertParts(s, { openingTypeId: set.openingTypeId });
  if (!(await updateTagAt(s, id, version, set))) staleOrMissing(await findTag(s, id), MISSING);
  return orNotFound(await findTag(s, id), MISSING);
}

export async function removeTag(s: ProjectScope, id: string, version: number) {
  if (!(await deleteTagAt(s, id, version))) staleOrMissing(await findTag(s, id), MISSING);
}
