import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requireOrg } from "@/lib/auth/page-context";
import { runChoices } from "@/lib/server/takeoffs/run-choices";
import { TakeoffsView } from "./takeoffs-client";
import { isUuid } from "@/lib/ids";

export const metadata: Metadata = { title: "Takeoffs" };

// The project layout has already checked that the project belongs to this organisation.
export default async function TakeoffsPage({ params }: { params: Promise<{ orgSlug: string; projectId: string }> }) {
  const { orgSlug, projectId } = await params;
  const { org, can } = await requireOrg(orgSlug);
  if (!isUuid(projectId)) notFound();
  const canRun = can("takeoff.run");
  const choices = canRun ? await runChoices(org.orgId) : { priceBooks: [], casings: [] };
  return (
    <TakeoffsView
      orgSlug={orgSlug}
      projectId={projectId}
      canRun={canRun}
      canManagePriceBooks={can("priceBook.write")}
      priceBooks={choices.priceBooks}
      casings={choices.casings}
    />
  );
}
