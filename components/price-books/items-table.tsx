"use client";

import { useMemo } from "react";
import { EditableTable, type EditableTableSpec } from "@/components/ui/editable-table/editable-table";
import { KIND_OPTIONS } from "@/lib/price-books/item-edit";
import type { PriceBookItemView } from "@/lib/price-books/types";
import { buildColumns } from "./item-columns";
import { useItemsControls } from "./items-context";

const SPEC: EditableTableSpec<PriceBookItemView> = {
  caption: "Materials of this price book with their price per stock length. Column headers sort the list.",
  nameColumn: "name",
  // Seven stock lengths push the table wider than a laptop screen; the delete stays in reach.
  pinDelete: true,
  filter: {
    placeholder: "Name, species or code",
    empty: "No items match the filter.",
    selects: [{ column: "kind", label: "Kind", all: "All kinds", options: KIND_OPTIONS }],
  },
};

/** The book's items: sortable by any column, filtered by text and kind, edited in place by admins. */
export function ItemsTable({ items, lengths }: { items: PriceBookItemView[]; lengths: number[] }) {
  const controls = useItemsControls();
  // TanStack Table rebuilds its models when columns change: only when the set of lengths does.
  const columns = useMemo(() => buildColumns(lengths), [lengths]);
  return <EditableTable rows={items} columns={columns} controls={controls} spec={SPEC} />;
}
