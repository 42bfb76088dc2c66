// GET /api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/order-csv — the material order as CSV, for purchasing
import { getTakeoff } from "@/lib/server/takeoffs/takeoffs";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { parseId } from "@/lib/api/read-input";
import { downloadName } from "@/lib/takeoffs/download-name";
import { orderCsv } from "@/lib/takeoffs/order-csv";

type Params = { orgSlug: string; projectId: string; takeoffId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) => {
    const takeoff = await getTakeoff(projectScope(org, params), parseId(params.takeoffId, "takeoff"));
    return new Response(orderCsv(takeoff.result), {
      headers: {
        "content-type": "text/csv; charset=utf-8",
        "content-disposition": `attachment; filename="${downloadName(takeoff.name, "order", "csv")}"`,
        "cache-control": "private, no-store",
      },
    });
  },
  { permission: "takeoff.read" },
);
