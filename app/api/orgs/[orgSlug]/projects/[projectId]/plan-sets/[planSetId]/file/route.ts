// GET /api/orgs/[orgSlug]/projects/[projectId]/plan-sets/[planSetId]/file — the PDF, for members of the project's organisation only
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { parseId } from "@/lib/api/read-input";
import { openPlanSetFile } from "@/lib/server/plans/plan-sets";

type Params = { orgSlug: string; projectId: string; planSetId: string };

export const GET = withOrg<Params>(
  async ({ req, params, org }) => {
    // Ranges pass through, so pdf.js can show page 1 of a large set before the rest arrives.
    const { stored, name } = await openPlanSetFile(projectScope(org, params), parseId(params.planSetId, "plan set"), req.headers.get("range"));
    if (stored.status === 416) return new Response(null, { status: 416, headers: passThrough(stored, ["content-range"]) });
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
