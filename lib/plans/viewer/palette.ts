/**
 * Tag tints, one per opening type in window-list order: woods and shop finishes, alternating dark and light so
 * neighbouring marks look different. Each tint carries the text colour (white or graphite) that reaches WCAG AA
 * (4.5:1) on it; the mark is always printed on the chip, so colour is never the only way to tell types apart.
 */

export interface Tint {
  name: string;
  fill: string;
  text: string;
}

const WHITE = "#ffffff";
const GRAPHITE = "#1f2225";

const FILLS: [string, string][] = [
  ["spruce", "#2f6b4f"],
  ["oak", "#d6a84e"],
  ["slate", "#3d5a78"],
  ["sage", "#a9bb8f"],
  ["cedar", "#9b5a2e"],
  ["ash", "#cfc8b8"],
  ["purpleheart", "#6a3f6b"],
  ["pine", "#e2c06a"],
  ["verdigris", "#2e7d76"],
  ["maple", "#ecd7a6"],
  ["walnut", "#5c3b28"],
  ["moss", "#5d6b2f"],
];

function channel(v: number): number {
  const c = v / 255;
  return c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
}

/** WCAG 2.x relative luminance of a #rrggbb colour. */
export function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => channel(parseInt(hex.slice(i, i + 2), 16)));
  return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
}

export function contrastRatio(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((p, q) => q - p);
  return (hi! + 0.05) / (lo! + 0.05);
}

/** Whichever of white and graphite reads better on the fill. */
export function textOn(fill: string): string {
  return contrastRatio(fill, WHITE) >= contrastRatio(fill, GRAPHITE) ? WHITE : GRAPHITE;
}

export const TINTS: readonly Tint[] = FILLS.map(([name, fill]) => ({ name, fill, text: textOn(fill) }));

/** The tint of the n-th opening type of the list; past twelve the tints repeat (the marks still differ). */
export function tintAt(index: number): Tint {
  const n = TINTS.length;
  return TINTS[((index % n) + n) % n]!;
}
