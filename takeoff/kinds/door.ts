import { exact } from "../exact";
import type { ResolvedSpec } from "../trim-defaults";
import type { DoorOpening } from "../types";
import { MITERS, type ExactPiece } from "./piece";

/**
 * A cased door (issue 12 contract): per side two legs square on the floor and mitered at the head,
 * height + r + w to the long point, and one head of width + 2r + 2w; no stool, apron or extensions, and
 * the spec's style does not apply. Interior doors are cased both sides, exterior doors one.
 */
export function doorPieces(o: DoorOpening, s: ResolvedSpec): ExactPiece[] {
  const width = exact(o.width);
  const height = exact(o.height);
  return [
    { part: "casing-leg", material: "casing", quantity: 2 * o.sides, length: height.add(s.reveal).add(s.casingWidth), ends: ["square", "miter"] },
    { part: "casing-head", material: "casing", quantity: o.sides, length: width.add(s.reveal.mul(2)).add(s.casingWidth.mul(2)), ends: MITERS },
  ];
}
