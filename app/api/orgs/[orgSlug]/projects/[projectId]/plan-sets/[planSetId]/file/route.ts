// GET /api/orgs/[orgSlug]/projects/[projectId]/plan-sets/[planSetId]/file — the PDF, for members of the project's organisation only
import { getPlanSetFile } from "@/db/queries/plan-sets";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { parseId } from "@/lib/api/read-input";
import { AppError } from "@/lib/errors";
import { fetchStoredFile } from "@/lib/uploads/file-store";

type Params = { orgSlug: string; projectId: string; planSetId: string };

export const GET = withOrg<Params>(
  async ({ req, params, org }) => {
    const { fileKey, name } = await getPlanSetFile(projectScope(org, params), parseId(params.planSetId, "plan set"));
    // Ranges pass through, so pdf.js can show page 1 of a large set before the rest arrives.
    const unavailable = () => new AppError(503, "The plan file is not available right now. Try again shortly.");
    const stored = await fetchStoredFile(fileKey, req.headers.get("range")).catch((error) => {
      console.error("file store", fileKey, error);
      throw unavailable();
    });
    if (stored.status === 416) return new Response(null, { status: 416, headers: passThrough(stored, ["content-range"]) });
    if (!stored.ok || !stored.body) throw unavailable();
    return new Response(stored.body, {
      status: stored.status === 206 ? 206 : 200,
      headers: {
        ...passThrough(stored, ["content-length", "content-range"]),
        "accept-ranges": "bytes",
        "content-type": "application/pdf",
        "content-disposition": `inline; filename*=UTF-8''${encodeURIComponent(name)}`,
        // Private: the bytes belong to one organisation; browsers may keep them, shared caches may not.
        "cache-control": "private, max-age=3600",
      },
    });
  },
  { permission: "plans.read" },
);

function passThrough(res: Response, names: string[]): Record<string, string> {
  return Object.fromEntries(names.flatMap((n) => (res.headers.get(n) ? [[n, res.headers.get(n)!]] : [])));
}
