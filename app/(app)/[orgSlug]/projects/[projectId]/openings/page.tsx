import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requireOrg } from "@/lib/auth/page-context";
import { OpeningsView } from "./openings-client";
import { isUuid } from "@/lib/ids";

export const metadata: Metadata = { title: "Window list" };


// The project layout has already checked that the project belongs to this organisation.
export default async function OpeningsPage({ params }: { params: Promise<{ orgSlug: string; projectId: string }> }) {
  const { orgSlug, projectId } = await params;
  const { can } = await requireOrg(orgSlug);
  if (!isUuid(projectId)) notFound();
  return <OpeningsView orgSlug={orgSlug} projectId={projectId} canWrite={can("plans.write")} />;
}
