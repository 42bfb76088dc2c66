import { TRIM_DEFAULTS, type TrimSpec } from "@/takeoff";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import { STYLE_LABELS, type EditableColumn } from "./columns";
import { tape } from "./length-text";

/** A value as the engine will use it, and whether it came from a default rather than the row. */
export interface Shown<T> {
  value: T;
  isDefault: boolean;
}

const shown = <T>(set: T | undefined, fallback: T): Shown<T> =>
  set === undefined ? { value: fallback, isDefault: true } : { value: set, isDefault: false };

/** The trim values the takeoff will use for this spec: what is set, else the engine's defaults. */
export function effectiveTrim(spec: TrimSpec) {
  return {
    reveal: shown(spec.reveal, TRIM_DEFAULTS.reveal),
    stoolHorn: shown(spec.stoolHorn, spec.casingThickness * TRIM_DEFAULTS.hornPerCasingThickness),
    stoolProjection: shown(spec.stoolProjection, TRIM_DEFAULTS.stoolProjection),
    apronInset: shown(spec.apronInset, TRIM_DEFAULTS.apronInset),
    apronReturns: shown(spec.apronReturns, TRIM_DEFAULTS.apronReturns),
    extensionThickness: shown(spec.extensionThickness, TRIM_DEFAULTS.extensionThickness),
  };
}

export const casingText = (spec: TrimSpec) => `${tape(spec.casingWidth)} × ${tape(spec.casingThickness)}`;

export const apronText = (inset: number, returns: boolean) => `${inset === 0 ? "flush" : `in ${tape(inset)}`}, ${returns ? "returns" : "square"}`;

/** What a cell shows, as text (the table adds the default marking and alignment). */
export function cellText(row: OpeningTypeView, column: EditableColumn): string {
  const t = effectiveTrim(row.trimSpec);
  switch (column) {
    case "mark":
      return row.mark;
    case "width":
    case "height":
    case "setback":
      return tape(row[column]);
    case "style":
      return STYLE_LABELS[row.trimSpec.style];
    case "casing":
      return casingText(row.trimSpec);
    case "reveal":
      return tape(t.reveal.value);
    case "horn":
      return row.trimSpec.style === "picture-frame" ? "—" : tape(t.stoolHorn.value);
    case "apron":
      return row.trimSpec.style === "picture-frame" ? "—" : apronText(t.apronInset.value, t.apronReturns.value);
    case "extension":
      return tape(t.extensionThickness.value);
    case "notes":
      return row.notes ?? "";
  }
}

/** True when the cell shows a default the row does not set itself. */
export function isDefaultCell(row: OpeningTypeView, column: EditableColumn): boolean {
  const t = effectiveTrim(row.trimSpec);
  // A picture frame has no stool or apron: those cells show a dash, not a default.
  const frame = row.trimSpec.style === "picture-frame";
  if (column === "reveal") return t.reveal.isDefault;
  if (column === "horn") return !frame && t.stoolHorn.isDefault;
  if (column === "extension") return t.extensionThickness.isDefault;
  if (column === "apron") return !frame && t.apronInset.isDefault && t.apronReturns.isDefault;
  return false;
}

/**
 * What an editor starts with: the row's own value in a form the length parser reads back. Defaults
 * start empty, so leaving the field alone keeps them defaults.
 */
export function editText(row: OpeningTypeView, column: EditableColumn): string {
  const s = row.trimSpec;
  switch (column) {
    case "reveal":
      return s.reveal === undefined ? "" : tape(s.reveal);
    case "horn":
      return s.stoolHorn === undefined ? "" : tape(s.stoolHorn);
    case "extension":
      return s.extensionThickness === undefined ? "" : tape(s.extensionThickness);
    case "apron":
      return s.apronInset === undefined ? "" : tape(s.apronInset);
    case "style":
      return s.style;
    default:
      return cellText(row, column);
  }
}
