import { createHmac } from "node:crypto";
import { existsSync } from "node:fs";
import { mkdtemp, readFile, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { createRouteHandler, UTApi, UTFile } from "uploadthing/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { startUploadStandIn, type UploadStandIn } from "@/scripts/stand-ins/upload";
import { signUrl } from "@/scripts/stand-ins/upload/signature";
import { encodeUploadToken, localUploadToken, parseUploadToken } from "@/lib/uploads/token";
import { FetchXhr, recordingFetch, serveUploadApp } from "./helpers/upload-app";
import { sdkConfig, seen, sheet, testRouter as router, uploader, utapiFor } from "./helpers/upload-sdk";
import { bytesOf, md5, pdf, pdfBytes, presign, putPart, putThenDrop, rawGet, signUpload } from "./helpers/upload-wire";

const token = localUploadToken();
const { apiKey, appId } = parseUploadToken(localUploadToken());
/** Files are served through signed, expiring links only; this signs one the way `generateSignedURL` does. */
const signedLink = (url: string) => signUrl(url, apiKey, 60);

let root: string;
let dataDir: string;
let standIn: UploadStandIn;
let app: Awaited<ReturnType<typeof serveUploadApp>>;
const closers: (() => Promise<void>)[] = [];

const utapi = () => utapiFor(standIn.url);

beforeAll(async () => {
  // The SDK's browser client PUTs with XMLHttpRequest; Node has none, so it gets one carried over fetch.
  Object.assign(globalThis, { XMLHttpRequest: FetchXhr });
  root = await mkdtemp(path.join(tmpdir(), "miterwise-uploads-"));
  dataDir = path.join(root, "data");
  standIn = await startUploadStandIn({ port: 0, dataDir, token });
  app = await serveUploadApp(createRouteHandler({ router, config: sdkConfig(standIn.url) }));
  closers.push(app.close, standIn.close);
});

afterAll(async () => {
  for (const close of closers.reverse()) await close();
  Reflect.deleteProperty(globalThis, "XMLHttpRequest");
  await rm(root, { recursive: true, force: true });
});

describe("upload stand-in", () => {
  it("refuses tampered or expired upload URLs and a wrong api key", async () => {
    const [good] = await presign(app.url, "planPdf", [pdf("a.pdf", 10)], { projectId: "p1" });
    expect((await fetch(good!.url, { method: "HEAD" })).status).toBe(200);

    const tampered = [
      good!.url.replace("x-ut-file-size=10", "x-ut-file-size=11"),
      good!.url.replace(good!.key, `${good!.key.slice(0, -1)}${good!.key.endsWith("a") ? "b" : "a"}`),
      good!.url.replace(/hmac-sha256%3D(.)/, (_, c: string) => `hmac-sha256%3D${c === "0" ? "1" : "0"}`),
    ];
    for (const url of tampered) {
      expect(url).not.toBe(good!.url);
      expect((await fetch(url, { method: "HEAD" })).status).toBe(403);
      expect((await putPart(url, pdfBytes(10), 0)).status).toBe(403);
    }
    const [expired] = await presign(app.url, "expiredPdf", [pdf("b.pdf", 10)]);
    const refused = await putPart(expired!.url, pdfBytes(10), 0);
    expect(refused.status).toBe(403);
    expect(await refused.json()).toEqual({ error: "The URL has expired" });
    expect(existsSync(path.join(dataDir, "files", good!.key))).toBe(false);

    const wrongToken = encodeUploadToken({ appId, apiKey: "sk_not_the_key", regions: ["local1"] });
    await expect(new UTApi({ token: wrongToken, apiUrl: standIn.url, logLevel: "None" }).listFiles()).rejects.toThrow();
    for (const endpoint of ["/v6/deleteFiles", "/v6/listFiles", "/route-metadata", "/callback-result"]) {
      const headers = { "x-uploadthing-api-key": "sk_not_the_key" };
      const res = await fetch(standIn.url + endpoint, { method: "POST", headers, body: "{}" });
      expect(res.status).toBe(401);
    }
    expect((await utapi().listFiles()).files.every((file) => file.key !== good!.key)).toBe(true);
  });

  it("resumes an upload from the point HEAD reports, after a short body and after a dropped connection", async () => {
    const bytes = pdfBytes(300_000, 11);
    const [target] = await presign(app.url, "planPdf", [pdf("resume.pdf", bytes.length)], { projectId: "p2" });
    const resumePoint = async () =>
      Number((await fetch(target!.url, { method: "HEAD" })).headers.get("x-ut-range-start"));
    expect(await resumePoint()).toBe(0);

    const short = await putPart(target!.url, bytes.subarray(0, 100_000), 0);
    expect(short.status).toBe(409);
    expect(short.headers.get("x-ut-range-start")).toBe("100000");
    expect(await resumePoint()).toBe(100_000);
    expect((await putPart(target!.url, bytes.subarray(150_000), 150_000)).status).toBe(416);

    await putThenDrop(target!.url, bytes.subarray(100_000), 100_000, 60_000);
    const afterDrop = await resumePoint();
    expect(afterDrop).toBeGreaterThan(100_000);
    expect(afterDrop).toBeLessThanOrEqual(160_000);

    const done = await putPart(target!.url, bytes.subarray(afterDrop), afterDrop);
    expect(done.status).toBe(200);
    const body = (await done.json()) as { ufsUrl: string; fileHash: string; serverData: unknown };
    expect(body.serverData).toEqual({ sheetKey: target!.key, projectId: "p2" });
    expect(body.fileHash).toBe(md5(bytes));
    expect(await resumePoint()).toBe(bytes.length);
    expect(md5(await bytesOf(await fetch(signedLink(body.ufsUrl))))).toBe(md5(bytes));

    const part = await fetch(signedLink(body.ufsUrl), { headers: { range: "bytes=1000-1009" } });
    expect(part.status).toBe(206);
    expect(part.headers.get("content-range")).toBe(`bytes 1000-1009/${bytes.length}`);
    expect(await bytesOf(part)).toEqual(bytes.subarray(1000, 1010));
  });

  it("production mode: the SDK client uploads, the app's onUploadComplete runs, its data comes back", async () => {
    const file = sheet("Sheet A-101 (1st floor).pdf", 120_000, 3);
    const [expected, hooksBefore] = [pdfBytes(120_000, 3), app.hooks.length];
    const [uploaded] = await uploader(app.url).uploadFiles("planPdf", { files: [file], input: { projectId: "p3" } });
    expect(uploaded!.serverData).toEqual({ sheetKey: uploaded!.key, projectId: "p3" });
    expect(uploaded!.customId).toBe("plan-p3-Sheet A-101 (1st floor).pdf");
    expect(uploaded!.fileHash).toBe(md5(expected));

    const hook = seen.completed.find((c) => c.file.key === uploaded!.key);
    expect(hook?.metadata.projectId).toBe("p3");
    expect(hook?.file).toMatchObject({ name: file.name, type: "application/pdf", fileHash: md5(expected) });
    // The stand-in called the app's handler itself, signed, with the slug added to the callback URL.
    const signature = expect.stringMatching(/^hmac-sha256=[0-9a-f]{64}$/);
    expect(app.hooks.slice(hooksBefore)).toEqual([{ hook: "callback", slug: "planPdf", signature }]);

    const served = await fetch(signedLink(uploaded!.ufsUrl));
    expect(served.status).toBe(200);
    expect(served.headers.get("content-type")).toBe("application/pdf");
    expect(served.headers.get("content-disposition")).toContain("inline;");
    expect(md5(await bytesOf(served))).toBe(md5(expected));

    const sidecar = JSON.parse(await readFile(path.join(dataDir, "files", `${uploaded!.key}.json`), "utf8"));
    expect(sidecar).toMatchObject({
      name: file.name,
      type: "application/pdf",
      size: 120_000,
      customId: uploaded!.customId,
      fileHash: md5(expected),
    });

    // A second stand-in on the same folder serves the file: nothing lives only in memory.
    const restarted = await startUploadStandIn({ port: 0, dataDir, token });
    const again = await bytesOf(await fetch(signedLink(`${restarted.url}/a/${appId}/${uploaded!.key}`)));
    await restarted.close();
    expect(md5(again)).toBe(md5(expected));

    const signed = await utapi().generateSignedURL(uploaded!.key, { expiresIn: 60 });
    expect((await fetch(signed.ufsUrl)).status).toBe(200);
    const extended = signed.ufsUrl.replace(/expires=(\d+)/, (_, ms: string) => `expires=${Number(ms) + 60_000}`);
    expect((await fetch(extended)).status).toBe(403);

    expect((await utapi().listFiles()).files.map((x) => x.key)).toContain(uploaded!.key);
    expect(await utapi().deleteFiles(uploaded!.key)).toMatchObject({ success: true, deletedCount: 1 });
    expect(existsSync(path.join(dataDir, "files", uploaded!.key))).toBe(false);
    expect(existsSync(path.join(dataDir, "files", `${uploaded!.key}.json`))).toBe(false);
    expect((await fetch(uploaded!.ufsUrl)).status).toBe(404);
  });

  it("dev mode: the signed callback travels as a line on the route-metadata stream", async () => {
    const watch = recordingFetch();
    const config = { ...sdkConfig(standIn.url), isDev: true, fetch: watch.fetch };
    const devApp = await serveUploadApp(createRouteHandler({ router, config }));
    closers.push(devApp.close);

    const files = [sheet("dev.pdf", 5_000)];
    const [uploaded] = await uploader(devApp.url).uploadFiles("planPdf", { files, input: { projectId: "p4" } });
    expect(uploaded!.serverData).toEqual({ sheetKey: uploaded!.key, projectId: "p4" });

    expect(watch.metadataStreams).toHaveLength(1);
    const text = await watch.metadataStreams[0]!;
    type Line = { payload: string; signature: string; hook: string };
    const lines = text.trim().split("\n").map((l) => JSON.parse(l) as Line);
    expect(lines).toHaveLength(1);
    const [line] = lines;
    expect(line!.hook).toBe("callback");
    expect(line!.signature).toBe(`hmac-sha256=${createHmac("sha256", apiKey).update(line!.payload).digest("hex")}`);
    expect(JSON.parse(line!.payload)).toMatchObject({
      status: "uploaded",
      metadata: { projectId: "p4" },
      file: { key: uploaded!.key, name: "dev.pdf", type: "application/pdf" },
    });
    // Every callback the dev app received was one it forwarded itself: the stand-in never called it.
    expect(watch.forwardedHooks).toHaveLength(1);
    expect(devApp.hooks).toHaveLength(1);
    expect(devApp.hooks[0]!.signature).toBe(line!.signature);
  });

  it("answers serverData null when the app never posts its callback result", async () => {
    const quick = await startUploadStandIn({ port: 0, dataDir: path.join(root, "q"), token, callbackTimeoutMs: 300 });
    const config = { ...sdkConfig(quick.url), logLevel: "None" as const };
    const quickApp = await serveUploadApp(createRouteHandler({ router, config }));
    closers.push(quick.close, quickApp.close);
    const before = seen.brokenCalls;
    const [uploaded] = await uploader(quickApp.url).uploadFiles("brokenPdf", { files: [sheet("broken.pdf", 2_000)] });
    expect(uploaded!.serverData).toBeNull();
    // The app did get the callback; its onUploadComplete threw, so no result was ever posted.
    await vi.waitFor(() => expect(seen.brokenCalls).toBe(before + 1));
    expect((await fetch(signedLink(uploaded!.ufsUrl))).status).toBe(200);
  });

  it("serves UTApi: server-side upload, URLs, rename, private files behind signed links, usage, delete", async () => {
    const api = utapi();
    const bytes = pdfBytes(3_000, 5);
    const { data, error } = await api.uploadFiles(new UTFile([bytes], "server side.pdf", { customId: "server-1" }));
    expect(error).toBeNull();
    expect(data!.fileHash).toBe(md5(bytes));
    expect((await fetch(signedLink((await api.getFileUrls(data!.key)).data[0]!.url))).status).toBe(200);

    expect(await api.renameFiles({ fileKey: data!.key, newName: "Sheet A-2.pdf" })).toMatchObject({ success: true });
    expect((await fetch(signedLink(data!.ufsUrl))).headers.get("content-disposition")).toContain('filename="Sheet A-2.pdf"');
    await api.updateACL(data!.key, "private");
    expect((await fetch(data!.ufsUrl)).status).toBe(403);
    const signed = await api.getSignedURL(data!.key, { expiresIn: 60 });
    expect(md5(await bytesOf(await fetch(signed.ufsUrl)))).toBe(md5(bytes));

    const usage = await api.getUsageInfo();
    expect(usage.filesUploaded).toBeGreaterThanOrEqual(1);
    expect(usage.totalBytes).toBeGreaterThanOrEqual(bytes.length);
    expect(await api.deleteFiles("server-1", { keyType: "customId" })).toMatchObject({ deletedCount: 1 });
    expect((await fetch(data!.ufsUrl)).status).toBe(404);
  });

  it("serves stored bytes only through a signed link that has not expired", async () => {
    const { data } = await utapi().uploadFiles(new UTFile([pdfBytes(2_000, 9)], "confidential.pdf"));
    expect((await fetch(signedLink(data!.ufsUrl))).status).toBe(200);
    for (const bare of [data!.ufsUrl, data!.url, `${standIn.url}/a/${appId}/${data!.key}`]) {
      expect((await fetch(bare)).status, bare).toBe(403);
    }
    expect((await fetch(signUrl(data!.ufsUrl, apiKey, -1))).status).toBe(403); // expired
    expect((await fetch(signUrl(data!.ufsUrl, "sk_someone_else", 60))).status).toBe(403);
  });

  it("stays inside its data folder and within its size limits", async () => {
    // A file outside the data folder, with a sidecar that would make it servable if a key could reach it.
    await writeFile(path.join(root, "secret.txt"), "not for download");
    const fake = { key: "../../secret.txt", name: "secret.txt", type: "text/plain", size: 16, customId: "secret" };
    const sidecar = { ...fake, fileHash: "x", contentDisposition: "inline", acl: null, uploadedAt: 1 };
    await writeFile(path.join(root, "secret.txt.json"), JSON.stringify(sidecar));
    const encoded = ["/f/..%2Fsecret.txt", "/f/..%2F..%2Fsecret.txt", "/f/%2e%2e%2f%2e%2e%2fsecret.txt"];
    for (const p of [...encoded, `/a/${appId}/..%2F..%2Fsecret.txt`, "/f/../../secret.txt", "/a/../../../secret.txt"]) {
      const res = await rawGet(standIn.url, p);
      expect(res.status, p).toBeGreaterThanOrEqual(400);
      expect(res.body).not.toContain("not for download");
    }
    const deleted = await utapi().deleteFiles(["../secret.txt", "../../secret.txt", "..\\secret.txt"]);
    expect(deleted).toMatchObject({ deletedCount: 0 });
    expect(await utapi().deleteFiles(["secret"], { keyType: "customId" })).toMatchObject({ deletedCount: 0 });
    expect(existsSync(path.join(root, "secret.txt"))).toBe(true);

    const evil = signUpload(standIn.url, "..%2F..%2Fevil", apiKey, appId, pdf("evil.pdf", 4));
    expect((await putPart(evil, pdfBytes(4), 0)).status).toBe(400);
    expect(existsSync(path.join(root, "evil"))).toBe(false);
    const routeMetadata = await fetch(`${standIn.url}/route-metadata`, {
      method: "POST",
      headers: { "x-uploadthing-api-key": apiKey },
      body: JSON.stringify({ fileKeys: ["../x"], isDev: false, callbackUrl: app.url, callbackSlug: "planPdf" }),
    });
    expect(routeMetadata.status).toBe(400);

    const huge = signUpload(standIn.url, "hugeKey1", apiKey, appId, pdf("huge.pdf", 300 * 1024 * 1024));
    expect((await putPart(huge, pdfBytes(10), 0)).status).toBe(413);
    const liar = signUpload(standIn.url, "liarKey1", apiKey, appId, pdf("liar.pdf", 10));
    expect((await putPart(liar, pdfBytes(20), 0)).status).toBe(413);
    expect((await fetch(`${standIn.url}/f/liarKey1`)).status).toBe(404);
  });
});
