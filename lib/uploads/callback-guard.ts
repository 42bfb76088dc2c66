import { NextRequest } from "next/server";
import { attachPendingUploadKey, hasPendingUpload } from "@/db/queries/pending-uploads";
import { pointAtUploadStandInUnlessConfigured } from "./config";
import { verifyPayload } from "./payload-signature";
import { parseUploadToken } from "./token";

const refusal = (status: number, message: string) => Response.json({ error: message }, { status });

/**
 * The service's "file arrived" callback, checked before the SDK sees it: the signature must verify with our
 * key, and the file key must be one this app presigned and has not yet handled. Anything else is refused with
 * 403 and runs no code of ours. (The claim in `ingestPlanUpload` is the authoritative, once-only check.)
 */
export async function refuseUnexpectedCallback(req: NextRequest): Promise<{ refusal: Response | null; request: NextRequest }> {
  const body = await req.text();
  const request = new NextRequest(req.url, { method: "POST", headers: req.headers, body });
  pointAtUploadStandInUnlessConfigured();
  const { apiKey } = parseUploadToken(process.env.UPLOADTHING_TOKEN ?? "");
  if (!verifyPayload(body, req.headers.get("x-uploadthing-signature"), apiKey)) {
    return { refusal: refusal(403, "Invalid signature"), request };
  }
  let key: unknown;
  try {
    key = (JSON.parse(body) as { file?: { key?: unknown } }).file?.key;
  } catch {
    return { refusal: refusal(400, "Invalid JSON body"), request };
  }
  if (typeof key !== "string" || key.length > 300 || !(await hasPendingUpload(key))) {
    return { refusal: refusal(403, "No upload is pending under this file key"), request };
  }
  return { refusal: null, request };
}

/**
 * After the SDK presigned a batch, ties each generated key to the pending upload recorded by the middleware
 * (the customId the middleware gave the file). Until this is done the client has no URL to upload to.
 */
export async function recordPresignedKeys(res: Response): Promise<Response> {
  if (!res.ok) return res;
  const presigned = (await res.clone().json()) as { key: string; customId: string | null }[];
  for (const { key, customId } of presigned) {
    if (!customId || !(await attachPendingUploadKey(customId, key))) {
      return refusal(500, "The upload could not be prepared. Try again.");
    }
  }
  return res;
}
