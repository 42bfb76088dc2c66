"use client";

import { Button } from "@/components/ui/button";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import { useWindowListControls } from "./window-list-context";

export function RowActions({ row }: { row: OpeningTypeView }) {
  const { canWrite, remove, removing } = useWindowListControls();
  if (!canWrite) return null;
  const busy = removing === row.id;
  return (
    <Button
      look="danger"
      className="px-1.5 py-0.5 text-xs"
      title={`Delete ${row.mark}`}
      disabled={busy}
      onClick={() => {
        if (confirm(`Delete opening type ${row.mark} from the window list?`)) remove(row);
      }}
      aria-label={`Delete ${row.mark}`}
    >
      {busy ? "…" : <span aria-hidden>✕</span>}
    </Button>
  );
}
