/**
 * "Same tag layout": two sheets carry the same multiset of opening types at about the same places once
 * each sheet's tags are normalised to their own extent. Normalising to the tags (not the page) makes a
 * repeat of a unit plan match whether it was drawn at the same spot, moved on the page or enlarged; a
 * mirrored or different plan does not match. Derived (our own rule), used only to warn.
 */
export interface LayoutTag {
  openingTypeId: string;
  x: number;
  y: number;
}

/** How far apart two matched tags may sit, as a share of the layout's larger extent. */
export const LAYOUT_TOLERANCE = 0.03;

interface Point {
  type: string;
  x: number;
  y: number;
}

/** Translate to the tags' bounding-box corner and scale by its larger side (uniform, so shapes keep). */
export function normaliseLayout(tags: readonly LayoutTag[]): Point[] {
  if (tags.length === 0) return [];
  const xs = tags.map((t) => t.x);
  const ys = tags.map((t) => t.y);
  const minX = Math.min(...xs);
  const minY = Math.min(...ys);
  const extent = Math.max(Math.max(...xs) - minX, Math.max(...ys) - minY);
  // All tags on one spot (or a single tag): every position normalises to the origin.
  const scale = extent > 0 ? 1 / extent : 0;
  return tags.map((t) => ({ type: t.openingTypeId, x: (t.x - minX) * scale, y: (t.y - minY) * scale }));
}

const typeCounts = (tags: readonly LayoutTag[]) => {
  const m = new Map<string, number>();
  for (const t of tags) m.set(t.openingTypeId, (m.get(t.openingTypeId) ?? 0) + 1);
  return m;
};

/**
 * True when both sheets have tags, the same number of each opening type, and every tag of one has an
 * unmatched tag of the same type on the other within the tolerance. Matching takes the closest pairs
 * first, so a tight cluster cannot steal a partner from a tag that has only one candidate in reach.
 */
export function sameTagLayout(a: readonly LayoutTag[], b: readonly LayoutTag[], tolerance = LAYOUT_TOLERANCE): boolean {
  if (a.length === 0 || a.length !== b.length) return false;
  const ca = typeCounts(a);
  const cb = typeCounts(b);
  if (ca.size !== cb.size) return false;
  for (const [type, n] of ca) if (cb.get(type) !== n) return false;

  const pa = normaliseLayout(a);
  const pb = normaliseLayout(b);
  const pairs: { i: number; j: number; d: number }[] = [];
  pa.forEach((p, i) =>
    pb.forEach((q, j) => {
      if (p.type !== q.type) return;
      const d = Math.hypot(p.x - q.x, p.y - q.y);
      if (d <= tolerance) pairs.push({ i, j, d });
    }),
  );
  pairs.sort((x, y) => x.d - y.d);
  const usedA = new Set<number>();
  const usedB = new Set<number>();
  for (const { i, j } of pairs) {
    if (usedA.has(i) || usedB.has(j)) continue;
    usedA.add(i);
    usedB.add(j);
  }
  return usedA.size === pa.length;
}

/** Groups of sheet ids (two or more) whose tag layouts match pairwise with the group's first sheet. */
export function duplicateLayouts(sheets: readonly { sheetId: string; tags: readonly LayoutTag[] }[]): string[][] {
  const groups: { first: readonly LayoutTag[]; ids: string[] }[] = [];
  for (const s of sheets) {
    if (s.tags.length === 0) continue;
    const group = groups.find((g) => sameTagLayout(g.first, s.tags));
    if (group) group.ids.push(s.sheetId);
    else groups.push({ first: s.tags, ids: [s.sheetId] });
  }
  return groups.filter((g) => g.ids.length > 1).map((g) => g.ids);
}
