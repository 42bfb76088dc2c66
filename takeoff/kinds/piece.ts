import { Fraction, inchesOut } from "../exact";
import type { ResolvedSpec } from "../trim-defaults";
import type { CutPiece, End, Material, Part } from "../types";

/**
 * A piece before rounding. Straight geometry stays an exact Fraction; lengths that go through π or a
 * trigonometric function are irrational, so they are carried as the nearest double from exact inputs
 * and rounded to 1/16 once, on the way out, like the rest.
 */
export interface ExactPiece {
  part: Part;
  material: Material;
  quantity: number;
  length: Fraction | number;
  width?: Fraction | number;
  ends: [End, End];
  cutAngles?: [number, number];
  edgeBevel?: number;
  radius?: Fraction | number;
  sweep?: number;
}

export const SQUARE: [End, End] = ["square", "square"];
export const MITERS: [End, End] = ["miter", "miter"];

/** Nearest 1/16, half up, for an exact or a double value. */
export function sixteenth(x: Fraction | number): number {
  return typeof x === "number" ? Math.floor(x * 16 + 0.5) / 16 : inchesOut(x);
}

/** Angles reach the crew to a hundredth of a degree, finer than any saw's scale. */
export function degrees(radians: number): number {
  return Math.round((radians * 180) / Math.PI * 100) / 100;
}

export function roundOut(p: ExactPiece): CutPiece {
  const piece: CutPiece = { part: p.part, material: p.material, quantity: p.quantity, length: sixteenth(p.length), ends: [p.ends[0], p.ends[1]] };
  if (p.width !== undefined) piece.width = sixteenth(p.width);
  if (p.cutAngles !== undefined) piece.cutAngles = [p.cutAngles[0], p.cutAngles[1]];
  if (p.edgeBevel !== undefined) piece.edgeBevel = p.edgeBevel;
  if (p.radius !== undefined) piece.radius = sixteenth(p.radius);
  if (p.sweep !== undefined) piece.sweep = p.sweep;
  return piece;
}

/** Pieces of the same part, size and cuts become one line with the quantities added (units of equal width). */
export function mergeAlike(pieces: readonly ExactPiece[]): ExactPiece[] {
  const out: ExactPiece[] = [];
  const key = (p: ExactPiece) =>
    [p.part, p.material, String(p.length), String(p.width ?? ""), p.ends.join(","), String(p.cutAngles ?? ""), String(p.edgeBevel ?? ""), String(p.radius ?? ""), String(p.sweep ?? "")].join("|");
  const seen = new Map<string, ExactPiece>();
  for (const p of pieces) {
    const k = key(p);
    const hit = seen.get(k);
    if (hit) hit.quantity += p.quantity;
    else {
      const copy = { ...p };
      seen.set(k, copy);
      out.push(copy);
    }
  }
  return out;
}

/**
 * Stool, apron and apron returns under an opening whose casing is `outer` across (outer leg edge to
 * outer leg edge): the stool runs a horn past each leg, the apron is set in from the casing line and a
 * return's long point equals the apron's thickness (as for the rectangular window).
 */
export function sillPieces(outer: Fraction, setback: Fraction, s: ResolvedSpec): ExactPiece[] {
  const apron = outer.sub(s.apronInset.mul(2));
  if (apron.lte(0)) throw new Error("apronInset: apron inset leaves no apron for this opening width");
  const pieces: ExactPiece[] = [
    { part: "stool", material: "stool", quantity: 1, length: outer.add(s.stoolHorn.mul(2)), width: setback.add(s.stoolProjection), ends: SQUARE },
    { part: "apron", material: "apron", quantity: 1, length: apron, ends: s.apronReturns ? ["return", "return"] : SQUARE },
  ];
  if (s.apronReturns) pieces.push({ part: "apron-return", material: "apron", quantity: 2, length: s.casingThickness, ends: ["miter", "square"] });
  return pieces;
}

/** Jamb extensions of one rectangular unit: sides run past the head (and, picture-frame, the bottom) by t. */
export function unitExtensions(width: Fraction, height: Fraction, setback: Fraction, s: ResolvedSpec): ExactPiece[] {
  if (setback.lte(0)) return [];
  const pf = s.style === "picture-frame";
  const side = height.add(s.extensionThickness.mul(pf ? 2 : 1));
  const pieces: ExactPiece[] = [
    { part: "extension-side", material: "extension", quantity: 2, length: side, width: setback, ends: SQUARE },
    { part: "extension-head", material: "extension", quantity: 1, length: width, width: setback, ends: SQUARE },
  ];
  if (pf) pieces.push({ part: "extension-bottom", material: "extension", quantity: 1, length: width, width: setback, ends: SQUARE });
  return pieces;
}
