// GET /api/orgs/[orgSlug]/projects/[projectId]/unit-types — the project's unit types; POST — add one
import { NextResponse } from "next/server";
import { addUnitType, unitTypesOf } from "@/lib/server/plans/unit-types";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { readJson } from "@/lib/api/read-input";
import { unitTypeSchema } from "@/lib/validators/plans";

type Params = { orgSlug: string; projectId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) => NextResponse.json({ unitTypes: await unitTypesOf(projectScope(org, params)) }),
  { permission: "plans.read" },
);

export const POST = withOrg<Params>(
  async ({ req, params, org }) => {
    const scope = projectScope(org, params);
    const unitType = await addUnitType(scope, await readJson(req, unitTypeSchema));
    return NextResponse.json({ unitType }, { status: 201 });
  },
  { permission: "plans.write" },
);
