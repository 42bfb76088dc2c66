// PATCH /api/orgs/[orgSlug]/projects/[projectId]/tags/[tagId] — move, retype, re-measure (version-checked); DELETE ?version=N
import { NextResponse } from "next/server";
import { editTag, removeTag } from "@/lib/server/plans/tags";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { parseId, readJson, readVersion } from "@/lib/api/read-input";
import { tagUpdateSchema } from "@/lib/validators/plans";

type Params = { orgSlug: string; projectId: string; tagId: string };

export const PATCH = withOrg<Params>(
  async ({ req, params, org }) => {
    const scope = projectScope(org, params);
    const id = parseId(params.tagId, "tag");
    return NextResponse.json({ tag: await editTag(scope, id, await readJson(req, tagUpdateSchema)) });
  },
  { permission: "plans.write" },
);

export const DELETE = withOrg<Params>(
  async ({ req, params, org }) => {
    await removeTag(projectScope(org, params), parseId(params.tagId, "tag"), readVersion(req));
    return new NextResponse(null, { status: 204 });
  },
  { permission: "plans.write" },
);
