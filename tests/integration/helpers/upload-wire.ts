import { createHash, createHmac } from "node:crypto";
import { request } from "node:http";

/** Deterministic bytes that start like a PDF, so every run uploads the same "plan sheet". */
export function pdfBytes(size: number, seed = 7): Uint8Array<ArrayBuffer> {
  const bytes = new Uint8Array(size);
  const header = Buffer.from("%PDF-1.7\n%miterwise test sheet\n", "latin1");
  let x = seed;
  for (let i = 0; i < size; i++) {
    x = (x * 1103515245 + 12345) >>> 0;
    bytes[i] = i < header.length ? (header[i] ?? 0) : x >>> 24;
  }
  return bytes;
}

export const md5 = (bytes: Uint8Array) => createHash("md5").update(bytes).digest("hex");
export const bytesOf = async (res: Response) => new Uint8Array(await res.arrayBuffer());
export const pdf = (name: string, size: number) => ({ name, size, type: "application/pdf" });

/** The request the SDK's app handler gets from the client before any upload: presigned URLs for `files`. */
type FileInfo = { name: string; size: number; type: string };

export async function presign(appUrl: string, slug: string, files: FileInfo[], input?: unknown) {
  const res = await fetch(`${appUrl}?actionType=upload&slug=${slug}`, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify({ files: files.map((f) => ({ ...f, lastModified: 0 })), input: input ?? null }),
  });
  if (!res.ok) throw new Error(`presign failed: ${res.status} ${await res.text()}`);
  return (await res.json()) as { url: string; key: string; name: string; customId: string | null }[];
}

/** A PUT the way the SDK's browser client sends one: multipart `file` part, `Range: bytes=N-`. */
export function putPart(url: string, bytes: Uint8Array, start: number) {
  const form = new FormData();
  form.append("file", new Blob([new Uint8Array(bytes)], { type: "application/pdf" }));
  return fetch(url, { method: "PUT", headers: { range: `bytes=${start}-` }, body: form });
}

/**
 * Starts a PUT for `bytes` from `start` but drops the connection after `sent` bytes of the file — a browser
 * tab closed mid-upload. It waits for the stand-in's `100 Continue`, so the stand-in has the request in hand.
 */
export function putThenDrop(url: string, bytes: Uint8Array, start: number, sent: number): Promise<void> {
  const boundary = "----miterwise-dropped-upload";
  const head = Buffer.from(
    `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="blob"\r\n` +
      "Content-Type: application/pdf\r\n\r\n",
  );
  const tail = Buffer.from(`\r\n--${boundary}--\r\n`);
  return new Promise((resolve, reject) => {
    const req = request(url, {
      method: "PUT",
      headers: {
        "content-type": `multipart/form-data; boundary=${boundary}`,
        "content-length": head.length + bytes.length + tail.length,
        range: `bytes=${start}-`,
        expect: "100-continue",
      },
    });
    req.on("error", () => resolve());
    req.on("close", () => resolve());
    req.on("response", (res) => reject(new Error(`the stand-in answered a half-sent PUT: ${res.statusCode}`)));
    req.on("continue", () => req.write(Buffer.concat([head, bytes.subarray(0, sent)]), () => req.destroy()));
  });
}

/** Signs an upload URL for `key` like the SDK does — for requests the SDK itself would never make. */
export function signUpload(base: string, key: string, apiKey: string, appId: string, file: FileInfo) {
  const url = new URL(`${base}/${key}`);
  url.searchParams.append("expires", String(Date.now() + 60_000));
  const data = {
    "x-ut-identifier": appId,
    "x-ut-file-name": file.name,
    "x-ut-file-size": file.size,
    "x-ut-file-type": file.type,
  };
  for (const [name, value] of Object.entries(data)) url.searchParams.append(name, encodeURIComponent(String(value)));
  const signature = `hmac-sha256=${createHmac("sha256", apiKey).update(url.toString()).digest("hex")}`;
  url.searchParams.append("signature", signature);
  return url.href;
}

/** GET with the path sent exactly as written (fetch would normalise `..` away before it left the process). */
export function rawGet(base: string, path: string): Promise<{ status: number; body: string }> {
  return new Promise((resolve, reject) => {
    const req = request(`${base}/`, { path }, (res) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, body: Buffer.concat(chunks).toString() }));
    });
    req.on("error", reject);
    req.end();
  });
}
