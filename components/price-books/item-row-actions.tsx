"use client";

import { Button } from "@/components/ui/button";
import type { PriceBookItemView } from "@/lib/price-book/types";
import { useItemsControls } from "./items-context";

export function ItemRowActions({ row }: { row: PriceBookItemView }) {
  const { canWrite, remove, removing } = useItemsControls();
  if (!canWrite) return null;
  const busy = removing === row.id;
  return (
    <Button
      look="danger"
      className="px-1.5 py-0.5 text-xs"
      title={`Delete ${row.name}`}
      disabled={busy}
      onClick={() => {
        if (confirm(`Delete "${row.name}" from this price book?`)) remove(row);
      }}
      aria-label={`Delete ${row.name}`}
    >
      {busy ? "…" : <span aria-hidden>✕</span>}
    </Button>
  );
}
