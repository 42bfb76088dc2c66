// PATCH /api/orgs/[orgSlug]/projects/[projectId]/opening-types/[openingTypeId] — edit (version-checked); DELETE ?version=N[&tags=N] (tags: how many tags of the type the person agreed to delete with it)
import { NextResponse } from "next/server";
import { editOpeningType, removeOpeningType } from "@/lib/server/plans/opening-types";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { parseId, readJson, readVersion } from "@/lib/api/read-input";
import { readConfirmedTags } from "@/lib/api/read-confirm";
import { openingTypeUpdateSchema } from "@/lib/validators/plans";

type Params = { orgSlug: string; projectId: string; openingTypeId: string };

export const PATCH = withOrg<Params>(
  async ({ req, params, org }) => {
    const scope = projectScope(org, params);
    const id = parseId(params.openingTypeId, "opening type");
    return NextResponse.json({ openingType: await editOpeningType(scope, id, await readJson(req, openingTypeUpdateSchema)) });
  },
  { permission: "plans.write" },
);

export const DELETE = withOrg<Params>(
  async ({ req, params, org }) => {
    await removeOpeningType(projectScope(org, params), parseId(params.openingTypeId, "opening type"), readVersion(req), readConfirmedTags(req));
    return new NextResponse(null, { status: 204 });
  },
  { permission: "plans.write" },
);
