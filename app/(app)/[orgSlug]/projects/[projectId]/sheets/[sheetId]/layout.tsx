import type { ReactNode } from "react";
import { loadSheet } from "./load-sheet";

export default async function SheetLayout({ children, params }: { children: ReactNode; params: Promise<{ orgSlug: string; projectId: string; sheetId: string }> }) {
  const { orgSlug, projectId, sheetId } = await params;
  await loadSheet(orgSlug, projectId, sheetId);
  return children;
}
