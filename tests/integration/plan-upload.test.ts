/**
 * Plan-set uploads end to end: the SDK's client → the app's real /api/uploadthing route → the upload
 * stand-in → the stand-in's callback → the app reads the bytes back with pdf.js and saves sheets. A file
 * that is not a usable PDF leaves no plan set, no sheet and no stored file.
 */
import { createHash } from "node:crypto";
import { readdir, readFile, mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import { NextRequest } from "next/server";
import { genUploader } from "uploadthing/client";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { PlanRouter } from "@/app/api/uploadthing/core";
import * as fileRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/plan-sets/[planSetId]/file/route";
import { db } from "@/db/client";
import { planSets, sheets } from "@/db/schema";
import { generatePlanSet } from "@/lib/plans/demo-plan";
import type { PlanUploadResult } from "@/lib/plans/api-types";
import { startUploadStandIn, type UploadStandIn } from "@/lib/uploads/stand-in";
import { localUploadToken } from "@/lib/uploads/token";
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
