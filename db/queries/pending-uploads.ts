import { and, eq, gt, isNull, lt, sql } from "drizzle-orm";
import { db } from "../client";
import { pendingUploads, planSets } from "../schema";

/** How long a presigned upload may take to arrive; the SDK's presigned URLs last an hour. */
export const PENDING_UPLOAD_LIFETIME_MS = 2 * 60 * 60 * 1000;

export type PendingUploadScope = { orgId: string; projectId: string; userId: string };

/** Records the files a member is about to upload; returns one id per file (used as the file's customId). */
export async function recordPendingUploads(scope: PendingUploadScope, files: { name: string; size: number }[]) {
  // Old rows that never completed are of no use to anyone; clear them on the way.
  await db.delete(pendingUploads).where(lt(pendingUploads.expiresAt, sql`now() - interval '1 day'`));
  if (files.length === 0) return [];
  const expiresAt = new Date(Date.now() + PENDING_UPLOAD_LIFETIME_MS);
  const rows = await db
    .insert(pendingUploads)
    .values(files.map((f) => ({ ...scope, fileName: f.name, fileSize: f.size, expiresAt })))
    .returning({ id: pendingUploads.id });
  return rows.map((r) => r.id);
}

/** Ties the key the SDK generated to the row presigned for it; a row gets its key once. */
export async function attachPendingUploadKey(id: string, fileKey: string) {
  const rows = await db
    .update(pendingUploads)
    .set({ fileKey })
    .where(and(eq(pendingUploads.id, id), isNull(pendingUploads.fileKey)))
    .returning({ id: pendingUploads.id });
  return rows.length === 1;
}

const live = (fileKey: string) =>
  and(eq(pendingUploads.fileKey, fileKey), isNull(pendingUploads.claimedAt), gt(pendingUploads.expiresAt, sql`now()`));

/** Whether a callback for this key would be honoured (a cheap check before the SDK runs). */
export async function hasPendingUpload(fileKey: string) {
  const [row] = await db.select({ id: pendingUploads.id }).from(pendingUploads).where(live(fileKey)).limit(1);
  return row !== undefined;
}

/**
 * Claims the pending upload for a finished file, once: a second callback for the same key (a replay) finds
 * nothing. The scope returned is the one recorded at presign time.
 */
export async function claimPendingUpload(fileKey: string): Promise<PendingUploadScope | null> {
  const [row] = await db
    .update(pendingUploads)
    .set({ claimedAt: sql`now()` })
    .where(live(fileKey))
    .returning({ orgId: pendingUploads.orgId, projectId: pendingUploads.projectId, userId: pendingUploads.userId });
  return row ?? null;
}

/** True when a plan set keeps its bytes under this key; such a file must never be deleted on someone's failure. */
export async function isFileKeyInUse(fileKey: string) {
  const [row] = await db.select({ id: planSets.id }).from(planSets).where(eq(planSets.fileKey, fileKey)).limit(1);
  return row !== undefined;
}
