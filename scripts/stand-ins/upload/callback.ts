import { fileUrls, type StandIn } from "./context";
import type { CallbackOutcome, DevStream, Registration } from "./registry";
import { signPayload } from "./signature";
import type { StoredFile } from "./storage";

/**
 * Tells the app a file has arrived, the two ways the SDK supports, and returns what the app answered:
 * - production: POST the signed payload to the app's route handler (`uploadthing-hook: callback`); the app runs
 *   `onUploadComplete` and posts the result to `/callback-result` — usually before our POST even returns.
 * - dev: the same signed payload goes out as a line on the app's open `/route-metadata` stream and the app
 *   forwards it to itself, because a dev machine is usually not reachable from the service.
 * With `awaitServerData` the caller holds the client's PUT on the returned promise.
 */
export async function runCallback(
  ctx: StandIn,
  target: { registration: Registration; stream: DevStream | null },
  file: StoredFile,
  filesBase: string,
): Promise<CallbackOutcome> {
  const { registration, stream } = target;
  const payload = JSON.stringify({
    status: "uploaded",
    metadata: registration.metadata ?? {},
    file: {
      name: file.name,
      size: file.size,
      type: file.type,
      customId: file.customId,
      key: file.key,
      ...fileUrls(filesBase, ctx.appId, file.key),
      fileHash: file.fileHash,
    },
    origin: registration.origin,
  });
  const signature = signPayload(payload, ctx.apiKey);
  const outcome = ctx.registry.expectResult(file.key, ctx.limits.callbackTimeoutMs);

  if (registration.isDev) {
    if (!stream || !ctx.registry.sendDevLine(stream, file.key, { payload, signature, hook: "callback" })) {
      ctx.registry.settle(file.key, { error: "The app's route-metadata stream is gone; onUploadComplete did not run" });
    }
    return outcome;
  }

  // Delivery runs beside the wait rather than before it: the app answers our POST only once its
  // `onUploadComplete` is done, and the client's PUT must be answered by the result timer even if that is slow.
  void postCallback(ctx, registration.callbackUrl, payload, signature).then((failure) => {
    if (failure) ctx.registry.settle(file.key, { error: failure });
  });
  return outcome;
}

/** POSTs the signed callback to the app; resolves why the app could not take it, or null. */
async function postCallback(ctx: StandIn, url: string, payload: string, signature: string): Promise<string | null> {
  try {
    const response = await fetch(url, {
      method: "POST",
      headers: {
        "content-type": "application/json",
        "uploadthing-hook": "callback",
        "x-uploadthing-signature": signature,
      },
      body: payload,
      signal: AbortSignal.any([AbortSignal.timeout(ctx.limits.callbackDeliveryMs), ctx.shutdown]),
    });
    await response.body?.cancel();
    if (response.ok) return null;
    ctx.log(`upload callback to ${url} answered HTTP ${response.status}`);
    return `The app refused the upload callback (HTTP ${response.status})`;
  } catch (error) {
    // A slow app is what the result timer is for, and shutdown is no one's fault; anything else means the
    // app could not be reached, which must not look like success.
    const name = (error as Error).name;
    if (name === "TimeoutError" || name === "AbortError") return null;
    ctx.log(`upload callback to ${url} failed: ${(error as Error).message}`);
    return "The app could not be reached for the upload callback";
  }
}
