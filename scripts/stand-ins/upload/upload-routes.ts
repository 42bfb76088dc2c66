import type { IncomingMessage, ServerResponse } from "node:http";
import { Transform } from "node:stream";
import { pipeline } from "node:stream/promises";
import { runCallback } from "./callback";
import { fileUrls, type StandIn } from "./context";
import { refuse, requestOrigin, sendJson } from "./http";
import { resolveContentType } from "./mime";
import { FilePartExtractor, MultipartError, multipartBoundary } from "./multipart";
import { readSignedUpload, verifySignedUrl, type SignedUpload } from "./signature";
import { isValidKey, type StoredFile } from "./storage";

/** Multipart framing around the file bytes is small; more than this beside the file is not an upload. */
const MULTIPART_OVERHEAD = 64 * 1024;

type Put = { upload: SignedUpload; start: number; extractor: FilePartExtractor; base: string };

/**
 * `HEAD|PUT /{key}?<signed query>`: the client asks how much has arrived, then sends the rest.
 * Everything up to taking the key lock and starting to read the body happens synchronously on arrival: a HEAD
 * arriving later must find this PUT in flight, and bytes must be read off the socket at once so that a client
 * dropping the connection still leaves what it sent on disk.
 */
export function handleUpload(ctx: StandIn, req: IncomingMessage, res: ServerResponse, key: string) {
  const origin = requestOrigin(req, ctx.selfUrl);
  const candidates = [...new Set([origin, ctx.selfUrl])].map((base) => base + (req.url ?? ""));
  const check = verifySignedUrl(candidates, ctx.apiKey);
  if (!check.ok) return refuse(res, 403, check.reason);
  if (!isValidKey(key)) return refuse(res, 400, "Invalid file key");
  const upload = readSignedUpload(key, check.query);
  if (!upload) return refuse(res, 400, "The upload URL lacks file details");
  if (upload.appId !== ctx.appId) return refuse(res, 403, "The upload URL is for another app");
  if (upload.size > ctx.limits.maxFileBytes) return refuse(res, 413, "File too large");
  if (req.method === "HEAD") return void reportProgress(ctx, res, key);

  const start = rangeStart(req.headers.range);
  if (start === null || start > upload.size) return refuse(res, 416, "Expected Range: bytes=N- within the file");
  const contentType = req.headers["content-type"];
  if (!contentType || !multipartBoundary(contentType)) return refuse(res, 415, "Expected a multipart/form-data body with a `file` part");
  const maxBody = upload.size - start + MULTIPART_OVERHEAD;
  if (Number(req.headers["content-length"] ?? 0) > maxBody) return refuse(res, 413, "Body larger than the file");

  let extractor: FilePartExtractor;
  try {
    extractor = new FilePartExtractor(contentType, maxBody);
  } catch (error) {
    return refuse(res, 415, (error as Error).message);
  }
  extractor.on("error", () => {}); // reported through the pipeline below
  req.on("error", () => {});
  req.on("close", () => {
    // A dropped connection ends the extraction early, so what was read still reaches the disk.
    if (!req.complete && !extractor.destroyed && !extractor.writableEnded) {
      req.unpipe(extractor);
      extractor.end();
    }
  });
  req.pipe(extractor);
  const put: Put = { upload, start, extractor, base: ctx.publicUrl ?? origin };
  void ctx.locks
    .run(key, req, () => receive(ctx, req, res, put))
    .then((stored) => stored && answer(ctx, res, put, stored))
    .catch((error: unknown) => {
      ctx.log(`upload of ${key} failed: ${(error as Error).message}`);
      refuse(res, 500, "The upload could not be stored");
    });
}

async function reportProgress(ctx: StandIn, res: ServerResponse, key: string) {
  await ctx.locks.idle(key, ctx.limits.headWaitMs);
  const done = await ctx.store.get(key);
  const received = done ? done.size : await ctx.store.partialSize(key);
  res.writeHead(200, { "x-ut-range-start": String(received) });
  res.end();
}

/** Writes the bytes; resolves the stored file once the last one is in, or null when it has already answered. */
async function receive(ctx: StandIn, req: IncomingMessage, res: ServerResponse, put: Put) {
  const { upload, start, extractor } = put;
  const abandon = (status: number, body: Record<string, unknown>, headers: Record<string, string> = {}) => {
    req.unpipe(extractor);
    extractor.destroy();
    // A client still sending may miss an answer if the socket closes under it; a declared length was already
    // checked against the limits, so read the rest away. An undeclared one could go on forever: hang up.
    const bounded = req.headers["content-length"] !== undefined;
    if (bounded) req.resume();
    sendJson(res, status, body, bounded ? headers : { ...headers, Connection: "close" });
    return null;
  };
  const done = await ctx.store.get(upload.key);
  if (done) {
    // An earlier answer was lost on the way; the file is here, so say so again (the app has been told already).
    return abandon(200, { ...fileUrls(put.base, ctx.appId, done.key), fileHash: done.fileHash, serverData: null });
  }
  const have = await ctx.store.partialSize(upload.key);
  if (start > have) {
    const error = `Cannot resume at byte ${start}: ${have} received`;
    return abandon(416, { error, rangeStart: have }, { "x-ut-range-start": String(have) });
  }

  let received = start;
  const counter = new Transform({
    transform(chunk: Buffer, _encoding, callback) {
      received += chunk.length;
      if (received > upload.size) callback(new MultipartError("More bytes than the signed file size", 413));
      else callback(null, chunk);
    },
  });
  try {
    await pipeline(extractor, counter, await ctx.store.openPartial(upload.key, start));
  } catch (error) {
    const status = error instanceof MultipartError ? error.status : 400;
    return abandon(status, { error: `Upload refused: ${(error as Error).message}` });
  }
  if (!req.complete) return null; // the client went away; what arrived is kept for a resume
  if (!extractor.complete) return abandon(400, { error: "The body has no complete `file` part" });
  if (received < upload.size) {
    const error = `Upload incomplete: ${received} of ${upload.size} bytes`;
    sendJson(res, 409, { error, rangeStart: received }, { "x-ut-range-start": String(received) });
    return null;
  }
  return ctx.store.finalize({
    key: upload.key,
    name: upload.name,
    type: resolveContentType(upload.type, upload.name),
    size: upload.size,
    customId: upload.customId,
    contentDisposition: upload.contentDisposition === "attachment" ? "attachment" : "inline",
    acl: upload.acl,
  });
}

/** Runs the app's callback if the upload came from a file route, then answers the client's PUT. */
async function answer(ctx: StandIn, res: ServerResponse, put: Put, file: StoredFile) {
  const body = { ...fileUrls(put.base, ctx.appId, file.key), fileHash: file.fileHash };
  // Uploads made server-side with UTApi carry no slug: no route, no registration, no callback.
  const target = put.upload.slug ? await ctx.registry.take(file.key, ctx.limits.registrationWaitMs) : null;
  if (!target) return sendJson(res, 200, { ...body, serverData: null });
  if (!target.registration.awaitServerData) {
    sendJson(res, 200, { ...body, serverData: null });
    await runCallback(ctx, target, file, put.base);
    return;
  }
  const outcome = await runCallback(ctx, target, file, put.base);
  if ("error" in outcome) sendJson(res, 502, { ...body, error: outcome.error });
  else sendJson(res, 200, { ...body, serverData: outcome.serverData ?? null });
}

/** `bytes=N-` → N; no header means from the start; anything else is not something the SDK sends. */
function rangeStart(header: string | undefined): number | null {
  if (header === undefined) return 0;
  const match = /^bytes=(\d{1,15})-$/.exec(header.trim());
  return match?.[1] === undefined ? null : Number(match[1]);
}
