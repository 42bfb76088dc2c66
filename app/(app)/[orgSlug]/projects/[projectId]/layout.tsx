import type { ReactNode } from "react";
import { notFound } from "next/navigation";
import Link from "next/link";
import { getProject } from "@/lib/server/projects/projects";
import { requireOrg } from "@/lib/auth/page-context";
import { AppError } from "@/lib/errors";
import { ProjectTabs } from "@/components/shell/project-tabs";
import { isUuid } from "@/lib/ids";


export default async function ProjectLayout({ children, params }: { children: ReactNode; params: Promise<{ orgSlug: string; projectId: string }> }) {
  const { orgSlug, projectId } = await params;
  const { org } = await requireOrg(orgSlug);
  if (!isUuid(projectId)) notFound();
  const project = await getProject({ orgId: org.orgId, projectId }).catch((e) => {
    if (e instanceof AppError && e.status === 404) notFound();
    throw e;
  });
  const base = `/${orgSlug}/projects/${projectId}`;
  return (
    <div className="space-y-4">
      <div>
        <Link href={`/${orgSlug}/projects`} className="text-sm text-spruce-700 underline">
          ← Projects
        </Link>
        <p className="mt-1 text-lg font-bold text-graphite-900">{project.name}</p>
      </div>
      <ProjectTabs base={base} />
      {children}
    </div>
  );
}
