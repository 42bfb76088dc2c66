import { createHash } from "node:crypto";
import { claimPendingUpload, isFileKeyInUse } from "@/db/queries/pending-uploads";
import { inspectPdf, isPdfRejected } from "@/lib/pdf/inspect";
import { deleteStoredFiles, fetchStoredFile } from "@/lib/uploads/file-store";
import type { PlanUploadResult } from "@/lib/plans/api-types";
import { addPlanSet } from "./plan-sets";

export const UNEXPECTED_UPLOAD = "This upload was not started here, or it has already been handled.";

/**
 * Runs after the bytes reached the upload service. The organisation, project and uploader come from the
 * pending upload recorded when the app presigned this key — never from the callback — and that record is
 * claimed once, so a replayed or forged callback does nothing. Then: read the bytes back, check they really
 * are a usable PDF, and save the plan set with one sheet per page in one transaction. A refused or failed
 * file is deleted from storage, unless some plan set keeps its bytes under that key.
 */
export async function ingestPlanUpload(file: { key: string; name: string; size: number }): Promise<PlanUploadResult> {
  const scope = await claimPendingUpload(file.key);
  if (!scope) return { ok: false, error: `${file.name}: ${UNEXPECTED_UPLOAD}` };
  try {
    const res = await fetchStoredFile(file.key);
    if (!res.ok) throw new Error(`upload service answered ${res.status} for ${file.key}`);
    const bytes = new Uint8Array(await res.arrayBuffer());
    const inspection = await inspectPdf(bytes);
    // The digest of the bytes as read back (not as the browser claimed), so a second upload of one file can be recognised.
    const contentHash = createHash("sha256").update(bytes).digest("hex");
    const planSetId = await addPlanSet(scope, { key: file.key, name: file.name, size: bytes.byteLength, contentHash }, inspection.pages);
    return { ok: true, planSetId, pageCount: inspection.pageCount };
  } catch (error) {
    await discardUnlessOwned(file.key);
    if (isPdfRejected(error)) return { ok: false, error: `${file.name}: ${error.message}` };
    console.error(error);
    return { ok: false, error: `${file.name}: the file could not be saved. Try again.` };
  }
}

async function discardUnlessOwned(key: string) {
  try {
    if (await isFileKeyInUse(key)) return;
    await deleteStoredFiles([key]);
  } catch (e) {
    console.error("could not delete refused upload", key, e);
  }
}
