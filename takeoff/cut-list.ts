import { openingSpecKey } from "./input-key";
import { bayPieces } from "./kinds/bay";
import { doorPieces } from "./kinds/door";
import { mulledPieces } from "./kinds/mulled";
import { roundOut, type ExactPiece } from "./kinds/piece";
import { roundTopPieces } from "./kinds/round-top";
import { segmentTopPieces } from "./kinds/segment-top";
import { windowPieces } from "./kinds/window";
import { openingSchema } from "./schemas";
import { resolveOpening, resolveSpec } from "./trim-defaults";
import type { CutPiece, Opening, TrimSpec } from "./types";
import { parseOrThrow } from "./validate";

/**
 * Exact (unrounded) pieces for one opening; `opening.kind` picks the geometry (omitted = "window"),
 * inputs are validated and Errors name the field.
 */
export function exactCutList(opening: Opening, spec: TrimSpec): ExactPiece[] {
  const s = resolveSpec(spec);
  const o = parseOrThrow(openingSchema, opening);
  switch (o.kind) {
    case undefined:
    case "window":
      return windowPieces(resolveOpening(o), s);
    case "mulled":
      return mulledPieces(o, s);
    case "door":
      return doorPieces(o, s);
    case "round-top":
      return roundTopPieces(o, s);
    case "segment-top":
      return segmentTopPieces(o, s);
    case "bay":
      return bayPieces(o, s);
  }
}

const recent = new Map<string, CutPiece[]>();
const RECENT_LIMIT = 512;

function copy(p: CutPiece): CutPiece {
  const out: CutPiece = { part: p.part, material: p.material, quantity: p.quantity, length: p.length, ends: [p.ends[0], p.ends[1]] };
  if (p.width !== undefined) out.width = p.width;
  if (p.cutAngles !== undefined) out.cutAngles = [p.cutAngles[0], p.cutAngles[1]];
  if (p.edgeBevel !== undefined) out.edgeBevel = p.edgeBevel;
  if (p.radius !== undefined) out.radius = p.radius;
  if (p.sweep !== undefined) out.sweep = p.sweep;
  if (p.scarf !== undefined) out.scarf = { ...p.scarf };
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
  const pieces = exactCutList(opening, spec).map(roundOut);
  if (key !== undefined) {
    if (recent.size >= RECENT_LIMIT) recent.delete(recent.keys().next().value ?? "");
    recent.set(key, pieces.map(copy));
  }
  return pieces;
}
