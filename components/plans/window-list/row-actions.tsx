"use client";

import { DeleteRowButton } from "@/components/ui/delete-row-button";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import { useWindowListControls } from "./window-list-context";

export function RowActions({ row }: { row: OpeningTypeView }) {
  const { canWrite, remove, removing } = useWindowListControls();
  if (!canWrite) return null;
  return <DeleteRowButton what={row.mark} question={`Delete opening type ${row.mark} from the window list?`} busy={removing === row.id} onDelete={() => remove(row)} />;
}
