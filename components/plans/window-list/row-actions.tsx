"use client";

import { useState } from "react";
import { ConfirmRemoval, RemovalSummary } from "@/components/plans/confirm-removal";
import { Button } from "@/components/ui/button";
import type { WindowListRow } from "./table-columns";

/** The row's delete: asks first, naming the tags and counted openings that go with the type. */
export function RowActions({ row, busy, onDelete }: { row: WindowListRow; busy: boolean; onDelete: () => void }) {
  const [asking, setAsking] = useState(false);
  return (
    <>
      <Button look="danger" className="px-1.5 py-0.5 text-xs" title={`Delete ${row.mark}`} aria-label={`Delete ${row.mark}`} disabled={busy} onClick={() => setAsking(true)}>
        {busy ? "…" : <span aria-hidden>✕</span>}
      </Button>
      <ConfirmRemoval
        open={asking}
        title={`Delete opening type ${row.mark} from the window list?`}
        confirmLabel={row.tags > 0 ? `Delete ${row.mark} and its tags` : `Delete ${row.mark}`}
        onCancel={() => setAsking(false)}
        onConfirm={() => {
          setAsking(false);
          onDelete();
        }}
      >
        <RemovalSummary tags={row.tags} openings={row.count} />
      </ConfirmRemoval>
    </>
  );
}
