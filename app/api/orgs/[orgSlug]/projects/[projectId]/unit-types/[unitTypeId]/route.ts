// PATCH /api/orgs/[orgSlug]/projects/[projectId]/unit-types/[unitTypeId] — rename or recount; DELETE ?version=N — remove
import { NextResponse } from "next/server";
import { editUnitType, removeUnitType } from "@/lib/server/plans/unit-types";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { parseId, readJson, readVersion } from "@/lib/api/read-input";
import { unitTypeUpdateSchema } from "@/lib/validators/plans";

type Params = { orgSlug: string; projectId: string; unitTypeId: string };

export const PATCH = withOrg<Params>(
  async ({ req, params, org }) => {
    const scope = projectScope(org, params);
    const id = parseId(params.unitTypeId, "unit type");
    return NextResponse.json({ unitType: await editUnitType(scope, id, await readJson(req, unitTypeUpdateSchema)) });
  },
  { permission: "plans.write" },
);

export const DELETE = withOrg<Params>(
  async ({ req, params, org }) => {
    await removeUnitType(projectScope(org, params), parseId(params.unitTypeId, "unit type"), readVersion(req));
    return new NextResponse(null, { status: 204 });
  },
  { permission: "plans.write" },
);
