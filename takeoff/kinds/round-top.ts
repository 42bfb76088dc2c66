import { exact, Fraction } from "../exact";
import type { ResolvedSpec } from "../trim-defaults";
import type { RoundTopOpening } from "../types";
import { MITERS, SQUARE, sillPieces, type ExactPiece } from "./piece";

/**
 * A half-round head of diameter = width on straight legs (issue 12 contract). The half-circle's centre
 * sits on the spring line, so the casing ring and the legs meet there on a horizontal line: legs are
 * cut square at the spring line. The arch is one `casing-arch` whose length is its outer edge,
 * π·(width/2 + r + w), with `radius` its inner edge, width/2 + r. Stool, apron and picture-frame bottom
 * come from OD = width + 2r + 2w as for a rectangle. Extensions: two sides and one bent arch of π·width/2.
 *
 * Picture-frame (derived, beyond the contract's stool-and-apron wording): legs rise from the bottom
 * miter, springHeight + r + w to the long point, square at the spring line; extension sides run past the
 * bottom extension by t, as the rectangular picture-frame's do.
 */
export function roundTopPieces(o: RoundTopOpening, s: ResolvedSpec): ExactPiece[] {
  const width = exact(o.width);
  const spring = exact(o.springHeight);
  const setback = exact(o.setback);
  const half = width.div(2);
  const inner = half.add(s.reveal);
  const outer = width.add(s.reveal.mul(2)).add(s.casingWidth.mul(2));
  const pf = s.style === "picture-frame";
  const arch: ExactPiece = {
    part: "casing-arch",
    material: "casing",
    quantity: 1,
    length: Math.PI * inner.add(s.casingWidth).valueOf(),
    radius: inner,
    sweep: 180,
    ends: SQUARE,
  };
  const pieces: ExactPiece[] = pf
    ? [
        { part: "casing-leg", material: "casing", quantity: 2, length: spring.add(s.reveal).add(s.casingWidth), ends: ["miter", "square"] },
        arch,
        { part: "casing-bottom", material: "casing", quantity: 1, length: outer, ends: MITERS },
      ]
    : [{ part: "casing-leg", material: "casing", quantity: 2, length: spring, ends: SQUARE }, arch, ...sillPieces(outer, setback, s)];
  if (setback.gt(0)) pieces.push(...archExtensions(width, spring, setback, s, Math.PI * half.valueOf(), half, 180));
  return pieces;
}

/** Extension sides up to the spring line, one bent arch strip, and (picture-frame) a bottom. */
export function archExtensions(
  width: Fraction,
  spring: Fraction,
  setback: Fraction,
  s: ResolvedSpec,
  arc: number,
  radius: Fraction,
  sweep: number,
): ExactPiece[] {
  const pf = s.style === "picture-frame";
  const pieces: ExactPiece[] = [
    { part: "extension-side", material: "extension", quantity: 2, length: pf ? spring.add(s.extensionThickness) : spring, width: setback, ends: SQUARE },
    { part: "extension-arch", material: "extension", quantity: 1, length: arc, width: setback, radius, sweep, ends: SQUARE },
  ];
  if (pf) pieces.push({ part: "extension-bottom", material: "extension", quantity: 1, length: width, width: setback, ends: SQUARE });
  return pieces;
}
