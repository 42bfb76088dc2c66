import type { IncomingMessage, ServerResponse } from "node:http";

/**
 * Browsers PUT straight to the stand-in from the app's origin, so every answer — errors included — must carry
 * CORS headers, and the client must be allowed to read `x-ut-range-start` (its resume point).
 */
export function setCors(req: IncomingMessage, res: ServerResponse) {
  res.setHeader("Access-Control-Allow-Origin", "*");
  res.setHeader("Access-Control-Expose-Headers", "x-ut-range-start, Content-Range, Content-Length, ETag");
  if (req.method === "OPTIONS") {
    res.setHeader("Access-Control-Allow-Methods", "GET, HEAD, PUT, POST, OPTIONS");
    const asked = req.headers["access-control-request-headers"];
    res.setHeader("Access-Control-Allow-Headers", typeof asked === "string" && asked ? asked : "*");
    res.setHeader("Access-Control-Max-Age", "600");
  }
}

export function sendJson(res: ServerResponse, status: number, body: unknown, headers: Record<string, string> = {}) {
  if (res.headersSent) return void res.end();
  const text = JSON.stringify(body);
  res.writeHead(status, {
    ...headers,
    "Content-Type": "application/json; charset=utf-8",
    "Content-Length": Buffer.byteLength(text),
  });
  res.end(text);
}

/** An error answer for a request whose body we will not read: close the connection rather than drain it. */
export function refuse(res: ServerResponse, status: number, message: string, headers: Record<string, string> = {}) {
  sendJson(res, status, { error: message }, { ...headers, Connection: "close" });
}

export class HttpError extends Error {
  constructor(
    readonly status: number,
    message: string,
  ) {
    super(message);
  }
}

/**
 * Reads a JSON body, refusing anything past `limit` bytes instead of buffering it. On overflow it stops
 * reading but leaves the socket alone, so the 413 can still be written (with `Connection: close`).
 */
export async function readJson(req: IncomingMessage, limit: number): Promise<Record<string, unknown>> {
  const declared = Number(req.headers["content-length"] ?? 0);
  if (declared > limit) throw new HttpError(413, "Request body too large");
  const raw = await new Promise<Buffer>((resolve, reject) => {
    const chunks: Buffer[] = [];
    let total = 0;
    const onData = (chunk: Buffer) => {
      total += chunk.length;
      if (total <= limit) return void chunks.push(chunk);
      req.off("data", onData);
      req.pause();
      reject(new HttpError(413, "Request body too large"));
    };
    req.on("data", onData);
    req.once("end", () => resolve(Buffer.concat(chunks)));
    req.once("error", reject);
  });
  const text = raw.toString("utf8");
  let parsed: unknown;
  try {
    parsed = text ? JSON.parse(text) : {};
  } catch {
    throw new HttpError(400, "Invalid JSON body");
  }
  if (typeof parsed !== "object" || parsed === null || Array.isArray(parsed)) {
    throw new HttpError(400, "Expected a JSON object");
  }
  return parsed as Record<string, unknown>;
}

/**
 * The origin the client used to reach the stand-in. URLs handed back (file links, the callback origin) use it,
 * so whatever name the app or browser knows the stand-in by keeps working. Odd Host values fall back.
 */
export function requestOrigin(req: IncomingMessage, fallback: string): string {
  const host = req.headers.host;
  return host && /^[A-Za-z0-9.\-[\]:]{1,255}$/.test(host) ? `http://${host}` : fallback;
}

/** The request's path segments, percent-decoded; null when the encoding is broken. */
export function pathSegments(pathname: string): string[] | null {
  try {
    return pathname.split("/").filter(Boolean).map(decodeURIComponent);
  } catch {
    return null;
  }
}
