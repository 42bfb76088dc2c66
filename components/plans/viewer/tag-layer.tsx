"use client";

import { useMemo } from "react";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import type { Point } from "@/lib/plans/calibration";
import { toScreen, type ViewportLike } from "@/lib/plans/viewer/coordinates";
import { tintAt, type Tint } from "@/lib/plans/viewer/palette";
import { TagChip } from "./tag-chip";
import type { ViewerTag } from "./use-sheet-data";

const UNKNOWN: Tint = { name: "unknown", fill: "#ffffff", text: "#1f2225" };

/** Tags of the sheet, placed through the viewport; a tag being dragged is drawn where the pointer has it. */
export function TagLayer(props: {
  vp: ViewportLike;
  tags: ViewerTag[];
  types: OpeningTypeView[];
  selectedId: string | null;
  dragging: { id: string; at: Point } | null;
  interactive: boolean;
  onSelect: (id: string) => void;
}) {
  const { vp, tags, types, selectedId, dragging, interactive, onSelect } = props;
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
            onSelect={onSelect}
          />
        );
      })}
    </div>
  );
}
