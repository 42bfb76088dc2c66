"use client";

import { SheetViewer } from "@/components/plans/viewer/sheet-viewer";
import type { SheetView } from "@/lib/plans/api-types";

/** The sheet viewer for one sheet; `canWrite` false (project managers) leaves it read-only with measuring. */
export function SheetClient({ orgSlug, projectId, sheet, canWrite }: { orgSlug: string; projectId: string; sheet: SheetView; canWrite: boolean }) {
  return (
    <SheetViewer
      key={sheet.id}
      scope={{ orgSlug, projectId, sheetId: sheet.id }}
      initialSheet={sheet}
      canWrite={canWrite}
      plansHref={`/${orgSlug}/projects/${projectId}/plans`}
    />
  );
}
