import { createReadStream } from "node:fs";
import type { IncomingMessage, ServerResponse } from "node:http";
import { pipeline } from "node:stream/promises";
import type { StandIn } from "./context";
import { requestOrigin, sendJson } from "./http";
import { verifySignedUrl } from "./signature";
import { isValidKey, type StoredFile } from "./storage";

/**
 * `GET|HEAD /f/{key}` and `/a/{appId}/{key}`: the stored bytes with their type and disposition, only through a
 * signed, unexpired link (`UTApi.generateSignedURL` / `getSignedURL`), as the hosted service serves an app whose
 * files are private: plan sets are confidential, and a bare key must not be enough to read one. Single byte
 * ranges are honoured because PDF viewers fetch large files piecewise.
 */
export async function serveFile(ctx: StandIn, req: IncomingMessage, res: ServerResponse, key: string) {
  const file = isValidKey(key) ? await ctx.store.get(key) : null;
  if (!file) return sendJson(res, 404, { error: "File not found" });

  const origin = requestOrigin(req, ctx.selfUrl);
  const candidates = [...new Set([origin, ctx.selfUrl])].map((base) => base + (req.url ?? ""));
  const check = verifySignedUrl(candidates, ctx.apiKey);
  if (!check.ok) return sendJson(res, 403, { error: check.reason });

  const range = byteRange(req.headers.range, file.size);
  if (range === "unsatisfiable") {
    res.writeHead(416, { "Content-Range": `bytes */${file.size}` });
    return void res.end();
  }
  const [first, last] = range ?? [0, file.size - 1];
  const headers: Record<string, string | number> = {
    "Content-Type": file.type,
    "Content-Disposition": disposition(file),
    "Content-Length": Math.max(0, last - first + 1),
    "Accept-Ranges": "bytes",
    ETag: `"${file.fileHash}"`,
    "X-Content-Type-Options": "nosniff",
    "Cache-Control": "private, max-age=0, must-revalidate",
  };
  if (range) headers["Content-Range"] = `bytes ${first}-${last}/${file.size}`;
  res.writeHead(range ? 206 : 200, headers);
  if (req.method === "HEAD" || file.size === 0) return void res.end();
  await pipeline(createReadStream(ctx.store.bytesPath(file.key), { start: first, end: last }), res).catch(() => {
    // The reader hung up mid-file; nothing to tell anyone.
  });
}

/** One `bytes=a-b` / `bytes=a-` / `bytes=-n` range; null for none (or several, which get the whole file). */
function byteRange(header: string | undefined, size: number): [number, number] | null | "unsatisfiable" {
  const match = header ? /^bytes=(\d*)-(\d*)$/.exec(header.trim()) : null;
  if (!match || (match[1] === "" && match[2] === "")) return null;
  const [from, to] = [match[1] ?? "", match[2] ?? ""];
  if (from === "") {
    const suffix = Math.min(Number(to), size);
    return suffix === 0 ? "unsatisfiable" : [size - suffix, size - 1];
  }
  const first = Number(from);
  const last = to === "" ? size - 1 : Math.min(Number(to), size - 1);
  return first >= size || last < first ? "unsatisfiable" : [first, last];
}

/** `inline; filename="…"; filename*=UTF-8''…` — an ASCII fallback plus the exact name for modern browsers. */
function disposition(file: StoredFile) {
  const ascii = file.name.replace(/[^\x20-\x7e]|["\\%]/g, "_");
  const hex = (c: string) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`;
  const exact = encodeURIComponent(file.name).replace(/['()*]/g, hex);
  return `${file.contentDisposition}; filename="${ascii}"; filename*=UTF-8''${exact}`;
}
