"use client";

import { createContext, useContext } from "react";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import type { CellEdit } from "@/lib/plans/window-list/cell-patch";
import type { EditableColumn } from "@/lib/plans/window-list/columns";

export type RowNotice = { tone: "info" | "error"; text: string };

/**
 * What the table's cells need from the page. Column definitions live at module scope (TanStack Table
 * wants them stable), so the changing parts reach the cells through this context instead.
 */
export interface WindowListControls {
  canWrite: boolean;
  editing: { rowId: string; column: EditableColumn } | null;
  startEdit: (rowId: string, column: EditableColumn) => void;
  /** Closes this cell's editor, unless another cell's has opened since (a save on blur ends late). */
  stopEdit: (rowId: string, column: EditableColumn) => void;
  /** Resolves to the field errors to show (keyed like the API's), or null when the edit is done. */
  commit: (row: OpeningTypeView, edit: CellEdit) => Promise<Record<string, string> | null>;
  /** Deletes the type and, as the person confirmed, its `tags` tags. */
  remove: (row: OpeningTypeView & { tags?: number }) => void;
  removing: string | null;
  notices: Record<string, RowNotice>;
  dismiss: (rowId: string) => void;
}

export const WindowListContext = createContext<WindowListControls | null>(null);

export function useWindowListControls(): WindowListControls {
  const controls = useContext(WindowListContext);
  if (!controls) throw new Error("Window list cells render inside <WindowListContext>.");
  return controls;
}
