"use client";

import { useState } from "react";
import { CellEditorShell } from "@/components/ui/editable-table/cell-editor-shell";
import { CellInput, CellSelect } from "@/components/ui/editable-table/cell-fields";
import { KIND_OPTIONS, columnLabel, editText, priceColumnLength, type ItemColumn } from "@/lib/price-books/item-edit";
import type { PriceBookItemView } from "@/lib/price-books/types";
import { useItemsControls } from "./items-context";

const PLACEHOLDERS: Partial<Record<string, string>> = { faceWidth: "2 1/2", thickness: "11/16", species: "Poplar", supplierCode: "none" };

/** An items-table cell in edit mode; an emptied price cell stops selling that length. */
export function ItemCellEditor({ row, column }: { row: PriceBookItemView; column: ItemColumn }) {
  const { commit } = useItemsControls();
  const [text, setText] = useState(() => editText(row, column));
  const isPrice = priceColumnLength(column) !== null;
  const numeric = isPrice || column === "faceWidth" || column === "thickness";
  const label = `${columnLabel(column)} of ${row.name}`;

  return (
    <CellEditorShell rowId={row.id} column={column} save={() => commit(row, column, text)} labelOf={columnLabel} errorsAtEnd={numeric}>
      {(field) =>
        column === "kind" ? (
          <CellSelect field={field} label={label} value={text} onChange={setText} options={KIND_OPTIONS} />
        ) : (
          <CellInput
            field={field}
            label={isPrice ? `${label} (dollars; empty to stop selling this length)` : label}
            value={text}
            onChange={setText}
            placeholder={isPrice ? "not sold" : PLACEHOLDERS[column]}
            numeric={numeric}
            size={column === "name" || column === "species" ? 22 : 8}
          />
        )
      }
    </CellEditorShell>
  );
}
