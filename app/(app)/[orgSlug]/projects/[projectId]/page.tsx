import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getProject } from "@/lib/server/projects/projects";
import { requireOrg } from "@/lib/auth/page-context";
import { AppError } from "@/lib/errors";
import { ProjectDetail } from "./project-client";
import { isUuid } from "@/lib/ids";

export const metadata: Metadata = { title: "Project" };


export default async function ProjectPage({ params }: { params: Promise<{ orgSlug: string; projectId: string }> }) {
  const { orgSlug, projectId } = await params;
  const { org, can } = await requireOrg(orgSlug);
  if (!isUuid(projectId)) notFound();
  const project = await getProject({ orgId: org.orgId, projectId }).catch((e) => {
    if (e instanceof AppError && e.status === 404) notFound();
    throw e;
  });
  return <ProjectDetail orgSlug={orgSlug} initial={project} canWrite={can("project.write")} />;
}
