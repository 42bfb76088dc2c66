// GET /api/orgs/[orgSlug]/projects/[projectId] — one project; PATCH — rename, contractor, due date, status, archive
import { NextResponse } from "next/server";
import { getProject, updateProject } from "@/lib/server/projects/projects";
import { withOrg } from "@/lib/api/with-org";
import { parseId, readJson } from "@/lib/api/read-input";
import { updateProjectSchema } from "@/lib/validators/project";

type Params = { orgSlug: string; projectId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) => {
    const project = await getProject({ orgId: org.orgId, projectId: parseId(params.projectId, "project") });
    return NextResponse.json({ project });
  },
  { permission: "project.read" },
);

export const PATCH = withOrg<Params>(
  async ({ req, params, org }) => {
    const projectId = parseId(params.projectId, "project");
    const input = await readJson(req, updateProjectSchema);
    return NextResponse.json({ project: await updateProject({ orgId: org.orgId, projectId, input }) });
  },
  { permission: "project.write" },
);
