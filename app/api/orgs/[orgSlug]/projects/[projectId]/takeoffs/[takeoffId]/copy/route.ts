// POST /api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/copy — a draft copy to continue from
import { NextResponse } from "next/server";
import { copyTakeoff } from "@/lib/server/takeoffs/lifecycle";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { parseId } from "@/lib/api/read-input";

type Params = { orgSlug: string; projectId: string; takeoffId: string };

export const POST = withOrg<Params>(
  async ({ params, org }) => {
    const scope = { ...projectScope(org, params), userId: org.userId };
    return NextResponse.json({ takeoff: await copyTakeoff(scope, parseId(params.takeoffId, "takeoff")) }, { status: 201 });
  },
  { permission: "takeoff.run" },
);
