// GET /api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId] — one saved takeoff; PATCH — rename (drafts only); DELETE — drafts only
import { NextResponse } from "next/server";
import { jsonText } from "@/lib/api/json-text";
import { takeoffJson } from "@/lib/server/takeoffs/takeoff-json";
import { deleteTakeoff, updateTakeoff } from "@/lib/server/takeoffs/lifecycle";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { parseId, readJson } from "@/lib/api/read-input";
import { updateTakeoffSchema } from "@/lib/validators/takeoff";

type Params = { orgSlug: string; projectId: string; takeoffId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) => jsonText(await takeoffJson(projectScope(org, params), parseId(params.takeoffId, "takeoff"))),
  { permission: "takeoff.read" },
);

export const PATCH = withOrg<Params>(
  async ({ req, params, org }) => {
    const id = parseId(params.takeoffId, "takeoff");
    const input = await readJson(req, updateTakeoffSchema);
    return NextResponse.json({ takeoff: await updateTakeoff(projectScope(org, params), id, input) });
  },
  { permission: "takeoff.run" },
);

export const DELETE = withOrg<Params>(
  async ({ params, org }) => {
    await deleteTakeoff(projectScope(org, params), parseId(params.takeoffId, "takeoff"));
    return new NextResponse(null, { status: 204 });
  },
  { permission: "takeoff.run" },
);
