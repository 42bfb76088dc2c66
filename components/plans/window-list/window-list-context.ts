"use client";

import { controlsContext, type EditableControls, type FieldErrors } from "@/components/ui/editable-table/context";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import type { CellEdit } from "@/lib/plans/window-list/cell-patch";
import type { EditableColumn } from "@/lib/plans/window-list/columns";

export type { RowNotice } from "@/components/ui/editable-table/context";

/** The editable table's controls for the window list; `remove` deletes the type and, as the person confirmed, its `tags` tags. */
export interface WindowListControls extends EditableControls<OpeningTypeView & { tags?: number }, EditableColumn> {
  /** Resolves to the field errors to show (keyed like the API's), or null when the edit is done. */
  commit: (row: OpeningTypeView, edit: CellEdit) => Promise<FieldErrors | null>;
}

export const [WindowListContext, useWindowListControls] = controlsContext<WindowListControls>("Window list cells render inside <WindowListContext>.");
