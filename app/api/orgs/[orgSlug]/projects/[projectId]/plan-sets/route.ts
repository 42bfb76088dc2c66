// GET /api/orgs/[orgSlug]/projects/[projectId]/plan-sets — the project's uploaded plan sets
import { NextResponse } from "next/server";
import { planSetsOf } from "@/lib/server/plans/plan-sets";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";

type Params = { orgSlug: string; projectId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) => NextResponse.json({ planSets: await planSetsOf(projectScope(org, params)) }),
  { permission: "plans.read" },
);
