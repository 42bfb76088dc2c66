// POST /api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/submit — mark as the submitted bid, which locks it
import { NextResponse } from "next/server";
import { submitTakeoff } from "@/lib/server/takeoffs/lifecycle";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { parseId } from "@/lib/api/read-input";

type Params = { orgSlug: string; projectId: string; takeoffId: string };

export const POST = withOrg<Params>(
  async ({ params, org }) => {
    const scope = { ...projectScope(org, params), userId: org.userId };
    return NextResponse.json({ takeoff: await submitTakeoff(scope, parseId(params.takeoffId, "takeoff")) });
  },
  { permission: "takeoff.submit" },
);
