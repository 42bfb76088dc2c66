/**
 * Piece names beside an elevation: one column to the right of the drawing, each name as near its piece's
 * height as the names above it allow, joined to the piece by a leader. A column keeps names off the narrow
 * casing, where text would have to shrink below what a printed sheet can show.
 */
export interface Callout {
  text: string;
  /** The point on the piece the leader touches. */
  anchor: { x: number; y: number };
}

export interface PlacedCallout extends Callout {
  /** Baseline-centre height of the name in the column. */
  y: number;
}

/** Keeps names at least `gap` apart, in anchor order, and no lower than `bottom` where possible. */
export function placeCallouts(callouts: Callout[], gap: number, bottom: number): PlacedCallout[] {
  const sorted = [...callouts].sort((a, b) => a.anchor.y - b.anchor.y);
  const placed: PlacedCallout[] = [];
  for (const c of sorted) {
    const prev = placed[placed.length - 1];
    placed.push({ ...c, y: prev ? Math.max(c.anchor.y, prev.y + gap) : c.anchor.y });
  }
  // Pushed past the drawing's foot: pin the last name there and push the others up just enough.
  const last = placed[placed.length - 1];
  if (last && last.y > bottom) {
    last.y = bottom;
    for (let i = placed.length - 2; i >= 0; i--) placed[i]!.y = Math.min(placed[i]!.y, placed[i + 1]!.y - gap);
  }
  return placed;
}

/** Rough width of a line of text: Inter averages a little over half an em per character. */
export const textWidth = (text: string, size: number) => text.length * size * 0.56;
