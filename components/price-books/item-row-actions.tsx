"use client";

import { DeleteRowButton } from "@/components/ui/delete-row-button";
import type { PriceBookItemView } from "@/lib/price-book/types";
import { useItemsControls } from "./items-context";

export function ItemRowActions({ row }: { row: PriceBookItemView }) {
  const { canWrite, remove, removing } = useItemsControls();
  if (!canWrite) return null;
  return <DeleteRowButton what={row.name} question={`Delete "${row.name}" from this price book?`} busy={removing === row.id} onDelete={() => remove(row)} />;
}
