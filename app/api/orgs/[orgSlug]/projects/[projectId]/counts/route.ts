// GET /api/orgs/[orgSlug]/projects/[projectId]/counts — openings per sheet, per unit type and for the job
import { NextResponse } from "next/server";
import { countsOf } from "@/lib/server/plans/counts";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";

type Params = { orgSlug: string; projectId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) => NextResponse.json({ counts: await countsOf(projectScope(org, params)) }),
  { permission: "plans.read" },
);
