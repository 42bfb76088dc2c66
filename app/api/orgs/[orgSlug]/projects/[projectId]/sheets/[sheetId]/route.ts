// GET /api/orgs/[orgSlug]/projects/[projectId]/sheets/[sheetId] — one sheet; PATCH — label, unit type, scale, calibration
import { NextResponse } from "next/server";
import { getSheet, updateSheet } from "@/db/queries/sheets";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { parseId, readJson } from "@/lib/api/read-input";
import { sheetUpdateSchema } from "@/lib/validators/plans";

type Params = { orgSlug: string; projectId: string; sheetId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) =>
    NextResponse.json({ sheet: await getSheet(projectScope(org, params), parseId(params.sheetId, "sheet")) }),
  { permission: "plans.read" },
);

export const PATCH = withOrg<Params>(
  async ({ req, params, org }) => {
    const scope = projectScope(org, params);
    const id = parseId(params.sheetId, "sheet");
    return NextResponse.json({ sheet: await updateSheet(scope, id, await readJson(req, sheetUpdateSchema)) });
  },
  { permission: "plans.write" },
);
