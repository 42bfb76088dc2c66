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

  try {
    const response = await fetch(registration.callbackUrl, {
      method: "POST",
      headers: {
        "Content-Type": "application/json",
        "uploadthing-hook": "callback",
        "x-uploadthing-signature": signature,
      },
      body: payload,
      signal: AbortSignal.timeout(ctx.limits.callbackTimeoutMs),
    });
    await response.body?.cancel();
    if (!response.ok) {
      ctx.log(`upload callback to ${registration.callbackUrl} answered HTTP ${response.status}`);
      ctx.registry.settle(file.key, { error: `The app refused the upload callback (HTTP ${response.status})` });
    }
  } catch (error) {
    // A timeout is the app being slow, which the result timer already answers with `serverData: null`;
    // anything else means the app could not be reached and must not look like success.
    if ((error as Error).name !== "TimeoutError") {
      ctx.log(`upload callback to ${registration.callbackUrl} failed: ${(error as Error).message}`);
      ctx.registry.settle(file.key, { error: "The app could not be reached for the upload callback" });
    }
  }
  return outcome;
}
