"use client";

import type { OpeningTypeView } from "@/lib/plans/api-types";
import { KIND_CHOICES } from "@/lib/plans/window-list/new-opening";
import { openingSizeText } from "@/lib/takeoffs/opening-size";
import { openingOf } from "@/takeoff";

/**
 * The line's kind, and for every kind but a window its own fields in words (unit widths, door sides,
 * spring line). Read-only here: a kind is chosen when the line is added.
 */
export function KindCell({ row }: { row: OpeningTypeView }) {
  const label = KIND_CHOICES.find((k) => k.value === row.kind)?.label.replace(/ \(.*\)$/, "") ?? row.kind;
  if (row.kind === "window") return <span className="inline-block py-1 text-graphite-700">{label}</span>;
  return (
    <span className="inline-block py-1" title={openingSizeText(openingOf({ ...row, shape: row.shape ?? undefined }))}>
      <span className="font-medium">{label}</span>
      <span className="block text-xs text-graphite-600">{openingSizeText(openingOf({ ...row, shape: row.shape ?? undefined })).replace(/ · setback.*$/, "")}</span>
    </span>
  );
}
