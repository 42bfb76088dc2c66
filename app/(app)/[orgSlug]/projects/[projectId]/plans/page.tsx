import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requireOrg } from "@/lib/auth/page-context";
import { PlansView } from "./plans-client";

export const metadata: Metadata = { title: "Plans" };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

// The project layout has already checked that the project belongs to this organisation.
export default async function PlansPage({ params }: { params: Promise<{ orgSlug: string; projectId: string }> }) {
  const { orgSlug, projectId } = await params;
  const { can } = await requireOrg(orgSlug);
  if (!UUID.test(projectId)) notFound();
  return <PlansView orgSlug={orgSlug} projectId={projectId} canWrite={can("plans.write")} />;
}
