/**
 * Plan-set uploads end to end: the SDK's client → the app's real /api/uploadthing route → the upload
 * stand-in → the stand-in's callback → the app reads the bytes back with pdf.js and saves sheets. A file
 * that is not a usable PDF leaves no plan set, no sheet and no stored file.
 */
import { createHash, createHmac } from "node:crypto";
import { readdir, readFile, mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import { NextRequest } from "next/server";
import { genUploader } from "uploadthing/client";
import { UTApi, UTFile } from "uploadthing/server";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { PlanRouter } from "@/app/api/uploadthing/core";
import * as fileRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/plan-sets/[planSetId]/file/route";
import { db } from "@/db/client";
import { pendingUploads, planSets, sheets } from "@/db/schema";
import { ingestPlanUpload } from "@/lib/server/plans/ingest-upload";
import { generatePlanSet } from "@/scripts/demo-plan";
import type { PlanUploadResult } from "@/lib/plans/api-types";
import { startUploadStandIn, type UploadStandIn } from "@/scripts/stand-ins/upload";
import { localUploadToken, parseUploadToken } from "@/lib/uploads/token";
import { FetchXhr, serveUploadApp } from "./helpers/upload-app";
import { call, sessionCookie } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { makeOrg, type Person, type World } from "./helpers/world";

let dataDir: string;
let standIn: UploadStandIn;
let app: Awaited<ReturnType<typeof serveUploadApp>>;
let home: World;
let other: World;

beforeAll(async () => {
  Object.assign(globalThis, { XMLHttpRequest: FetchXhr }); // the SDK's browser client PUTs with XHR
  dataDir = await mkdtemp(path.join(tmpdir(), "miterwise-plan-upload-"));
  standIn = await startUploadStandIn({ port: 0, dataDir, token: localUploadToken(), callbackTimeoutMs: 10_000 });
  // The route module reads the stand-in's address and our callback URL from the environment when loaded.
  let route: typeof import("@/app/api/uploadthing/route") | undefined;
  app = await serveUploadApp(async (req) => {
    route ??= await import("@/app/api/uploadthing/route");
    return (req.method === "GET" ? route.GET : route.POST)(new NextRequest(req));
  });
  process.env.UPLOAD_STAND_IN_PORT = new URL(standIn.url).port;
  process.env.UPLOADTHING_CALLBACK_URL = app.url;
  home = await makeOrg("Quillon");
  other = await makeOrg("Sedgewick");
});

afterAll(async () => {
  await app.close();
  await standIn.close();
  Reflect.deleteProperty(globalThis, "XMLHttpRequest");
  await rm(dataDir, { recursive: true, force: true });
});

async function upload(as: Person | null, file: File, world = home) {
  const cookie = as ? await sessionCookie(as) : undefined;
  const { uploadFiles } = genUploader<PlanRouter>({ url: new URL(app.url), package: "miterwise-test", fetch });
  const [done] = await uploadFiles("planSet", {
    files: [file],
    input: { orgSlug: world.org.slug, projectId: world.project.id },
    headers: cookie ? { cookie } : {},
  });
  return done?.serverData as PlanUploadResult;
}

const storedKeys = async () => (await readdir(path.join(dataDir, "files")).catch(() => [] as string[])).filter((n) => !n.endsWith(".json"));
const pdfFile = (bytes: Uint8Array, name: string) => new File([Buffer.from(bytes)], name, { type: "application/pdf" });

describe("uploading a plan set", () => {
  it("a real PDF becomes a plan set with one sheet per page, labels read from the title blocks", async () => {
    const { bytes } = await generatePlanSet({ unitTypes: ["A", "B"], rotate: [0, 90, 0] });
    const result = await upload(home.people.estimator, pdfFile(bytes, "Bldg C arch.pdf"));
    expect(result).toMatchObject({ ok: true, pageCount: 3 });
    if (!result.ok) return;
    const rows = await db.select().from(sheets).where(eq(sheets.planSetId, result.planSetId)).orderBy(sheets.pageNumber);
    expect(rows.map((r) => [r.pageNumber, r.label, r.width, r.height, r.rotation])).toEqual([
      [1, "A-101", 2592, 1728, 0],
      [2, "A-201", 1728, 2592, 90], // a /Rotate 90 page keeps its box portrait; the viewer turns it
      [3, "A-202", 2592, 1728, 0],
    ]);
    const [set] = await db.select().from(planSets).where(eq(planSets.id, result.planSetId));
    expect(await storedKeys()).toContain(set!.fileKey);
    // The digest of the bytes as the server read them back: a second upload of this file is recognised by it.
    expect(set!.contentHash).toBe(createHash("sha256").update(bytes).digest("hex"));

    // The bytes come back through the tenancy-checked file route, unchanged.
    const res = await fileRoute.GET(
      new NextRequest("http://127.0.0.1/x", { headers: { cookie: await sessionCookie(home.people.project_manager) } }),
      { params: Promise.resolve({ orgSlug: home.org.slug, projectId: home.project.id, planSetId: result.planSetId }) },
    );
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(Buffer.compare(Buffer.from(await res.arrayBuffer()), Buffer.from(bytes))).toBe(0);
    // A range comes back as a range, so the viewer can start on page 1 of a large set.
    const part = await fileRoute.GET(
      new NextRequest("http://127.0.0.1/x", { headers: { cookie: await sessionCookie(home.people.estimator), range: "bytes=0-99" } }),
      { params: Promise.resolve({ orgSlug: home.org.slug, projectId: home.project.id, planSetId: result.planSetId }) },
    );
    expect(part.status).toBe(206);
    expect(part.headers.get("content-range")).toBe(`bytes 0-99/${bytes.byteLength}`);
    expect(Buffer.compare(Buffer.from(await part.arrayBuffer()), Buffer.from(bytes.subarray(0, 100)))).toBe(0);
    // …and not to another organisation, whose own slug cannot reach it either.
    const theirs = await call(fileRoute.GET, {
      method: "GET",
      path: "/x",
      params: { orgSlug: other.org.slug, projectId: home.project.id, planSetId: result.planSetId },
      cookie: await sessionCookie(other.people.admin),
    });
    expect(theirs.status).toBe(404);
  });

  const refusals: [string, () => Promise<File>, RegExp][] = [
    ["a text file named .pdf", async () => pdfFile(new TextEncoder().encode("Window schedule\nW1 3'-0\" x 5'-0\"\n"), "schedule.pdf"), /not a PDF/],
    ["a password-protected PDF", async () => pdfFile(await readFile("tests/fixtures/encrypted-user-password.pdf"), "locked.pdf"), /password-protected/],
    [
      "a truncated PDF",
      async () => {
        const { bytes } = await generatePlanSet({ unitTypes: ["C"], commonArea: false });
        return pdfFile(bytes.subarray(0, Math.floor(bytes.length / 2)), "half.pdf");
      },
      /incomplete/,
    ],
  ];
  it.each(refusals)("%s is refused with a clear message and leaves nothing behind", async (_name, make, message) => {
    const keysBefore = await storedKeys();
    const before = await snapshot();
    const result = await upload(home.people.estimator, await make());
    expect(result).toMatchObject({ ok: false });
    expect(result.ok ? "" : result.error).toMatch(message);
    expect(await snapshot()).toBe(before);
    expect(await storedKeys()).toEqual(keysBefore);
  });

  it("a file over 200 MB is refused before a byte is sent", async () => {
    const before = await snapshot();
    const big = new File([new Uint8Array(201 * 1024 * 1024)], "huge.pdf", { type: "application/pdf" });
    await expect(upload(home.people.estimator, big)).rejects.toThrow(/larger than the 200 MB limit/);
    expect(await snapshot()).toBe(before);
  });
});

describe("who may upload", () => {
  const cases: [string, () => Person | null, () => World, RegExp | null][] = [
    ["an admin", () => home.people.admin, () => home, null],
    ["an estimator", () => home.people.estimator, () => home, null],
    ["a project manager", () => home.people.project_manager, () => home, /role cannot upload/],
    ["another organisation's admin", () => other.people.admin, () => home, /No such project/],
    ["someone signed out", () => null, () => home, /Sign in/],
  ];
  it.each(cases)("%s", async (_who, person, world, refusal) => {
    const { bytes } = await generatePlanSet({ unitTypes: ["C"], commonArea: false });
    const before = await snapshot();
    const attempt = upload(person(), pdfFile(bytes, "C.pdf"), world());
    if (!refusal) {
      expect(await attempt).toMatchObject({ ok: true, pageCount: 1 });
    } else {
      await expect(attempt).rejects.toThrow(refusal);
      expect(await snapshot()).toBe(before);
    }
  });

  it("a project id of another organisation, through your own slug, is refused", async () => {
    const { bytes } = await generatePlanSet({ unitTypes: ["C"], commonArea: false });
    const cookie = await sessionCookie(home.people.admin);
    const { uploadFiles } = genUploader<PlanRouter>({ url: new URL(app.url), package: "miterwise-test", fetch });
    const attempt = uploadFiles("planSet", {
      files: [pdfFile(bytes, "C.pdf")],
      input: { orgSlug: home.org.slug, projectId: other.project.id },
      headers: { cookie },
    });
    await expect(attempt).rejects.toThrow(/No such project/);
  });
});

describe("forged upload callbacks", () => {
  const { apiKey } = parseUploadToken(localUploadToken());
  /** A callback body as the upload service writes it, naming `world`'s project in its metadata. */
  const forgedBody = (key: string, world: World, size: number) =>
    JSON.stringify({
      status: "uploaded",
      metadata: { orgId: world.org.id, projectId: world.project.id, userId: home.people.estimator.id },
      file: { name: "forged.pdf", size, type: "application/pdf", customId: null, key, url: `${standIn.url}/f/${key}`, appUrl: `${standIn.url}/f/${key}`, ufsUrl: `${standIn.url}/f/${key}`, fileHash: "x" },
      origin: standIn.url,
    });
  const postCallback = (body: string, key: string) =>
    fetch(`${app.url}?slug=planSet`, {
      method: "POST",
      headers: { "content-type": "application/json", "uploadthing-hook": "callback", "x-uploadthing-signature": `hmac-sha256=${createHmac("sha256", key).update(body).digest("hex")}` },
      body,
    });
  const readPlanFile = async (world: World, planSetId: string) =>
    fileRoute.GET(new NextRequest("http://127.0.0.1/x", { headers: { cookie: await sessionCookie(world.people.admin) } }), {
      params: Promise.resolve({ orgSlug: world.org.slug, projectId: world.project.id, planSetId }),
    });
  /** Stores a real PDF at the stand-in the way anyone holding the key could, without any presign by the app. */
  const storeBehindTheAppsBack = async () => {
    const { bytes } = await generatePlanSet({ unitTypes: ["C"], commonArea: false });
    const api = new UTApi({ token: localUploadToken(), apiUrl: standIn.url, ingestUrl: standIn.url, logLevel: "Error" });
    const { data } = await api.uploadFiles(new UTFile([Buffer.from(bytes)], "planted.pdf"));
    return { key: data!.key, size: bytes.byteLength };
  };

  it("a callback signed with the old published stand-in key is refused; nothing is stored", async () => {
    const planted = await storeBehindTheAppsBack();
    const before = await snapshot();
    const res = await postCallback(forgedBody(planted.key, other, planted.size), "sk_local_miterwise_stand_in_not_a_secret");
    expect(res.status).toBe(403);
    expect(await snapshot()).toBe(before);
    expect(await db.select().from(planSets).where(eq(planSets.fileKey, planted.key))).toHaveLength(0);
  });

  it("a correctly signed callback for a key the app never presigned is refused; nothing is stored", async () => {
    const planted = await storeBehindTheAppsBack();
    const before = await snapshot();
    const res = await postCallback(forgedBody(planted.key, other, planted.size), apiKey);
    expect(res.status).toBe(403);
    expect(await snapshot()).toBe(before);
  });

  it("a correctly signed callback naming another organisation's stored file leaves that file served", async () => {
    const { bytes } = await generatePlanSet({ unitTypes: ["A"], commonArea: false });
    const theirs = await upload(other.people.admin, pdfFile(bytes, "theirs.pdf"), other);
    expect(theirs).toMatchObject({ ok: true });
    if (!theirs.ok) return;
    const [set] = await db.select().from(planSets).where(eq(planSets.id, theirs.planSetId));
    const before = await snapshot();
    // A replay of the completed upload, and one naming the attacker's own organisation instead.
    for (const world of [other, home]) {
      expect((await postCallback(forgedBody(set!.fileKey, world, bytes.byteLength), apiKey)).status).toBe(403);
    }
    // Even past the route's check, ingesting refuses and deletes nothing another row owns.
    expect(await ingestPlanUpload({ key: set!.fileKey, name: "x.pdf", size: bytes.byteLength })).toMatchObject({ ok: false });
    expect(await snapshot()).toBe(before);
    const served = await readPlanFile(other, theirs.planSetId);
    expect(served.status).toBe(200);
    expect(Buffer.compare(Buffer.from(await served.arrayBuffer()), Buffer.from(bytes))).toBe(0);
  });

  it("where an upload lands is what was presigned, never what the callback's metadata says", async () => {
    const { bytes } = await generatePlanSet({ unitTypes: ["B"], commonArea: false });
    const result = await upload(home.people.estimator, pdfFile(bytes, "mine.pdf"));
    expect(result).toMatchObject({ ok: true });
    if (!result.ok) return;
    const [set] = await db.select().from(planSets).where(eq(planSets.id, result.planSetId));
    expect(set).toMatchObject({ orgId: home.org.id, projectId: home.project.id, uploadedBy: home.people.estimator.id });
    const [pending] = await db.select().from(pendingUploads).where(eq(pendingUploads.fileKey, set!.fileKey));
    expect(pending).toMatchObject({ orgId: home.org.id, projectId: home.project.id, userId: home.people.estimator.id });
    expect(pending!.claimedAt).not.toBeNull();
  });
});
