// GET /api/orgs/[orgSlug]/projects/[projectId]/tags?sheetId= — tags (of one sheet); POST — place a tag
import { NextResponse } from "next/server";
import { addTag, tagsOf } from "@/lib/server/plans/tags";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { parseId, readJson } from "@/lib/api/read-input";
import { tagCreateSchema } from "@/lib/validators/plans";

type Params = { orgSlug: string; projectId: string };

export const GET = withOrg<Params>(
  async ({ req, params, org }) => {
    const sheetId = req.nextUrl.searchParams.get("sheetId");
    const tags = await tagsOf(projectScope(org, params), sheetId ? parseId(sheetId, "sheet") : undefined);
    return NextResponse.json({ tags });
  },
  { permission: "plans.read" },
);

export const POST = withOrg<Params>(
  async ({ req, params, org }) => {
    const scope = { ...projectScope(org, params), userId: org.userId };
    const tag = await addTag(scope, await readJson(req, tagCreateSchema));
    return NextResponse.json({ tag }, { status: 201 });
  },
  { permission: "plans.write" },
);
