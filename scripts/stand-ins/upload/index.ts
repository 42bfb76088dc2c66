import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import type { AddressInfo } from "node:net";
import { parseUploadToken } from "@/lib/uploads/token";
import { handleApi } from "./api-routes";
import { limitsFrom, type StandIn, type UploadStandInOptions } from "./context";
import { serveFile } from "./file-routes";
import { pathSegments, sendJson, setCors } from "./http";
import { KeyLocks } from "./key-locks";
import { CallbackRegistry } from "./registry";
import { UploadStore } from "./storage";
import { handleUpload } from "./upload-routes";

export type { UploadStandInOptions } from "./context";

export type UploadStandIn = { url: string; close: () => Promise<void> };

/**
 * The local upload stand-in: a plain HTTP server speaking the hosted upload service's side of the SDK's
 * protocol (see /work/shared/UPLOAD-FAKE.md). Point `UPLOADTHING_INGEST_URL` and `UPLOADTHING_API_URL` at
 * `url`, and give it the app's `UPLOADTHING_TOKEN`.
 */
export async function startUploadStandIn(opts: UploadStandInOptions): Promise<UploadStandIn> {
  const { apiKey, appId } = parseUploadToken(opts.token);
  const limits = limitsFrom(opts);
  const store = new UploadStore(opts.dataDir);
  await store.init();
  const registry = new CallbackRegistry(limits.registrationTtlMs);
  const shutdown = new AbortController();
  const ctx: StandIn = {
    apiKey,
    appId,
    store,
    registry,
    locks: new KeyLocks(),
    limits,
    selfUrl: "",
    publicUrl: opts.publicUrl?.replace(/\/+$/, ""),
    log: opts.log ?? (() => {}),
    shutdown: shutdown.signal,
  };

  const server = createServer((req, res) => {
    if (opts.trace) {
      const started = performance.now();
      res.once("finish", () => ctx.log(`${req.method} ${req.url?.split("?")[0]} ${res.statusCode} ${Math.round(performance.now() - started)} ms`));
    }
    try {
      route(ctx, req, res)?.catch((error: unknown) => fail(ctx, res, error));
    } catch (error) {
      fail(ctx, res, error);
    }
  });
  // Requests wait on each other (a held PUT on the app's callback), so idle limits leave room for those waits;
  // a dev-mode metadata stream lifts the limit on its own socket.
  server.requestTimeout = limits.requestTimeoutMs;
  server.headersTimeout = Math.min(60_000, limits.requestTimeoutMs);
  server.timeout = Math.max(120_000, limits.callbackTimeoutMs + limits.registrationWaitMs + 10_000);

  const host = opts.host ?? "127.0.0.1";
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, host, () => {
      server.off("error", reject);
      resolve();
    });
  });
  const { port } = server.address() as AddressInfo;
  const shownHost = host === "0.0.0.0" || host === "::" ? "127.0.0.1" : host.includes(":") ? `[${host}]` : host;
  ctx.selfUrl = `http://${shownHost}:${port}`;

  return {
    url: ctx.selfUrl,
    close: () =>
      new Promise<void>((resolve) => {
        shutdown.abort();
        registry.close();
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}

function route(ctx: StandIn, req: IncomingMessage, res: ServerResponse): Promise<void> | void {
  setCors(req, res);
  if (req.method === "OPTIONS") {
    res.writeHead(204);
    return void res.end();
  }
  const { pathname } = new URL(req.url ?? "/", "http://stand-in");
  const segments = pathSegments(pathname);
  if (!segments) return sendJson(res, 400, { error: "Malformed path" });
  const method = req.method ?? "GET";
  const [first, second, third] = segments;

  if (method === "POST" && (pathname === "/route-metadata" || pathname === "/callback-result" || first === "v6")) {
    return handleApi(ctx, req, res, pathname);
  }
  if ((method === "GET" || method === "HEAD") && first === "f" && second !== undefined && segments.length === 2) {
    return serveFile(ctx, req, res, second);
  }
  if ((method === "GET" || method === "HEAD") && first === "a" && third !== undefined && segments.length === 3) {
    if (second !== ctx.appId) return sendJson(res, 404, { error: "File not found" });
    return serveFile(ctx, req, res, third);
  }
  if ((method === "PUT" || method === "HEAD") && first !== undefined && segments.length === 1) {
    return handleUpload(ctx, req, res, first);
  }
  sendJson(res, 404, { error: `No route for ${method} ${pathname}` });
}

function fail(ctx: StandIn, res: ServerResponse, error: unknown) {
  ctx.log(`upload stand-in error: ${error instanceof Error ? error.stack : String(error)}`);
  if (res.headersSent) return void res.destroy();
  sendJson(res, 500, { error: "Internal error" }, { Connection: "close" });
}
