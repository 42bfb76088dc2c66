// GET /api/orgs/[orgSlug]/projects/[projectId]/takeoffs — the project's saved takeoffs; POST — run and save one
import { NextResponse } from "next/server";
import { withOrg } from "@/lib/api/with-org";
import { jsonText } from "@/lib/api/json-text";
import { projectScope } from "@/lib/api/project-scope";
import { readJson } from "@/lib/api/read-input";
import { runTakeoff } from "@/lib/server/takeoffs/run-takeoff";
import { takeoffJson } from "@/lib/server/takeoffs/takeoff-json";
import { listTakeoffs } from "@/lib/server/takeoffs/takeoffs";
import { runTakeoffSchema } from "@/lib/validators/takeoff";

type Params = { orgSlug: string; projectId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) => NextResponse.json({ takeoffs: await listTakeoffs(projectScope(org, params)) }),
  { permission: "takeoff.read" },
);

export const POST = withOrg<Params>(
  async ({ req, params, org }) => {
    const scope = { ...projectScope(org, params), userId: org.userId };
    const id = await runTakeoff(scope, await readJson(req, runTakeoffSchema));
    return jsonText(await takeoffJson(scope, id), 201);
  },
  { permission: "takeoff.run" },
);
