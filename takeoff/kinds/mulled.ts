import { exact, Fraction, sumFractions } from "../exact";
import { formatLength } from "../length-format";
import type { ResolvedSpec } from "../trim-defaults";
import type { MulledOpening } from "../types";
import { mergeAlike, MITERS, SQUARE, sillPieces, unitExtensions, type ExactPiece } from "./piece";

/**
 * Two or more units joined at mulls under one continuous head (issue 12 contract). The outside
 * dimension OD = Σwidths + (n−1)·mullGap + 2r + 2w carries one head (and picture-frame one bottom); the
 * outer legs are a single window's; each mull gets one mullion casing as wide as the gap less a reveal
 * each side, square both ends, standing on the stool under the head (H + r) or between head and bottom
 * (picture-frame, H + 2r). Extensions are per unit, as for a single window of that unit's width.
 */
export function mulledPieces(o: MulledOpening, s: ResolvedSpec): ExactPiece[] {
  const widths = o.widths.map(exact);
  const height = exact(o.height);
  const setback = exact(o.setback);
  const gap = exact(o.mullGap);
  const mullFace = gap.sub(s.reveal.mul(2));
  if (mullFace.lte(0)) {
    throw new Error(`mullGap: mull gap must be more than twice the reveal (${formatLength(s.reveal.mul(2).valueOf())}) to leave a mullion casing`);
  }
  const mulls = widths.length - 1;
  const outer = sumFractions(widths).add(gap.mul(mulls)).add(s.reveal.mul(2)).add(s.casingWidth.mul(2));
  const pf = s.style === "picture-frame";
  const pieces: ExactPiece[] = pf
    ? [
        { part: "casing-leg", material: "casing", quantity: 2, length: height.add(s.reveal.mul(2)).add(s.casingWidth.mul(2)), ends: MITERS },
        { part: "casing-head", material: "casing", quantity: 1, length: outer, ends: MITERS },
        { part: "casing-bottom", material: "casing", quantity: 1, length: outer, ends: MITERS },
      ]
    : [
        { part: "casing-leg", material: "casing", quantity: 2, length: height.add(s.reveal).add(s.casingWidth), ends: ["square", "miter"] },
        { part: "casing-head", material: "casing", quantity: 1, length: outer, ends: MITERS },
      ];
  pieces.push({
    part: "mullion-casing",
    material: "mullion",
    quantity: mulls,
    length: height.add(s.reveal.mul(pf ? 2 : 1)),
    width: mullFace,
    ends: SQUARE,
  });
  if (!pf) pieces.push(...sillPieces(outer, setback, s));
  return mergeAlike([...pieces, ...widths.flatMap((w: Fraction) => unitExtensions(w, height, setback, s))]);
}
