import { genUploader } from "uploadthing/client";
import { createUploadthing, UTApi, UTFiles, type FileRouter } from "uploadthing/server";
import { z } from "zod";
import { localUploadToken } from "@/lib/uploads/token";
import { pdfBytes } from "./upload-wire";

type CompletedFile = { key: string; name: string; type: string; fileHash: string };

/** What the test routes saw, so tests can check the app's hooks really ran. */
export const seen = {
  completed: [] as { metadata: { projectId: string }; file: CompletedFile }[],
  brokenCalls: 0,
};

const f = createUploadthing();

/**
 * The file router the upload stand-in tests mount: a plan-PDF route shaped like the app's (input, middleware
 * metadata, a customId, server data back to the client), one whose presigned URLs are born expired, and one
 * whose `onUploadComplete` throws so no callback result ever comes.
 */
export const testRouter = {
  planPdf: f({ pdf: { maxFileSize: "16MB", maxFileCount: 4 } })
    .input(z.object({ projectId: z.string() }))
    .middleware(({ input, files }) => ({
      projectId: input.projectId,
      [UTFiles]: files.map((file) => ({ ...file, customId: `plan-${input.projectId}-${file.name}` })),
    }))
    .onUploadComplete(({ metadata, file }) => {
      seen.completed.push({ metadata, file });
      return { sheetKey: file.key, projectId: metadata.projectId };
    }),
  expiredPdf: f({ pdf: { maxFileSize: "1MB" } }, { presignedURLTTL: -60 }).onUploadComplete(() => ({ ok: true })),
  brokenPdf: f({ pdf: { maxFileSize: "1MB" } }).onUploadComplete(() => {
    seen.brokenCalls++;
    throw new Error("this plan is not readable");
  }),
} satisfies FileRouter;

const token = localUploadToken();

/** The app side's SDK settings, passed explicitly so no UPLOADTHING_* variable of the shell leaks in. */
export const sdkConfig = (ingestUrl: string) => ({ token, ingestUrl, isDev: false, logLevel: "Error" as const });

/** The server SDK pointed at a stand-in; files are addressed `localhost:PORT/a/{appId}/{key}` as in the demo. */
export const utapiFor = (standInUrl: string) =>
  new UTApi({
    token,
    apiUrl: standInUrl,
    ingestUrl: standInUrl,
    logLevel: "Error",
    ufsHost: `localhost:${new URL(standInUrl).port}`,
    ufsAppIdLocation: "path",
  });

/** The browser client SDK, talking to an app's route handler at `appUrl`. */
export const uploader = (appUrl: string) =>
  genUploader<typeof testRouter>({ url: new URL(appUrl), package: "miterwise-test", fetch });

export const sheet = (name: string, size: number, seed?: number) =>
  new File([pdfBytes(size, seed)], name, { type: "application/pdf" });
