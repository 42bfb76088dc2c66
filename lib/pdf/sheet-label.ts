/**
 * Finding a sheet's number ("A-201") in the text of its page. Pure, so it is tested without pdf.js.
 *
 * Heuristic (common practice, no published rule): on a plan sheet the sheet number is printed in the title
 * block, in the largest type on the sheet, and the title block sits along the bottom or right edge, most
 * often with the number in its bottom-right corner. Other sheet numbers on the page — section and detail
 * callouts ("3/A-501"), a sheet index on a cover — are smaller. So:
 *   1. collect every token shaped like a sheet number;
 *   2. keep those whose type is at least 85 % of the largest such token's size;
 *   3. of those, take the one nearest the bottom-right corner of the sheet as displayed (after /Rotate).
 * Text drawn as vector outlines (common in CAD exports) has no text to read: the label is then null and
 * the estimator types it.
 */

/**
 * A discipline designator of one or two capitals, an optional hyphen, then a sheet number of three to five
 * digits with at most one inner point: A-201, A201, A2.01, A-101.1, AD-1.01. Tokens of one or two digits
 * (window marks W1, grid lines A1, room names B2) are excluded on purpose.
 */
const SHEET_NUMBER = /(?<![A-Za-z0-9.\-/])([A-Z]{1,2})(-?)(\d{1,4}(?:\.\d{1,3})?)(?![A-Za-z0-9]|\.\d)/g;

const MIN_DIGITS = 3;
const MAX_DIGITS = 5;
/** Tokens within this share of the largest candidate's size count as "largest" (step 2). */
const SIZE_TOLERANCE = 0.85;

/** Every sheet-number-shaped token in a text string, in order. */
export function sheetNumbersIn(text: string): string[] {
  const found: string[] = [];
  for (const m of text.matchAll(SHEET_NUMBER)) {
    const digits = (m[3] ?? "").replace(".", "").length;
    if (digits >= MIN_DIGITS && digits <= MAX_DIGITS) found.push(m[0]);
  }
  return found;
}

export interface TextOnSheet {
  text: string;
  /** Type size in page units. */
  size: number;
  /** Position as displayed, 0–1 across the sheet from the left edge. */
  x: number;
  /** Position as displayed, 0–1 down the sheet from the top edge. */
  y: number;
}

export function pickSheetLabel(items: readonly TextOnSheet[]): string | null {
  const candidates = items.flatMap((item) => sheetNumbersIn(item.text).map((label) => ({ ...item, label })));
  if (candidates.length === 0) return null;
  const largest = Math.max(...candidates.map((c) => c.size));
  let best: (typeof candidates)[number] | null = null;
  let bestDistance = Infinity;
  for (const c of candidates) {
    if (c.size < largest * SIZE_TOLERANCE) continue;
    const d = Math.hypot(1 - c.x, 1 - c.y);
    if (d < bestDistance) {
      best = c;
      bestDistance = d;
    }
  }
  return best?.label ?? null;
}
