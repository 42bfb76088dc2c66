import { createHash } from "node:crypto";
import { createPlanSet } from "@/db/queries/plan-sets";
import type { ProjectScope } from "@/db/queries/project-scope";
import { inspectPdf, isPdfRejected } from "@/lib/pdf/inspect";
import { deleteStoredFiles, fetchStoredFile } from "@/lib/uploads/file-store";
import type { PlanUploadResult } from "./api-types";

/**
 * Runs after the bytes reached the upload service: read them back, check they really are a usable PDF,
 * then save the plan set and one sheet per page in one transaction. Anything refused or failed is
 * deleted from storage, so no file stays behind that is not a sheet.
 */
export async function ingestPlanUpload(
  scope: ProjectScope & { userId: string },
  file: { key: string; name: string; size: number },
): Promise<PlanUploadResult> {
  try {
    const res = await fetchStoredFile(file.key);
    if (!res.ok) throw new Error(`upload service answered ${res.status} for ${file.key}`);
    const bytes = new Uint8Array(await res.arrayBuffer());
    const inspection = await inspectPdf(bytes);
    // The digest of the bytes as read back (not as the browser claimed), so a second upload of one file can be recognised.
    const contentHash = createHash("sha256").update(bytes).digest("hex");
    const planSetId = await createPlanSet(scope, { key: file.key, name: file.name, size: bytes.byteLength, contentHash }, inspection.pages);
    return { ok: true, planSetId, pageCount: inspection.pageCount };
  } catch (error) {
    await deleteStoredFiles([file.key]).catch((e) => console.error("could not delete refused upload", file.key, e));
    if (isPdfRejected(error)) return { ok: false, error: `${file.name}: ${error.message}` };
    console.error(error);
    return { ok: false, error: `${file.name}: the file could not be saved. Try again.` };
  }
}
