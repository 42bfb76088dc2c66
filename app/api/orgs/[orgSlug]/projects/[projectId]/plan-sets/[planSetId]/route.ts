// DELETE /api/orgs/[orgSlug]/projects/[projectId]/plan-sets/[planSetId] — remove a plan set, its sheets, tags and file (?tags=N: the tag count the person agreed to remove)
import { NextResponse } from "next/server";
import { removePlanSet } from "@/lib/server/plans/plan-sets";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { readConfirmedTags } from "@/lib/api/read-confirm";
import { parseId } from "@/lib/api/read-input";

type Params = { orgSlug: string; projectId: string; planSetId: string };

export const DELETE = withOrg<Params>(
  async ({ req, params, org }) => {
    await removePlanSet(projectScope(org, params), parseId(params.planSetId, "plan set"), readConfirmedTags(req));
    return new NextResponse(null, { status: 204 });
  },
  { permission: "plans.write" },
);
