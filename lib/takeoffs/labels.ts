import type { End, Material, Part, Style } from "@/takeoff";

/** Part names as a crew says them; the comma form keeps the extensions together when sorted. */
export const PART_LABELS: Record<Part, string> = {
  "casing-leg": "Casing leg",
  "casing-head": "Casing head",
  "casing-bottom": "Casing bottom",
  "casing-arch": "Casing arch",
  "mullion-casing": "Mullion casing",
  "seat-board": "Seat board",
  stool: "Stool",
  apron: "Apron",
  "apron-return": "Apron return",
  "extension-side": "Jamb extension, side",
  "extension-head": "Jamb extension, head",
  "extension-bottom": "Jamb extension, bottom",
  "extension-arch": "Jamb extension, arch",
};

export const MATERIAL_LABELS: Record<Material, string> = {
  casing: "Casing",
  mullion: "Mullion casing",
  stool: "Stool",
  apron: "Apron",
  extension: "Jamb extension",
};

export const STYLE_NAMES: Record<Style, string> = {
  "stool-and-apron": "Stool and apron",
  "picture-frame": "Picture frame",
};

/** Miter lengths are measured to the long point, so the label says so. */
export const END_LABELS: Record<End, string> = {
  square: "Square",
  miter: "Miter (long point)",
  return: "Return miter",
  bevel: "Bevel (long point on the back)",
  scarf: "Scarf joint",
};

/** Both ends in words: "Square both ends", or "Square / Miter (long point)" when they differ. */
export function endsText(ends: readonly [End, End]): string {
  if (ends[0] === ends[1]) return `${END_LABELS[ends[0]]}, both ends`;
  return `${END_LABELS[ends[0]]} / ${END_LABELS[ends[1]]}`;
}
