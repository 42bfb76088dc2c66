import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startUploadStandIn, type UploadStandIn } from "@/scripts/stand-ins/upload";
import { localUploadToken, parseUploadToken } from "@/lib/uploads/token";
import { md5, pdf, pdfBytes, signUpload } from "./helpers/upload-wire";

// The stand-in reads the multipart framing of an upload PUT with busboy; a body it cannot read is the client's
// fault (4xx with a reason), and nothing of it may end up stored as a file.
const token = localUploadToken();
const { apiKey, appId } = parseUploadToken(token);
const boundary = "----miterwise-raw-body";
const multipart = `multipart/form-data; boundary=${boundary}`;

let root: string;
let standIn: UploadStandIn;

beforeAll(async () => {
  root = await mkdtemp(path.join(tmpdir(), "miterwise-multipart-"));
  standIn = await startUploadStandIn({ port: 0, dataDir: path.join(root, "data"), token });
});

afterAll(async () => {
  await standIn.close();
  await rm(root, { recursive: true, force: true });
});

const file = pdfBytes(2_000, 5);
const part = (headers: string, body: Uint8Array | string) =>
  Buffer.concat([Buffer.from(`--${boundary}\r\n${headers}\r\n\r\n`, "latin1"), Buffer.from(body), Buffer.from("\r\n")]);
const closing = Buffer.from(`--${boundary}--\r\n`);
const filePart = part('Content-Disposition: form-data; name="file"; filename="blob"\r\nContent-Type: application/pdf', file);

async function put(key: string, body: Buffer, contentType = multipart) {
  const url = signUpload(standIn.url, key, apiKey, appId, pdf(`${key}.pdf`, file.length));
  const res = await fetch(url, { method: "PUT", headers: { "content-type": contentType, range: "bytes=0-" }, body: new Uint8Array(body) });
  const received = Number((await fetch(url, { method: "HEAD" })).headers.get("x-ut-range-start"));
  return { status: res.status, body: (await res.json()) as { error?: string; fileHash?: string }, received };
}

describe("upload stand-in: multipart bodies", () => {
  it("stores the `file` part and skips the parts beside it", async () => {
    const field = part('Content-Disposition: form-data; name="note"', "a field the SDK never sends");
    const res = await put("wellFormed1", Buffer.concat([field, filePart, closing]));
    expect(res.status).toBe(200);
    expect(res.body.fileHash).toBe(md5(file));
    expect(res.received).toBe(file.length);
  });

  const malformed: [string, Buffer, string?][] = [
    ["a part header without a colon", Buffer.concat([part('Content-Disposition form-data; name="file"; filename="blob"', file), closing])],
    ["a part header name that is not a token", Buffer.concat([part('Content Disposition: form-data; name="file"; filename="b"', file), closing])],
    ["part headers that never end", Buffer.concat([Buffer.from(`--${boundary}\r\nX-Junk: ${"j".repeat(20_000)}`), closing])],
    ["a body whose delimiter is not the declared boundary", Buffer.from(filePart.toString("latin1").replaceAll(boundary, "other"), "latin1")],
    ["no `file` part at all", Buffer.concat([part('Content-Disposition: form-data; name="other"; filename="blob"', file), closing])],
    ["a `file` part without a filename", Buffer.concat([part('Content-Disposition: form-data; name="file"', "%PDF-"), closing])],
    ["garbage instead of multipart framing", Buffer.from("%PDF-1.7 raw bytes, no framing\r\n"), multipart],
  ];
  for (const [what, body, contentType] of malformed) {
    it(`refuses ${what} with 400 and stores nothing`, async () => {
      const key = `bad${what.replace(/[^a-z]/gi, "").slice(0, 24)}`;
      const res = await put(key, body, contentType);
      expect(res.status).toBe(400);
      expect(res.body.error).toMatch(/\S/);
      expect(res.received).toBe(0);
    });
  }

  it("answers 400 to a body cut off inside the file part, but keeps what arrived so the upload can resume", async () => {
    const cut = await put("cutOff1", filePart.subarray(0, 1_000));
    expect(cut.status).toBe(400);
    expect(cut.received).toBeGreaterThan(0);
    expect(cut.received).toBeLessThan(1_000);
    const rest = part('Content-Disposition: form-data; name="file"; filename="blob"', file.subarray(cut.received));
    const url = signUpload(standIn.url, "cutOff1", apiKey, appId, pdf("cutOff1.pdf", file.length));
    const done = await fetch(url, {
      method: "PUT",
      headers: { "content-type": multipart, range: `bytes=${cut.received}-` },
      body: new Uint8Array(Buffer.concat([rest, closing])),
    });
    expect(done.status).toBe(200);
    expect(((await done.json()) as { fileHash: string }).fileHash).toBe(md5(file));
  });

  it("refuses a multipart content type busboy cannot read with 415", async () => {
    for (const contentType of ["multipart/form-data", "multipart/form-data; boundary=", "text/plain"]) {
      const res = await put("badType1", Buffer.concat([filePart, closing]), contentType);
      expect(res.status, contentType).toBe(415);
      expect(res.received).toBe(0);
    }
  });
});
