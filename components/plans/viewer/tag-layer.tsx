"use client";

import { useMemo } from "react";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import type { Point } from "@/lib/plans/calibration";
import { toScreen, type ViewportLike } from "@/lib/plans/viewer/coordinates";
import { tintAt, type Tint } from "@/lib/plans/viewer/palette";
import { TagChip } from "./tag-chip";
import type { ViewerTag } from "./use-sheet-data";

const UNKNOWN: Tint = { name: "unknown", fill: "#ffffff", text: "#1f2225" };

/**
 * Below this zoom (CSS px per PDF unit) the chips shrink. At a sheet's fit zoom on a laptop or tablet a window
 * drawn at 1/4" = 1'-0" is 10–20 px wide, and the full chip (about 28 × 20 px) would hide it. Derived: a 3'-0"
 * window at 1/4" scale is 54 PDF units, so it is as wide as the full chip from about zoom 0.5.
 */
export const COMPACT_TAGS_BELOW_ZOOM = 0.5;

/** Tags of the sheet, placed through the viewport; a tag being dragged is drawn where the pointer has it. */
export function TagLayer(props: {
  vp: ViewportLike;
  zoom: number;
  tags: ViewerTag[];
  types: OpeningTypeView[];
  selectedId: string | null;
  dragging: { id: string; at: Point } | null;
  interactive: boolean;
  onSelect: (id: string) => void;
}) {
  const { vp, zoom, tags, types, selectedId, dragging, interactive, onSelect } = props;
  const compact = zoom < COMPACT_TAGS_BELOW_ZOOM;
  const byId = useMemo(() => new Map(types.map((t, i) => [t.id, { mark: t.mark, tint: tintAt(i) }])), [types]);
  return (
    <div className="pointer-events-none absolute inset-0 overflow-hidden">
      {tags.map((t) => {
        const type = byId.get(t.openingTypeId);
        const s = toScreen(vp, dragging?.id === t.id ? dragging.at : t);
        return (
          <TagChip
            key={t.id}
            id={t.id}
            mark={type?.mark ?? "?"}
            tint={type?.tint ?? UNKNOWN}
            x={s.x}
            y={s.y}
            selected={t.id === selectedId}
            pending={!!t.pending}
            widthMismatch={t.widthMismatch}
            interactive={interactive}
            compact={compact}
            onSelect={onSelect}
          />
        );
      })}
    </div>
  );
}
