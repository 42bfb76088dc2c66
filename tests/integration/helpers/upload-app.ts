import { createServer, type IncomingMessage } from "node:http";
import type { AddressInfo } from "node:net";

/**
 * A tiny app for the upload stand-in tests: a plain `node:http` server mounting an UploadThing route handler
 * at /api/uploadthing, the way the real app's route does, so the stand-in can call it back over HTTP.
 * It notes every request that arrives with an `uploadthing-hook` header.
 */
export async function serveUploadApp(handler: (request: Request) => Promise<Response>) {
  const hooks: { hook: string; slug: string | null; signature: string | null }[] = [];
  const server = createServer(async (req, res) => {
    try {
      const url = new URL(req.url ?? "/", `http://${req.headers.host}`);
      const hook = req.headers["uploadthing-hook"];
      if (typeof hook === "string") {
        const signature = req.headers["x-uploadthing-signature"];
        const slug = url.searchParams.get("slug");
        hooks.push({ hook, slug, signature: typeof signature === "string" ? signature : null });
      }
      const body = req.method === "GET" || req.method === "HEAD" ? undefined : await readBody(req);
      const response = await handler(new Request(url, { method: req.method, headers: toHeaders(req), body }));
      res.writeHead(response.status, Object.fromEntries(response.headers));
      res.end(Buffer.from(await response.arrayBuffer()));
    } catch (error) {
      res.writeHead(500).end(String(error));
    }
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}/api/uploadthing`,
    hooks,
    close: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}

async function readBody(req: IncomingMessage) {
  const chunks: Buffer[] = [];
  for await (const chunk of req as AsyncIterable<Buffer>) chunks.push(chunk);
  return Buffer.concat(chunks);
}

function toHeaders(req: IncomingMessage) {
  const headers = new Headers();
  for (const [name, value] of Object.entries(req.headers)) {
    if (Array.isArray(value)) value.forEach((v) => headers.append(name, v));
    else if (value !== undefined) headers.set(name, value);
  }
  return headers;
}

/**
 * A fetch for the app's SDK that lets a test watch it: the body of every `/route-metadata` response (the dev
 * stream, read in full through a clone) and every callback the app forwards to itself.
 */
export function recordingFetch() {
  const metadataStreams: Promise<string>[] = [];
  const forwardedHooks: string[] = [];
  const fetchFn: typeof fetch = async (input, init) => {
    const url = input instanceof Request ? input.url : input.toString();
    if (new Headers(init?.headers).has("uploadthing-hook")) forwardedHooks.push(url);
    const res = await fetch(input, init);
    if (url.endsWith("/route-metadata")) metadataStreams.push(res.clone().text());
    return res;
  };
  return { fetch: fetchFn, metadataStreams, forwardedHooks };
}

type Listener = (event: Event) => void;

/**
 * The SDK's browser client PUTs file bytes with XMLHttpRequest (for upload progress), which Node lacks.
 * This is the smallest XHR that client uses — open, setRequestHeader, responseType "json", load/error events,
 * upload progress, abort — carried over fetch, so the request on the wire is a real multipart PUT.
 */
export class FetchXhr {
  status = 0;
  statusText = "";
  response: unknown = null;
  responseType = "";
  readonly upload = new EventTarget();
  private readonly events = new EventTarget();
  private readonly headers = new Headers();
  private readonly abortController = new AbortController();
  private method = "GET";
  private url = "";

  open(method: string, url: string) {
    this.method = method;
    this.url = url;
  }

  setRequestHeader(name: string, value: string) {
    this.headers.set(name, value);
  }

  addEventListener(type: string, listener: Listener) {
    this.events.addEventListener(type, listener);
  }

  abort() {
    this.abortController.abort();
  }

  send(body: FormData | null) {
    const file = body?.get("file");
    const size = file instanceof Blob ? file.size : 0;
    fetch(this.url, { method: this.method, headers: this.headers, body, signal: this.abortController.signal }).then(
      async (res) => {
        this.status = res.status;
        this.statusText = res.statusText;
        const text = await res.text();
        this.response = this.responseType === "json" ? parseOrNull(text) : text;
        this.upload.dispatchEvent(Object.assign(new Event("progress"), { loaded: size }));
        this.events.dispatchEvent(new Event("load"));
      },
      () => this.events.dispatchEvent(new Event("error")),
    );
  }
}

function parseOrNull(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}
