import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getSheet } from "@/db/queries/sheets";
import { requireOrg } from "@/lib/auth/page-context";
import { AppError } from "@/lib/errors";
import { SheetClient } from "./sheet-client";

export const metadata: Metadata = { title: "Sheet" };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export default async function SheetPage({ params }: { params: Promise<{ orgSlug: string; projectId: string; sheetId: string }> }) {
  const { orgSlug, projectId, sheetId } = await params;
  const { org, can } = await requireOrg(orgSlug);
  if (!UUID.test(projectId) || !UUID.test(sheetId)) notFound();
  // Another organisation's sheet, or another project's, is the same 404 as one that does not exist.
  const sheet = await getSheet({ orgId: org.orgId, projectId }, sheetId).catch((e) => {
    if (e instanceof AppError && e.status === 404) notFound();
    throw e;
  });
  return <SheetClient orgSlug={orgSlug} projectId={projectId} sheet={sheet} canWrite={can("plans.write")} />;
}
