// GET /api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/sends — when the bid was e-mailed, to whom; POST — e-mail it now
import { NextResponse } from "next/server";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { parseId, readJson } from "@/lib/api/read-input";
import { listSends, sendBid } from "@/lib/server/takeoffs/send-bid";
import { sendBidSchema } from "@/lib/validators/takeoff";

type Params = { orgSlug: string; projectId: string; takeoffId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) => NextResponse.json({ sends: await listSends(projectScope(org, params), parseId(params.takeoffId, "takeoff")) }),
  { permission: "takeoff.read" },
);

export const POST = withOrg<Params>(
  async ({ req, params, org }) => {
    const sender = { ...projectScope(org, params), userId: org.userId, orgName: org.orgName };
    const id = parseId(params.takeoffId, "takeoff");
    const sent = await sendBid(sender, id, await readJson(req, sendBidSchema));
    return NextResponse.json({ sent }, { status: 201 });
  },
  { permission: "takeoff.submit" },
);
