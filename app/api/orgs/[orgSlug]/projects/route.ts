// GET /api/orgs/[orgSlug]/projects — list projects; POST — create one
import { NextResponse } from "next/server";
import { createProject, listProjects } from "@/lib/server/projects/projects";
import { withOrg } from "@/lib/api/with-org";
import { readJson } from "@/lib/api/read-input";
import { createProjectSchema } from "@/lib/validators/project";

export const GET = withOrg(
  async ({ req, org }) => {
    const includeArchived = req.nextUrl.searchParams.get("archived") === "include";
    return NextResponse.json({ projects: await listProjects({ orgId: org.orgId, includeArchived }) });
  },
  { permission: "project.read" },
);

export const POST = withOrg(
  async ({ req, org }) => {
    const input = await readJson(req, createProjectSchema);
    const project = await createProject({ orgId: org.orgId, userId: org.userId, input });
    return NextResponse.json({ project }, { status: 201 });
  },
  { permission: "project.write" },
);
