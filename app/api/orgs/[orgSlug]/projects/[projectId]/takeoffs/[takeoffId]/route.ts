// GET /api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId] — one saved takeoff with its inputs, prices and result
import { NextResponse } from "next/server";
import { getTakeoff } from "@/db/queries/takeoffs";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { parseId } from "@/lib/api/read-input";

type Params = { orgSlug: string; projectId: string; takeoffId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) =>
    NextResponse.json({ takeoff: await getTakeoff(projectScope(org, params), parseId(params.takeoffId, "takeoff")) }),
  { permission: "takeoff.read" },
);
