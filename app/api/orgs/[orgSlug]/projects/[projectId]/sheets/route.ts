// GET /api/orgs/[orgSlug]/projects/[projectId]/sheets — every sheet of every plan set, with calibration
import { NextResponse } from "next/server";
import { sheetsOf } from "@/lib/server/plans/sheets";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";

type Params = { orgSlug: string; projectId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) => NextResponse.json({ sheets: await sheetsOf(projectScope(org, params)) }),
  { permission: "plans.read" },
);
