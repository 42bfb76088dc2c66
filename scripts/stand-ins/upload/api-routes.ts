import type { IncomingMessage, ServerResponse } from "node:http";
import { fileUrls, type StandIn } from "./context";
import { HttpError, readJson, requestOrigin, sendJson } from "./http";
import { safeEqual, signUrl } from "./signature";
import { isValidKey, type StoredFile } from "./storage";

/**
 * The calls the app's server makes with its api key: `/route-metadata` (before uploads), `/callback-result`
 * (after `onUploadComplete`) and the `UTApi` endpoints under `/v6/`.
 */
export async function handleApi(ctx: StandIn, req: IncomingMessage, res: ServerResponse, pathname: string) {
  const key = req.headers["x-uploadthing-api-key"];
  if (typeof key !== "string" || !safeEqual(key, ctx.apiKey)) {
    return sendJson(res, 401, { error: "Invalid or missing API key" }, { Connection: "close" });
  }
  try {
    const body = await readJson(req, ctx.limits.maxJsonBytes);
    if (pathname === "/route-metadata") return registerRoute(ctx, req, res, body);
    if (pathname === "/callback-result") return callbackResult(ctx, res, body);
    const name = pathname.slice("/v6/".length);
    const endpoint = pathname.startsWith("/v6/") && Object.hasOwn(V6, name) ? V6[name] : undefined;
    if (!endpoint) return sendJson(res, 404, { error: `Unknown endpoint ${pathname}` });
    sendJson(res, 200, await endpoint(ctx, body, ctx.publicUrl ?? requestOrigin(req, ctx.selfUrl)));
  } catch (error) {
    if (!(error instanceof HttpError)) throw error;
    sendJson(res, error.status, { error: error.message }, error.status === 413 ? { Connection: "close" } : {});
  }
}

/**
 * Production mode answers at once. Dev mode keeps the response open as a JSON-lines stream: the signed
 * callback for each key is written on it as its upload finishes, and it ends after the batch's last key.
 */
function registerRoute(ctx: StandIn, req: IncomingMessage, res: ServerResponse, body: Record<string, unknown>) {
  const { fileKeys, metadata, isDev, callbackUrl, callbackSlug, awaitServerData } = body;
  if (!Array.isArray(fileKeys) || !fileKeys.every((k) => typeof k === "string" && isValidKey(k))) {
    throw new HttpError(400, "fileKeys must be a list of file keys");
  }
  if (typeof callbackUrl !== "string" || typeof callbackSlug !== "string") {
    throw new HttpError(400, "callbackUrl and callbackSlug are required");
  }
  let target: URL;
  try {
    target = new URL(callbackUrl);
  } catch {
    throw new HttpError(400, "callbackUrl is not a URL");
  }
  if (!["http:", "https:"].includes(target.protocol)) throw new HttpError(400, "callbackUrl must be http(s)");
  // The SDK keeps `slug` apart from the URL it sends, so the URL arrives without it.
  if (!target.searchParams.has("slug")) target.searchParams.set("slug", callbackSlug);
  const registration = {
    metadata: metadata ?? {},
    isDev: isDev === true,
    callbackUrl: target.href,
    awaitServerData: awaitServerData !== false,
    origin: requestOrigin(req, ctx.selfUrl),
  };
  if (!registration.isDev) {
    ctx.registry.register(fileKeys as string[], registration);
    return sendJson(res, 200, { ok: true });
  }
  // The stream may idle for as long as the uploads take; the registration's lifetime bounds it instead.
  req.socket.setTimeout(0);
  res.writeHead(200, { "Content-Type": "application/x-ndjson; charset=utf-8", "Cache-Control": "no-store" });
  res.flushHeaders();
  ctx.registry.register(fileKeys as string[], registration, res);
}

function callbackResult(ctx: StandIn, res: ServerResponse, body: Record<string, unknown>) {
  const { fileKey, callbackData, error } = body;
  if (typeof fileKey !== "string") throw new HttpError(400, "fileKey is required");
  ctx.registry.settle(fileKey, typeof error === "string" ? { error } : { serverData: callbackData ?? null });
  sendJson(res, 200, { ok: true });
}

type Endpoint = (ctx: StandIn, body: Record<string, unknown>, base: string) => Promise<unknown>;

/** The `UTApi` calls; files are named by `fileKeys` or `customIds`, as the SDK sends them. */
const V6: Record<string, Endpoint> = {
  async deleteFiles(ctx, body) {
    const files = await ctx.store.resolve(body);
    const removed = await Promise.all(files.map((f) => ctx.store.remove(f.key)));
    return { success: true, deletedCount: removed.filter(Boolean).length };
  },
  async listFiles(ctx, body) {
    const limit = clamp(body.limit, 1, 1000, 500);
    const offset = clamp(body.offset, 0, Number.MAX_SAFE_INTEGER, 0);
    const all = await ctx.store.list();
    const page = all.slice(offset, offset + limit).map((f) => ({
      id: f.key,
      customId: f.customId,
      key: f.key,
      name: f.name,
      size: f.size,
      status: "Uploaded",
      uploadedAt: f.uploadedAt,
    }));
    return { hasMore: offset + limit < all.length, files: page };
  },
  async getFileUrl(ctx, body, base) {
    const files = await ctx.store.resolve(body);
    return { data: files.map((f) => ({ key: f.key, url: fileUrls(base, ctx.appId, f.key).ufsUrl })) };
  },
  async requestFileAccess(ctx, body, base) {
    const file = await one(ctx, { fileKeys: [body.fileKey], customIds: body.customId ? [body.customId] : undefined });
    const ttl = clamp(body.expiresIn, 1, 7 * 86_400, 3_600);
    const urls = fileUrls(base, ctx.appId, file.key);
    return { url: signUrl(urls.url, ctx.apiKey, ttl), ufsUrl: signUrl(urls.ufsUrl, ctx.apiKey, ttl) };
  },
  async renameFiles(ctx, body) {
    for (const u of updates(body)) {
      if (typeof u.newName !== "string" || !u.newName) throw new HttpError(400, "newName is required");
      await ctx.store.update((await one(ctx, idsOf(u))).key, { name: u.newName });
    }
    return { success: true };
  },
  async updateACL(ctx, body) {
    for (const u of updates(body)) {
      if (u.acl !== "public-read" && u.acl !== "private") throw new HttpError(400, "acl: public-read or private");
      await ctx.store.update((await one(ctx, idsOf(u))).key, { acl: u.acl });
    }
    return { success: true };
  },
  async getUsageInfo(ctx, _body) {
    const files = await ctx.store.list();
    const totalBytes = files.reduce((sum, f) => sum + f.size, 0);
    return { totalBytes, appTotalBytes: totalBytes, filesUploaded: files.length, limitBytes: 2 * 1024 ** 3 };
  },
};

async function one(ctx: StandIn, ids: { fileKeys?: unknown; customIds?: unknown }): Promise<StoredFile> {
  const [file] = await ctx.store.resolve(ids);
  if (!file) throw new HttpError(404, "File not found");
  return file;
}

function updates(body: Record<string, unknown>): Record<string, unknown>[] {
  const list = body.updates;
  if (!Array.isArray(list) || list.length > 1000) throw new HttpError(400, "updates must be a list");
  return list.filter((u): u is Record<string, unknown> => typeof u === "object" && u !== null);
}

function idsOf(update: Record<string, unknown>) {
  return update.customId ? { customIds: [update.customId] } : { fileKeys: [update.fileKey] };
}

function clamp(value: unknown, min: number, max: number, fallback: number) {
  const n = typeof value === "number" && Number.isFinite(value) ? Math.floor(value) : fallback;
  return Math.min(max, Math.max(min, n));
}
