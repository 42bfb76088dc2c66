// GET /api/orgs/[orgSlug]/projects/[projectId]/plan-sets/[planSetId]/file — the PDF, for members of the project's organisation only
import { getPlanSetFile } from "@/db/queries/plan-sets";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { parseId } from "@/lib/api/read-input";
import { AppError } from "@/lib/errors";
import { fetchStoredFile } from "@/lib/uploads/file-store";

type Params = { orgSlug: string; projectId: string; planSetId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) => {
    const { fileKey, name } = await getPlanSetFile(projectScope(org, params), parseId(params.planSetId, "plan set"));
    const stored = await fetchStoredFile(fileKey);
    if (!stored.ok || !stored.body) throw new AppError(503, "The plan file is not available right now. Try again shortly.");
    return new Response(stored.body, {
      headers: {
        "content-type": "application/pdf",
        "content-disposition": `inline; filename*=UTF-8''${encodeURIComponent(name)}`,
        ...(stored.headers.get("content-length") ? { "content-length": stored.headers.get("content-length")! } : {}),
        // Private: the bytes belong to one organisation; browsers may keep them, shared caches may not.
        "cache-control": "private, max-age=3600",
      },
    });
  },
  { permission: "plans.read" },
);
