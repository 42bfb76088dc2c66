import { createUploadthing, UTFiles, type FileRouter } from "uploadthing/next";
import { UploadThingError } from "uploadthing/server";
import { z } from "zod";
import { sessionFromRequest } from "@/lib/auth/session";
import { toAppError } from "@/lib/errors";
import { can } from "@/lib/permissions";
import { getOrgContext } from "@/lib/server/accounts/org-context";
import { ingestPlanUpload } from "@/lib/server/plans/ingest-upload";
import { preparePlanUploads } from "@/lib/server/plans/plan-uploads";
import { pointAtUploadStandInUnlessConfigured } from "@/lib/uploads/config";

pointAtUploadStandInUnlessConfigured();
const f = createUploadthing();

/** Same wording for "no such org" and "not yours": the upload route must not reveal what exists. */
const refuse = (code: "FORBIDDEN" | "NOT_FOUND", message: string) => new UploadThingError({ code, message });

export const planRouter = {
  /** Plan-set PDFs for one project. The SDK limit is a power of two; our own 200 MB limit is checked first. */
  planSet: f({ pdf: { maxFileSize: "256MB", maxFileCount: 20 } })
    .input(z.object({ orgSlug: z.string().max(80), projectId: z.uuid() }))
    .middleware(async ({ req, input, files }) => {
      const session = await sessionFromRequest(req);
      if (!session) throw refuse("FORBIDDEN", "Sign in to upload plans.");
      const org = await getOrgContext(session, input.orgSlug).catch(() => {
        throw refuse("FORBIDDEN", "Sign in to upload plans."); // a session that was signed out
      });
      if (!org) throw refuse("NOT_FOUND", "No such project.");
      if (!can(org.role, "plans.write")) throw refuse("FORBIDDEN", "Your role cannot upload plans.");
      const scope = { orgId: org.orgId, projectId: input.projectId, userId: session.userId };
      const ids = await preparePlanUploads(scope, [...files]).catch((error: unknown) => {
        const known = toAppError(error);
        if (!known) throw error;
        throw refuse(known.status === 404 ? "NOT_FOUND" : "FORBIDDEN", known.message);
      });
      return { [UTFiles]: files.map((file, i) => ({ ...file, customId: ids[i] })) };
    })
    // The callback's metadata is not trusted: the pending upload recorded above says where the file belongs.
    .onUploadComplete(async ({ file }) => ingestPlanUpload({ key: file.key, name: file.name, size: file.size })),
} satisfies FileRouter;

export type PlanRouter = typeof planRouter;
