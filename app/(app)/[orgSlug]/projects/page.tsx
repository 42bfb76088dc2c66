import type { Metadata } from "next";
import { requireOrg } from "@/lib/auth/page-context";
import { ProjectsView } from "./projects-client";

export const metadata: Metadata = { title: "Projects" };

export default async function ProjectsPage({ params }: { params: Promise<{ orgSlug: string }> }) {
  const { orgSlug } = await params;
  const { can } = await requireOrg(orgSlug);
  return <ProjectsView orgSlug={orgSlug} canWrite={can("project.write")} />;
}
