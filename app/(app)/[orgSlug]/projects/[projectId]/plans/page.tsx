import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requireOrg } from "@/lib/auth/page-context";
import { PlansView } from "./plans-client";
import { isUuid } from "@/lib/ids";

export const metadata: Metadata = { title: "Plans" };


// The project layout has already checked that the project belongs to this organisation.
export default async function PlansPage({ params }: { params: Promise<{ orgSlug: string; projectId: string }> }) {
  const { orgSlug, projectId } = await params;
  const { can } = await requireOrg(orgSlug);
  if (!isUuid(projectId)) notFound();
  return <PlansView orgSlug={orgSlug} projectId={projectId} canWrite={can("plans.write")} />;
}
