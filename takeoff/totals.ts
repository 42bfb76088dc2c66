import { jobPieces, mergeDemand, MATERIALS } from "./demand";
import { exact, Fraction } from "./exact";
import { archSegments } from "./kinds/arch-segments";
import { sixteenth } from "./kinds/piece";
import type { CurvedTotal, Material, MaterialTotal, TakeoffLine } from "./types";

/**
 * Pieces and length per material over a job. Straight pieces: sums the rounded lengths (what is actually
 * cut) exactly, so linearInches is a multiple of 1/16 in; linearFeet is that exact sum divided by 12.
 * Curved pieces are counted apart (`curved`), because they are not cut from straight stock: a curved
 * casing is ordered by radius and count, or — when its spec says "segments" and gives a board width —
 * cut as flat ring segments, with the segment count, blank length and end cut (arch-segments.ts).
 */
export function takeoffTotals(lines: readonly TakeoffLine[]): MaterialTotal[] {
  const pieces = jobPieces(lines);
  const acc = new Map<string, { pieces: number; inches: Fraction }>();
  for (const d of mergeDemand(pieces)) {
    const t = acc.get(d.material) ?? { pieces: 0, inches: new Fraction(0) };
    t.pieces += d.quantity;
    t.inches = t.inches.add(exact(d.length).mul(d.quantity));
    acc.set(d.material, t);
  }
  const curved = new Map<Material, Map<string, CurvedTotal>>();
  for (const { piece, count, line } of pieces) {
    if (piece.radius === undefined || count === 0) continue;
    const group: Omit<CurvedTotal, "pieces"> = { part: piece.part, radius: piece.radius, sweep: piece.sweep ?? 0, length: piece.length };
    if (piece.material === "casing") {
      group.outerRadius = sixteenth(exact(piece.radius).add(exact(line.spec.casingWidth)));
      if (line.spec.curvedCasing === "segments" && line.spec.segmentBoardWidth !== undefined) {
        group.segments = { ...archSegments(group.radius, group.outerRadius, group.sweep, line.spec.segmentBoardWidth), blanks: 0 };
      }
    }
    const key = JSON.stringify(group);
    const byKey = curved.get(piece.material) ?? new Map<string, CurvedTotal>();
    const total = byKey.get(key) ?? { ...group, pieces: 0 };
    total.pieces += count;
    if (total.segments) total.segments.blanks = total.segments.count * total.pieces;
    byKey.set(key, total);
    curved.set(piece.material, byKey);
  }
  return MATERIALS.flatMap((material) => {
    const t = acc.get(material);
    const arcs = curved.get(material);
    if (!t && !arcs) return [];
    const inches = t?.inches ?? new Fraction(0);
    const total: MaterialTotal = { material, pieces: t?.pieces ?? 0, linearInches: inches.valueOf(), linearFeet: inches.div(12).valueOf() };
    if (arcs) total.curved = [...arcs.values()].sort((a, b) => a.part.localeCompare(b.part) || a.radius - b.radius || a.sweep - b.sweep);
    return [total];
  });
}
