import { cutList } from "./cut-list";
import { openingSpecKey } from "./input-key";
import { takeoffLineSchema } from "./schemas";
import type { CutPiece, Material, Part, TakeoffLine } from "./types";
import { parseOrThrow } from "./validate";

/** The fixed reporting order of materials: the order a carpenter installs them (mullion casing with the casing). */
export const MATERIALS: readonly Material[] = ["casing", "mullion", "stool", "apron", "extension"];

/** One rounded piece size across a whole job, with the parts that need it. */
export interface PieceDemand {
  material: Material;
  length: number;
  width?: number;
  quantity: number;
  parts: Part[];
}

const quantitySchema = takeoffLineSchema.shape.quantity;

/**
 * Cut lists for a job, computed once per distinct opening+spec (a job of
 * thousands of openings repeats a few dozen sizes), with each piece's count
 * multiplied by its line's quantity. The first line of each distinct size is
 * validated in full and every line's quantity is checked; Errors name the line.
 */
export function jobPieces(lines: readonly TakeoffLine[]): { piece: CutPiece; count: number; line: TakeoffLine }[] {
  if (!Array.isArray(lines)) throw new Error("lines must be a list");
  const groups = new Map<string, { line: TakeoffLine; quantity: number }>();
  lines.forEach((line, i) => {
    const key = typeof line === "object" && line !== null ? openingSpecKey(line.opening, line.spec) : undefined;
    const group = key === undefined ? undefined : groups.get(key);
    if (group) {
      const q = line.quantity;
      group.quantity += Number.isInteger(q) && q >= 0 ? q : parseOrThrow(quantitySchema, q, `lines[${i}].quantity`);
      return;
    }
    const valid = parseOrThrow(takeoffLineSchema, line, `lines[${i}]`);
    groups.set(key ?? `#${i}`, { line, quantity: valid.quantity });
  });
  const out: { piece: CutPiece; count: number; line: TakeoffLine }[] = [];
  for (const { line, quantity } of groups.values()) {
    if (quantity === 0) continue;
    for (const piece of cutList(line.opening, line.spec)) out.push({ piece, count: piece.quantity * quantity, line });
  }
  return out;
}

/**
 * Straight job pieces merged by material, width and rounded length (what the saw sees). Curved pieces
 * (those with a radius) are not cut from straight stock; takeoffTotals counts them apart.
 */
export function pieceDemand(lines: readonly TakeoffLine[]): PieceDemand[] {
  return mergeDemand(jobPieces(lines));
}

export function mergeDemand(pieces: readonly { piece: CutPiece; count: number }[]): PieceDemand[] {
  const merged = new Map<string, PieceDemand>();
  for (const { piece, count } of pieces) {
    if (piece.radius !== undefined) continue;
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
  const rank = (d: PieceDemand) => MATERIALS.indexOf(d.material);
  return [...merged.values()].sort((a, b) => rank(a) - rank(b) || (a.width ?? 0) - (b.width ?? 0) || b.length - a.length);
}
