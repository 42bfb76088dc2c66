// GET /api/orgs/[orgSlug]/projects/[projectId]/takeoffs — the project's saved takeoffs; POST — run and save one
import { NextResponse } from "next/server";
import { runTakeoff } from "@/lib/server/takeoffs/run-takeoff";
import { listTakeoffs } from "@/lib/server/takeoffs/takeoffs";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { readJson } from "@/lib/api/read-input";
import { runTakeoffSchema } from "@/lib/validators/takeoff";

type Params = { orgSlug: string; projectId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) => NextResponse.json({ takeoffs: await listTakeoffs(projectScope(org, params)) }),
  { permission: "takeoff.read" },
);

export const POST = withOrg<Params>(
  async ({ req, params, org }) => {
    const scope = { ...projectScope(org, params), userId: org.userId };
    const takeoff = await runTakeoff(scope, await readJson(req, runTakeoffSchema));
    return NextResponse.json({ takeoff }, { status: 201 });
  },
  { permission: "takeoff.run" },
);
