import { cutList } from "./cut-list";
import { takeoffLineSchema } from "./schemas";
import type { CutPiece, Material, Part, TakeoffLine } from "./types";
import { parseOrThrow } from "./validate";

/** The fixed reporting order of materials: the order a carpenter installs them. */
export const MATERIALS: readonly Material[] = ["casing", "stool", "apron", "extension"];

/** One rounded piece size across a whole job, with the parts that need it. */
export interface PieceDemand {
  material: Material;
  length: number;
  width?: number;
  quantity: number;
  parts: Part[];
}

function lineKey(line: TakeoffLine): string {
  const { opening: o, spec: s } = line;
  return JSON.stringify([o.width, o.height, o.setback, s.style, s.casingWidth, s.casingThickness, s.reveal, s.stoolHorn,
    s.stoolProjection, s.apronInset, s.apronReturns, s.extensionThickness]);
}

/**
 * Cut lists for a job, computed once per distinct opening+spec (a job of
 * thousands of openings repeats a few dozen sizes), with each piece's count
 * multiplied by its line's quantity. Lines are validated; Errors name the line.
 */
export function jobPieces(lines: readonly TakeoffLine[]): { piece: CutPiece; count: number; line: TakeoffLine }[] {
  const groups = new Map<string, { line: TakeoffLine; quantity: number }>();
  lines.forEach((line, i) => {
    parseOrThrow(takeoffLineSchema, line, `lines[${i}]`);
    const key = lineKey(line);
    const g = groups.get(key);
    if (g) g.quantity += line.quantity;
    else groups.set(key, { line, quantity: line.quantity });
  });
  const out: { piece: CutPiece; count: number; line: TakeoffLine }[] = [];
  for (const { line, quantity } of groups.values()) {
    if (quantity === 0) continue;
    for (const piece of cutList(line.opening, line.spec)) out.push({ piece, count: piece.quantity * quantity, line });
  }
  return out;
}

/** Job pieces merged by material, width and rounded length (what the saw sees). */
export function pieceDemand(lines: readonly TakeoffLine[]): PieceDemand[] {
  const merged = new Map<string, PieceDemand>();
  for (const { piece, count } of jobPieces(lines)) {
    const key = `${piece.material}|${piece.width ?? ""}|${piece.length}`;
    const d = merged.get(key);
    if (d) {
      d.quantity += count;
      if (!d.parts.includes(piece.part)) d.parts.push(piece.part);
    } else {
      const entry: PieceDemand = { material: piece.material, length: piece.length, quantity: count, parts: [piece.part] };
      if (piece.width !== undefined) entry.width = piece.width;
      merged.set(key, entry);
    }
  }
  return [...merged.values()].sort(
    (a, b) => MATERIALS.indexOf(a.material) - MATERIALS.indexOf(b.material) || (a.width ?? 0) - (b.width ?? 0) || b.length - a.length,
  );
}
