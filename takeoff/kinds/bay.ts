import { exact, Fraction } from "../exact";
import { formatLength } from "../length-format";
import type { ResolvedSpec } from "../trim-defaults";
import type { BayOpening, End } from "../types";
import { mergeAlike, MITERS, SQUARE, unitExtensions, type ExactPiece } from "./piece";

/**
 * Bay (three units) and bow (four or more) windows, derived geometry. Conventions:
 * - Every corner between adjacent units turns `turn` degrees; seen from the room it is an inside corner.
 *   Lengths are measured on the finished wall faces (the back of the trim), where the long points of the
 *   corner cuts fall.
 * - Each unit is cased in its own plane: one head (and picture-frame bottom) from its wall-end leg's outer
 *   edge, or from a corner, to the next corner, mitered 45° at a wall-end leg and beveled at a corner; the
 *   two outer legs are a single window's. At each corner the space between the units' jambs (`mullGap`,
 *   measured round the corner) is covered by two mullion casings, each mullGap/2 − r wide and beveled along
 *   its corner edge, so the pair meets on the corner line ("casing where unit planes meet").
 * - Stool: one segment per unit, mitered at each corner; its long point is on the back edge, which lies
 *   `setback` outside the wall line, so each corner adds setback·tan(turn/2). Wall ends are square with the
 *   usual horn. Saw setting at a corner = half the turn (a miter bisects the corner: Fine Homebuilding,
 *   "Trim Out a Curved Bay Window", J. Laskey, 2020, cuts the stool in segments; 45° flankers → 22.5°).
 *   `seat: "one-piece"` instead gives one seat board: the wall-aligned rectangle that holds the whole stool
 *   outline, to be scribed to it.
 * - Apron: one segment per unit under the stool, beveled at the corners, returned at the wall ends.
 * - Jamb extensions per unit, as for a single window of that unit's width.
 */
export function bayPieces(o: BayOpening, s: ResolvedSpec): ExactPiece[] {
  const widths = o.widths.map(exact);
  const height = exact(o.height);
  const setback = exact(o.setback);
  const halfGap = exact(o.mullGap).div(2);
  const strip = halfGap.sub(s.reveal);
  if (strip.lte(0)) {
    throw new Error(`mullGap: mull gap must be more than twice the reveal (${formatLength(s.reveal.mul(2).valueOf())}) to leave mullion casings`);
  }
  const n = widths.length;
  const half = o.turn / 2;
  const tanHalf = Math.tan((half * Math.PI) / 180);
  const pf = s.style === "picture-frame";
  const casingEdge = s.reveal.add(s.casingWidth);

  /** One piece per unit: `wallEnd` is what a wall end gets beyond the jamb, corners get halfGap. */
  const perUnit = (make: (i: number, length: Fraction, corners: number) => ExactPiece | null, wallEnd: Fraction): ExactPiece[] =>
    widths.flatMap((w, i) => {
      const atWall = (i === 0 ? 1 : 0) + (i === n - 1 ? 1 : 0);
      const corners = 2 - atWall;
      const piece = make(i, w.add(wallEnd.mul(atWall)).add(halfGap.mul(corners)), corners);
      return piece ? [piece] : [];
    });
  /** Ends and saw settings of unit i, wall end first for the flankers so mirrored flankers merge. */
  const cuts = (i: number, wall: End, wallAngle: number, corner: End): { ends: [End, End]; cutAngles: [number, number] } => {
    if (i === 0 || i === n - 1) return { ends: [wall, corner], cutAngles: [wallAngle, half] };
    return { ends: [corner, corner], cutAngles: [half, half] };
  };

  const pieces: ExactPiece[] = [
    pf
      ? { part: "casing-leg", material: "casing", quantity: 2, length: height.add(s.reveal.mul(2)).add(s.casingWidth.mul(2)), ends: MITERS }
      : { part: "casing-leg", material: "casing", quantity: 2, length: height.add(s.reveal).add(s.casingWidth), ends: ["square", "miter"] },
  ];
  for (const part of pf ? (["casing-head", "casing-bottom"] as const) : (["casing-head"] as const)) {
    pieces.push(...perUnit((i, length) => ({ part, material: "casing", quantity: 1, length, ...cuts(i, "miter", 45, "bevel") }), casingEdge));
  }
  pieces.push({
    part: "mullion-casing",
    material: "mullion",
    quantity: 2 * (n - 1),
    length: height.add(s.reveal.mul(pf ? 2 : 1)),
    width: strip,
    edgeBevel: half,
    ends: SQUARE,
  });
  if (!pf) {
    const stoolEnd = casingEdge.add(s.stoolHorn);
    const stoolWidth = setback.add(s.stoolProjection);
    if (o.seat === "one-piece") {
      pieces.push({ part: "seat-board", material: "stool", quantity: 1, ...seatBlank(o, widths, stoolEnd, halfGap, s), ends: SQUARE });
    } else {
      pieces.push(
        ...perUnit(
          (i, length, corners) => ({
            part: "stool",
            material: "stool",
            quantity: 1,
            length: length.valueOf() + corners * setback.valueOf() * tanHalf,
            width: stoolWidth,
            ...cuts(i, "square", 0, "miter"),
          }),
          stoolEnd,
        ),
      );
    }
    const apronEnd = casingEdge.sub(s.apronInset);
    const wallEnd: End = s.apronReturns ? "return" : "square";
    pieces.push(
      ...perUnit((i, length) => {
        if (length.lte(0)) throw new Error("apronInset: apron inset leaves no apron for this opening width");
        return { part: "apron", material: "apron", quantity: 1, length, ...cuts(i, wallEnd, s.apronReturns ? 45 : 0, "bevel") };
      }, apronEnd),
    );
    if (s.apronReturns) pieces.push({ part: "apron-return", material: "apron", quantity: 2, length: s.casingThickness, ends: ["miter", "square"] });
  }
  return mergeAlike([...pieces, ...widths.flatMap((w) => unitExtensions(w, height, setback, s))]);
}

/**
 * The smallest wall-aligned rectangle holding the stool outline in plan. The wall line runs left to right
 * along x with the windows toward +y; unit i heads (n−1)·turn/2 − i·turn from the wall. The outline's back
 * edge is `setback` outside the wall line, its front `projection` inside, and at each corner both edges
 * meet on the miter line: offset d along the bisector is d·(n₁ + n₂)/(1 + cos turn).
 */
function seatBlank(o: BayOpening, widths: Fraction[], stoolEnd: Fraction, halfGap: Fraction, s: ResolvedSpec): { length: number; width: number } {
  const n = widths.length;
  const turn = (o.turn * Math.PI) / 180;
  const heading = (i: number) => ((n - 1) * turn) / 2 - i * turn;
  const normal = (a: number): [number, number] => [-Math.sin(a), Math.cos(a)];
  const back = Number(o.setback);
  const front = -s.stoolProjection.valueOf();
  let p: [number, number] = [0, 0];
  const xs: number[] = [];
  const ys: number[] = [];
  const mark = (at: [number, number], dir: [number, number]) => {
    for (const d of [back, front]) {
      xs.push(at[0] + d * dir[0]);
      ys.push(at[1] + d * dir[1]);
    }
  };
  mark(p, normal(heading(0)));
  widths.forEach((w, i) => {
    const a = heading(i);
    const ends = (i === 0 ? stoolEnd : halfGap).add(i === n - 1 ? stoolEnd : halfGap);
    const length = w.add(ends).valueOf();
    p = [p[0] + length * Math.cos(a), p[1] + length * Math.sin(a)];
    const n1 = normal(a);
    if (i === n - 1) return mark(p, n1);
    const n2 = normal(heading(i + 1));
    const k = 1 + Math.cos(turn);
    mark(p, [(n1[0] + n2[0]) / k, (n1[1] + n2[1]) / k]);
  });
  return { length: Math.max(...xs) - Math.min(...xs), width: Math.max(...ys) - Math.min(...ys) };
}
