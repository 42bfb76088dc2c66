import { exact, Fraction } from "../exact";
import type { ResolvedSpec } from "../trim-defaults";
import type { SegmentTopOpening } from "../types";
import { degrees, MITERS, SQUARE, sillPieces, type ExactPiece } from "./piece";
import { archExtensions } from "./round-top";

/**
 * Radius of a circular arc from its chord c and rise (sagitta) s: R = (c²/4 + s²)/(2s), exact.
 * Source: circle geometry of the sagitta (Machinery's Handbook, as given by roughlogic.com "Circular Arc
 * Layout"; the same as R = c²/(8s) + s/2 in the circular-segment article quoted on imathworks.com).
 */
export function segmentRadius(chord: Fraction, rise: Fraction): Fraction {
  return chord.mul(chord).div(4).add(rise.mul(rise)).div(rise.mul(2));
}

/**
 * A segment (eyebrow) head (derived geometry). The jamb arc of span `width` and rise `rise` has radius R
 * (segmentRadius) and centre R − rise below the spring line. The casing ring is concentric with it: inner
 * edge R + r, outer R + r + w. Each leg stands where a rectangular leg would (inner edge r outside the
 * jamb) and meets the ring in a miter joint: the line from where the leg's inner edge crosses the ring's
 * inner circle to where its outer edge crosses the outer circle. So the leg's long point is on its outer
 * edge at springHeight + y_o, its top is cut atan((y_o − y_i)/w) from square, and the arch runs between
 * the two joints, measured on its outer edge. At rise = width/2 the centre is on the spring line, both
 * crossings lie on it and this is exactly the half-round: legs square at the spring line.
 * Extensions: sides to the spring line and a bent strip along the jamb arc.
 */
export function segmentTopPieces(o: SegmentTopOpening, s: ResolvedSpec): ExactPiece[] {
  const width = exact(o.width);
  const spring = exact(o.springHeight);
  const setback = exact(o.setback);
  const R = segmentRadius(width, exact(o.rise));
  const drop = R.sub(exact(o.rise)).valueOf(); // centre below the spring line
  const ri = R.add(s.reveal);
  const ro = ri.add(s.casingWidth);
  const xi = width.div(2).add(s.reveal).valueOf();
  const xo = xi + s.casingWidth.valueOf();
  // (R+d)² − (c/2+d)² = (R − c/2)(R + c/2 + 2d) ≥ 0 since R ≥ c/2: both crossings exist.
  const yi = Math.sqrt(ri.sub(xi).valueOf() * ri.add(xi).valueOf()) - drop;
  const yo = Math.sqrt(ro.sub(xo).valueOf() * ro.add(xo).valueOf()) - drop;
  const legTop = degrees(Math.atan2(yo - yi, s.casingWidth.valueOf()));
  const halfSweep = Math.asin(Math.min(1, xo / ro.valueOf()));
  const arch: ExactPiece = {
    part: "casing-arch",
    material: "casing",
    quantity: 1,
    length: 2 * halfSweep * ro.valueOf(),
    radius: ri,
    sweep: degrees(2 * halfSweep),
    ends: legTop === 0 ? SQUARE : MITERS,
  };
  const outer = width.add(s.reveal.mul(2)).add(s.casingWidth.mul(2));
  const pf = s.style === "picture-frame";
  const leg = (base: Fraction): ExactPiece => {
    const top = legTop === 0 ? "square" : "miter";
    const piece: ExactPiece = { part: "casing-leg", material: "casing", quantity: 2, length: base.valueOf() + yo, ends: [pf ? "miter" : "square", top] };
    if (top === "miter" && legTop !== 45) piece.cutAngles = [pf ? 45 : 0, legTop];
    return piece;
  };
  const pieces: ExactPiece[] = pf
    ? [leg(spring.add(s.reveal).add(s.casingWidth)), arch, { part: "casing-bottom", material: "casing", quantity: 1, length: outer, ends: MITERS }]
    : [leg(spring), arch, ...sillPieces(outer, setback, s)];
  if (setback.gt(0)) {
    const jambHalf = Math.asin(Math.min(1, width.div(2).div(R).valueOf()));
    pieces.push(...archExtensions(width, spring, setback, s, 2 * jambHalf * R.valueOf(), R, degrees(2 * jambHalf)));
  }
  return pieces;
}
