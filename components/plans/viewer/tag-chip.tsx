"use client";

import { memo } from "react";
import type { Tint } from "@/lib/plans/viewer/palette";

interface Props {
  id: string;
  mark: string;
  tint: Tint;
  x: number;
  y: number;
  selected: boolean;
  pending: boolean;
  widthMismatch: boolean;
  interactive: boolean;
  /** Zoomed far out: a smaller chip with a smaller mark, so it does not cover the window it marks. */
  compact: boolean;
  onSelect: (id: string) => void;
}

/**
 * Our tag marker: a small rounded chip, centred on the tagged spot, showing the type's mark in the type's tint,
 * with a white keyline so it reads over linework. Selected: a graphite ring outside the keyline and a lift.
 * A measured width that disagrees with the type gets a notched "≠" badge at the corner, so the flag does not
 * rely on colour. Screen-sized at every zoom.
 */
export const TagChip = memo(function TagChip({ id, mark, tint, x, y, selected, pending, widthMismatch, interactive, compact, onSelect }: Props) {
  return (
    <button
      type="button"
      data-tag-id={interactive && !pending ? id : undefined}
      tabIndex={interactive && !pending ? 0 : -1}
      aria-pressed={selected}
      aria-label={`Tag ${mark}${widthMismatch ? ", measured width differs from the type" : ""}${pending ? ", saving" : ""}`}
      onClick={(e) => {
        // Pointer clicks are handled by the viewer's gestures; this is for Enter/Space on a focused chip.
        if (e.detail === 0) onSelect(id);
      }}
      data-compact={compact || undefined}
      className={`absolute flex -translate-x-1/2 -translate-y-1/2 items-center justify-center border leading-none font-bold tracking-tight whitespace-nowrap shadow-[0_0_0_1.5px_white] select-none ${
        compact ? "h-3 min-w-3.5 rounded-[3px] px-0.5 text-[7px]" : "h-5 min-w-7 rounded-[5px] px-1.5 text-[11px]"
      } ${
        selected ? "z-10 scale-125 border-graphite-900 outline-2 outline-offset-[3px] outline-graphite-900" : "border-graphite-900/60"
      } ${pending ? "border-dashed opacity-70" : ""} ${interactive && !pending ? "pointer-events-auto cursor-grab touch-none" : "pointer-events-none"}`}
      style={{ left: x, top: y, backgroundColor: tint.fill, color: tint.text }}
    >
      {mark}
      {widthMismatch && (
        <span
          aria-hidden
          className={`absolute flex items-center justify-center rounded-sm border border-graphite-900 bg-white font-bold text-graphite-900 shadow-[0_0_0_1px_white] ${
            compact ? "-top-1.5 -right-1.5 h-2.5 w-2.5 text-[6px]" : "-top-2.5 -right-2.5 h-4 w-4 text-[10px]"
          }`}
          style={{ clipPath: "polygon(0 0, 100% 0, 100% 100%, 30% 100%, 0 70%)" }}
        >
          ≠
        </span>
      )}
    </button>
  );
});
