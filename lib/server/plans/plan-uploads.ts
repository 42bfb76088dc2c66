import { recordPendingUploads, type PendingUploadScope } from "@/db/queries/pending-uploads";
import { AppError } from "@/lib/errors";
import { DEFAULT_PDF_LIMITS } from "@/lib/pdf/inspect";
import { requireProject } from "@/lib/server/projects/require-project";

/**
 * Before the upload service presigns anything: the project must be the organisation's (404) and no file
 * over our own 200 MB limit (413). Who uploads what, where, is then kept on our side — the callback is
 * not trusted to say — and the ids returned become the files' customIds.
 */
export async function preparePlanUploads(scope: PendingUploadScope, files: { name: string; size: number }[]): Promise<string[]> {
  await requireProject(scope);
  const tooBig = files.find((file) => file.size > DEFAULT_PDF_LIMITS.maxBytes);
  if (tooBig) throw new AppError(413, `${tooBig.name} is larger than the 200 MB limit. Split the set and upload each part.`);
  return recordPendingUploads(scope, files);
}
