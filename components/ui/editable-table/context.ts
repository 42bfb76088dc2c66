"use client";

import { createContext, useContext } from "react";

export type RowNotice = { tone: "info" | "error"; text: string };
/** Messages keyed by field or column, as a save answers them. */
export type FieldErrors = Record<string, string>;

/**
 * What an editable table's cells need from its page. Column definitions stay stable (TanStack Table
 * rebuilds its models when they change), so the parts that change on every edit reach the cells through
 * context instead. Methods, not function properties: a table's own controls (its row and column types)
 * then stand in where the shared cells expect the general ones.
 */
export interface EditableControls<Row, Column extends string = string> {
  canWrite: boolean;
  editing: { rowId: string; column: Column } | null;
  startEdit(rowId: string, column: Column): void;
  /** Closes this cell's editor, unless another cell's has opened since (a save on blur ends late). */
  stopEdit(rowId: string, column: Column): void;
  remove(row: Row): void;
  /** The row whose delete is under way. */
  removing: string | null;
  notices: Record<string, RowNotice>;
  dismiss(rowId: string): void;
}

/** A context for one table's controls and the hook that reads it, refusing to run outside it. */
export function controlsContext<C>(outside: string) {
  const Context = createContext<C | null>(null);
  function useControls(): C {
    const controls = useContext(Context);
    if (!controls) throw new Error(outside);
    return controls;
  }
  return [Context, useControls] as const;
}

/** The shared cells' view of whichever table they are in; <EditableTable> provides it. */
export const [EditableControlsContext, useEditableControls] = controlsContext<EditableControls<unknown>>(
  "Editable table cells render inside <EditableTable>.",
);
