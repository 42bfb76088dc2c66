import { UTApi } from "uploadthing/server";
import { pointAtUploadStandInUnlessConfigured } from "./config";

let api: UTApi | undefined;
function utapi() {
  pointAtUploadStandInUnlessConfigured();
  api ??= new UTApi();
  return api;
}

/** The stored bytes of a file, fetched through a short-lived signed URL (the browser never sees it). */
export async function fetchStoredFile(key: string, range?: string | null): Promise<Response> {
  const { ufsUrl } = await utapi().generateSignedURL(key, { expiresIn: 60 });
  return fetch(ufsUrl, range ? { headers: { range } } : undefined);
}

export async function deleteStoredFiles(keys: string[]) {
  if (keys.length > 0) await utapi().deleteFiles(keys);
}
