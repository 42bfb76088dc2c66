import { db } from "@/db/client";
import { countTagsOnSheets, deletePlanSetRow, findPlanSetFile, insertPlanSet, listPlanSets, listSheetIdsOfPlanSet, lockSheetsOfPlanSet, type InspectedPage } from "@/db/queries/plan-sets";
import type { ProjectScope } from "@/db/queries/project-scope";
import { AppError, orNotFound } from "@/lib/errors";
import type { PlanSetView } from "@/lib/plans/api-types";
import { sheetsImpact } from "@/lib/plans/removal-impact";
import { deleteStoredFiles, fetchStoredFile } from "@/lib/uploads/file-store";
import { requireProject } from "@/lib/server/projects/require-project";
import { requireConfirmed } from "./confirm-removal";
import { tallyCounts } from "./counts";

const MISSING = "No such plan set.";

export async function planSetsOf(s: ProjectScope): Promise<PlanSetView[]> {
  await requireProject(s);
  return (await listPlanSets(s)).map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}

/** The plan set and one sheet per page, in one transaction with the project check: a failure leaves neither. */
export async function addPlanSet(
  s: ProjectScope & { userId: string },
  file: { name: string; key: string; size: number; contentHash?: string },
  pages: InspectedPage[],
): Promise<string> {
  return db.transaction(async (tx) => {
    await requireProject(s, tx);
    return insertPlanSet(s, file, pages, tx);
  });
}

/**
 * The stored PDF (ranges passed through), only for a member of the owning organisation. A storage
 * failure is a 503, not a 500: the set exists, its bytes are just out of reach for now.
 */
export async function openPlanSetFile(s: ProjectScope, id: string, range: string | null) {
  const { fileKey, name } = orNotFound(await findPlanSetFile(s, id), MISSING);
  const unavailable = () => new AppError(503, "The plan file is not available right now. Try again shortly.");
  const stored = await fetchStoredFile(fileKey, range).catch((error) => {
    console.error("file store", fileKey, error);
    throw unavailable();
  });
  if (stored.status !== 416 && (!stored.ok || !stored.body)) throw unavailable();
  return { stored, name };
}

/**
 * Removes the plan set, its sheets and their tags once the person confirmed how many tags go with it,
 * then the file's bytes.
 */
export async function removePlanSet(s: ProjectScope, id: string, confirmedTags?: number): Promise<void> {
  const set = orNotFound(await findPlanSetFile(s, id), MISSING);
  const impact = sheetsImpact(await tallyCounts(s), new Set(await listSheetIdsOfPlanSet(s, id)));
  requireConfirmed(set.name, impact, confirmedTags);
  const fileKey = await db.transaction(async (tx) => {
    // Re-count inside the transaction with the set's sheets locked, so a tag placed since the person
    // was asked is never deleted unseen.
    const tagsNow = await countTagsOnSheets(tx, s, await lockSheetsOfPlanSet(tx, s, id));
    if (tagsNow !== impact.tags) requireConfirmed(set.name, { ...impact, tags: tagsNow }, confirmedTags);
    return orNotFound(await deletePlanSetRow(tx, s, id), MISSING);
  });
  // The rows are gone already; a storage hiccup leaves an orphan file, never a sheet without a file.
  await deleteStoredFiles([fileKey]).catch((error) => console.error("could not delete stored file", fileKey, error));
}
