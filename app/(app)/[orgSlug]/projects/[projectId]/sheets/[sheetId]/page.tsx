import type { Metadata } from "next";
import { loadSheet } from "./load-sheet";
import { SheetClient } from "./sheet-client";

export const metadata: Metadata = { title: "Sheet" };

export default async function SheetPage({ params }: { params: Promise<{ orgSlug: string; projectId: string; sheetId: string }> }) {
  const { orgSlug, projectId, sheetId } = await params;
  const { sheet, canWrite } = await loadSheet(orgSlug, projectId, sheetId);
  return <SheetClient orgSlug={orgSlug} projectId={projectId} sheet={sheet} canWrite={canWrite} />;
}
