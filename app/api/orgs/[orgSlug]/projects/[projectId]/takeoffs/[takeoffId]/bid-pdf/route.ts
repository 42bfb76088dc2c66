// GET /api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/bid-pdf — the bid summary for the general contractor
import { bidDocument } from "@/lib/server/takeoffs/bid-document";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { parseId } from "@/lib/api/read-input";
import { downloadName } from "@/lib/takeoffs/download-name";

type Params = { orgSlug: string; projectId: string; takeoffId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) => {
    const { takeoff, bytes } = await bidDocument(projectScope(org, params), parseId(params.takeoffId, "takeoff"));
    return new Response(Buffer.from(bytes), {
      headers: {
        "content-type": "application/pdf",
        "content-disposition": `attachment; filename="${downloadName(takeoff.name, "bid", "pdf")}"`,
        "cache-control": "private, no-store",
      },
    });
  },
  { permission: "takeoff.read" },
);
