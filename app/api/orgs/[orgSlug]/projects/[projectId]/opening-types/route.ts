// GET /api/orgs/[orgSlug]/projects/[projectId]/opening-types — the window list; POST — add an opening type
import { NextResponse } from "next/server";
import { addOpeningType, openingTypesOf } from "@/lib/server/plans/opening-types";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { readJson } from "@/lib/api/read-input";
import { openingTypeCreateSchema } from "@/lib/validators/plans";

type Params = { orgSlug: string; projectId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) => NextResponse.json({ openingTypes: await openingTypesOf(projectScope(org, params)) }),
  { permission: "plans.read" },
);

export const POST = withOrg<Params>(
  async ({ req, params, org }) => {
    const scope = projectScope(org, params);
    const openingType = await addOpeningType(scope, await readJson(req, openingTypeCreateSchema));
    return NextResponse.json({ openingType }, { status: 201 });
  },
  { permission: "plans.write" },
);
