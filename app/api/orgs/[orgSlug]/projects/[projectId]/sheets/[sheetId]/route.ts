// GET /api/orgs/[orgSlug]/projects/[projectId]/sheets/[sheetId] — one sheet; PATCH — label, unit type, count role, scale, calibration; DELETE ?version=N[&tags=N] — remove it and its tags
import { NextResponse } from "next/server";
import { editSheet, removeSheet, sheetOf } from "@/lib/server/plans/sheets";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { readConfirmedTags } from "@/lib/api/read-confirm";
import { parseId, readJson, readVersion } from "@/lib/api/read-input";
import { sheetUpdateSchema } from "@/lib/validators/plans";

type Params = { orgSlug: string; projectId: string; sheetId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) =>
    NextResponse.json({ sheet: await sheetOf(projectScope(org, params), parseId(params.sheetId, "sheet")) }),
  { permission: "plans.read" },
);

export const PATCH = withOrg<Params>(
  async ({ req, params, org }) => {
    const scope = projectScope(org, params);
    const id = parseId(params.sheetId, "sheet");
    return NextResponse.json({ sheet: await editSheet(scope, id, await readJson(req, sheetUpdateSchema)) });
  },
  { permission: "plans.write" },
);

export const DELETE = withOrg<Params>(
  async ({ req, params, org }) => {
    await removeSheet(projectScope(org, params), parseId(params.sheetId, "sheet"), readVersion(req), readConfirmedTags(req));
    return new NextResponse(null, { status: 204 });
  },
  { permission: "plans.write" },
);
