import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getSheet } from "@/db/queries/sheets";
import { requireOrg } from "@/lib/auth/page-context";
import { AppError } from "@/lib/errors";
import { SheetClient } from "./sheet-client";
import { isUuid } from "@/lib/ids";

export const metadata: Metadata = { title: "Sheet" };


export default async function SheetPage({ params }: { params: Promise<{ orgSlug: string; projectId: string; sheetId: string }> }) {
  const { orgSlug, projectId, sheetId } = await params;
  const { org, can } = await requireOrg(orgSlug);
  if (!isUuid(projectId) || !isUuid(sheetId)) notFound();
  // Another organisation's sheet, or another project's, is the same 404 as one that does not exist.
  const sheet = await getSheet({ orgId: org.orgId, projectId }, sheetId).catch((e) => {
    if (e instanceof AppError && e.status === 404) notFound();
    throw e;
  });
  return <SheetClient orgSlug={orgSlug} projectId={projectId} sheet={sheet} canWrite={can("plans.write")} />;
}
