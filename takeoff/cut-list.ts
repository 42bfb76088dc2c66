import { Fraction, inchesOut } from "./exact";
import { openingSpecKey } from "./input-key";
import { resolveOpening, resolveSpec, type ResolvedOpening, type ResolvedSpec } from "./trim-defaults";
import type { CutPiece, End, Material, Opening, Part, TrimSpec } from "./types";

interface ExactPiece {
  part: Part;
  material: Material;
  quantity: number;
  length: Fraction;
  width?: Fraction;
  ends: [End, End];
}

const SQUARE: [End, End] = ["square", "square"];
const MITERS: [End, End] = ["miter", "miter"];

/**
 * Stool-and-apron: H runs from the top of the stool to the underside of the
 * head jamb. Legs stand on the stool and meet the head at a miter (long point
 * given); the head spans both legs' outer edges; the stool adds a horn past
 * each leg; the apron sits under the stool, set in from the casing line.
 */
function stoolAndApron(o: ResolvedOpening, s: ResolvedSpec): ExactPiece[] {
  const outer = o.width.add(s.reveal.mul(2)).add(s.casingWidth.mul(2));
  const apron = outer.sub(s.apronInset.mul(2));
  if (apron.lte(0)) throw new Error("apronInset: apron inset leaves no apron for this opening width");
  const pieces: ExactPiece[] = [
    {
      part: "casing-leg",
      material: "casing",
      quantity: 2,
      length: o.height.add(s.reveal).add(s.casingWidth),
      ends: ["square", "miter"],
    },
    { part: "casing-head", material: "casing", quantity: 1, length: outer, ends: MITERS },
    {
      part: "stool",
      material: "stool",
      quantity: 1,
      length: outer.add(s.stoolHorn.mul(2)),
      width: o.setback.add(s.stoolProjection),
      ends: SQUARE,
    },
    { part: "apron", material: "apron", quantity: 1, length: apron, ends: s.apronReturns ? ["return", "return"] : SQUARE },
  ];
  // A return's long point equals the apron's thickness: it turns the profile back to the wall.
  if (s.apronReturns) {
    const ends: [End, End] = ["miter", "square"];
    pieces.push({ part: "apron-return", material: "apron", quantity: 2, length: s.casingThickness, ends });
  }
  if (o.setback.gt(0)) {
    const side = o.height.add(s.extensionThickness);
    pieces.push(
      { part: "extension-side", material: "extension", quantity: 2, length: side, width: o.setback, ends: SQUARE },
      { part: "extension-head", material: "extension", quantity: 1, length: o.width, width: o.setback, ends: SQUARE },
    );
  }
  return pieces;
}

/** Picture-frame: four casing pieces mitered at every corner; H is jamb to jamb. */
function pictureFrame(o: ResolvedOpening, s: ResolvedSpec): ExactPiece[] {
  const across = o.width.add(s.reveal.mul(2)).add(s.casingWidth.mul(2));
  const leg = o.height.add(s.reveal.mul(2)).add(s.casingWidth.mul(2));
  const pieces: ExactPiece[] = [
    { part: "casing-leg", material: "casing", quantity: 2, length: leg, ends: MITERS },
    { part: "casing-head", material: "casing", quantity: 1, length: across, ends: MITERS },
    { part: "casing-bottom", material: "casing", quantity: 1, length: across, ends: MITERS },
  ];
  if (o.setback.gt(0)) {
    const sides = o.height.add(s.extensionThickness.mul(2));
    pieces.push(
      { part: "extension-side", material: "extension", quantity: 2, length: sides, width: o.setback, ends: SQUARE },
      { part: "extension-head", material: "extension", quantity: 1, length: o.width, width: o.setback, ends: SQUARE },
      { part: "extension-bottom", material: "extension", quantity: 1, length: o.width, width: o.setback, ends: SQUARE },
    );
  }
  return pieces;
}

/** Exact (unrounded) pieces for one opening; inputs validated, Errors name the field. */
export function exactCutList(opening: Opening, spec: TrimSpec): ExactPiece[] {
  const s = resolveSpec(spec);
  const o = resolveOpening(opening);
  return s.style === "stool-and-apron" ? stoolAndApron(o, s) : pictureFrame(o, s);
}

const recent = new Map<string, CutPiece[]>();
const RECENT_LIMIT = 512;

function copy(p: CutPiece): CutPiece {
  const out: CutPiece = { part: p.part, material: p.material, quantity: p.quantity, length: p.length, ends: [p.ends[0], p.ends[1]] };
  if (p.width !== undefined) out.width = p.width;
  return out;
}

/**
 * Cut list for one opening, lengths and widths rounded to the nearest 1/16
 * (half up). A job repeats a few dozen sizes across thousands of openings, so
 * recent results are kept (only valid inputs reach the cache) and handed out
 * as fresh copies.
 */
export function cutList(opening: Opening, spec: TrimSpec): CutPiece[] {
  const key = openingSpecKey(opening, spec);
  const hit = key === undefined ? undefined : recent.get(key);
  if (hit) return hit.map(copy);
  const pieces = exactCutList(opening, spec).map((p) => {
    const { part, material, quantity } = p;
    const piece: CutPiece = { part, material, quantity, length: inchesOut(p.length), ends: [p.ends[0], p.ends[1]] };
    if (p.width !== undefined) piece.width = inchesOut(p.width);
    return piece;
  });
  if (key !== undefined) {
    if (recent.size >= RECENT_LIMIT) recent.delete(recent.keys().next().value ?? "");
    recent.set(key, pieces.map(copy));
  }
  return pieces;
}
