import type { BayOpening, MulledOpening, PriceItemSnapshot } from "@/takeoff";
import { tapeLength } from "../format";
import { angleText } from "../cut-details";
import { band, finish, itemSizes, lengthOf, nameOf, nearestLength, outerLegs, rect, rectOutline, trim, unitFor, type ElevationInput } from "./common";
import type { Dimension, DrawnPiece, Mark, OpeningShape, Pt } from "./types";

/**
 * Units side by side, left to right, their jambs `mullGap` apart: a mulled unit as built, or a bay or bow
 * unfolded flat onto one plane (each unit's width true, the corners opened out to the mull's centre line).
 * Origin at the top-left of the first unit's jamb opening.
 */
export function unitsElevation(ot: ElevationInput, o: MulledOpening | BayOpening, items: PriceItemSnapshot[]) {
  const bay = o.kind === "bay";
  const { c, r, t, horn, inset, frame } = trim(ot.spec);
  const cut = ot.cutList;
  const H = o.height;
  const g = o.mullGap;
  const xs: number[] = [];
  o.widths.forEach((w, i) => xs.push(i === 0 ? 0 : xs[i - 1]! + o.widths[i - 1]! + g));
  const n = o.widths.length;
  const right = (i: number) => xs[i]! + o.widths[i]!;
  const S = right(n - 1);
  const leg = lengthOf(cut, "casing-leg") ?? H + r + c;
  const legTop = frame ? H / 2 - leg / 2 : H - leg;
  const legFoot = frame ? H / 2 + leg / 2 : H;
  const pieces: DrawnPiece[] = outerLegs(0, S, r, c, legTop, legFoot, frame);
  const corner = (i: number) => right(i) + g / 2; // after unit i
  // One run per unit between its wall ends (`wall` beyond the jamb) and the corners (bays), or one run.
  const runs = (wall: number): [number, number, boolean, boolean][] =>
    bay ? o.widths.map((_, i) => [i === 0 ? -wall : corner(i - 1), i === n - 1 ? S + wall : corner(i), i === 0, i === n - 1]) : [[-wall, S + wall, true, true]];

  const heads = runs(r + c);
  for (const [x0, x1, a, b] of heads) pieces.push(band("casing-head", x0, x1, legTop, c, [a, b]));
  if (frame) for (const [x0, x1, a, b] of heads) pieces.push(band("casing-bottom", x0, x1, legFoot, -c, [a, b]));
  const mullTop = legTop + c;
  const mullion = lengthOf(cut, "mullion-casing") ?? H + r;
  for (let i = 0; i < n - 1; i++) {
    const strips: [number, number][] = bay ? [[right(i) + r, corner(i)], [corner(i), xs[i + 1]! - r]] : [[right(i) + r, xs[i + 1]! - r]];
    for (const [a, b] of strips) pieces.push({ part: "mullion-casing", hidden: false, points: rect(a, mullTop, b, mullTop + mullion) });
  }

  const { stoolThickness, apronWidth } = itemSizes(ot, items);
  const seat = cut.some((p) => p.part === "seat-board");
  const stoolRuns = frame || !(seat || lengthOf(cut, "stool") !== undefined) ? [] : seat ? [[-r - c - horn, S + r + c + horn, true, true] as const] : runs(r + c + horn);
  const apronRuns = frame || lengthOf(cut, "apron") === undefined ? [] : runs(r + c - inset);
  let foot = legFoot;
  for (const [x0, x1] of stoolRuns) pieces.push({ part: seat ? "seat-board" : "stool", hidden: false, points: rect(x0, H, x1, H + stoolThickness) });
  if (stoolRuns.length) foot = H + stoolThickness;
  const apronTop = foot;
  for (const [x0, x1] of apronRuns) pieces.push({ part: "apron", hidden: false, points: rect(x0, apronTop, x1, apronTop + apronWidth) });
  if (apronRuns.length) foot = apronTop + apronWidth;

  const side = lengthOf(cut, "extension-side");
  if (side !== undefined) {
    const sTop = frame ? H / 2 - side / 2 : H - side;
    o.widths.forEach((w, i) => {
      pieces.push({ part: "extension-side", hidden: true, points: rect(xs[i]! - t, sTop, xs[i]!, sTop + side) });
      pieces.push({ part: "extension-side", hidden: true, points: rect(right(i), sTop, right(i) + t, sTop + side) });
      if (lengthOf(cut, "extension-head") !== undefined) pieces.push({ part: "extension-head", hidden: true, points: rect(xs[i]!, -t, right(i), 0) });
      if (lengthOf(cut, "extension-bottom") !== undefined) pieces.push({ part: "extension-bottom", hidden: true, points: rect(xs[i]!, H, right(i), H + t) });
    });
  }

  const stoolEdge = Math.max(S + r + c, ...stoolRuns.map((s) => s[1]));
  const f = { left: Math.min(-r - c, ...stoolRuns.map((s) => s[0])), right: stoolEdge, top: legTop, foot };
  const unit = unitFor(f);
  const gap = 2.6 * unit;
  const dimensions: Dimension[] = heads.map(([x0, x1], i) => ({
    key: bay ? `head-${i}` : "casing-width",
    label: bay ? "Head" : "Overall casing width",
    axis: "x",
    from: x0,
    to: x1,
    base: legTop,
    at: legTop - gap,
    value: nearestLength(cut, "casing-head", x1 - x0),
  }));
  dimensions.push({ key: "leg", label: "Casing leg", axis: "y", from: legTop, to: legFoot, base: -r - c, at: f.left - gap, value: leg });
  let below = foot;
  if (!bay && apronRuns.length) {
    below += gap;
    const [x0, x1] = apronRuns[0]!;
    dimensions.push({ key: "apron", label: "Apron", axis: "x", from: x0, to: x1, base: foot, at: below, value: nearestLength(cut, "apron", x1 - x0) });
  }
  if (!bay && stoolRuns.length) {
    below += gap;
    const [x0, x1] = stoolRuns[0]!;
    dimensions.push({ key: "stool", label: "Stool", axis: "x", from: x0, to: x1, base: H + stoolThickness, at: below, value: nearestLength(cut, "stool", x1 - x0) });
  }
  below += gap;
  o.widths.forEach((w, i) => dimensions.push({ key: `unit-${i}`, label: "Unit", axis: "x", from: xs[i]!, to: right(i), base: foot, at: below, value: w }));

  const openings: OpeningShape[] = o.widths.map((w, i) => ({
    ...rectOutline(xs[i]!, 0, right(i), H),
    lines: [`Unit ${i + 1}`, `${tapeLength(w)} × ${tapeLength(H)}`],
    at: { x: xs[i]! + w / 2, y: H / 2 },
  }));
  const marks: Mark[] = [];
  const notes: string[] = [];
  if (bay) {
    const half = o.turn / 2;
    for (let i = 0; i < n - 1; i++) {
      const x = corner(i);
      marks.push({ kind: "fold", line: [{ x, y: legTop - 0.5 * unit }, { x, y: foot + 0.5 * unit }], text: `${angleText(o.turn)} corner`, at: { x, y: legTop - gap - 1.6 * unit } });
    }
    notes.push(
      `Drawn unfolded, flat: each of the ${n - 1} corners turns ${angleText(o.turn)}; the saw setting there is half the turn, ${angleText(half)} (stool miter, head and apron bevel, mullion edge bevel).`,
    );
  }
  const mullName = nameOf(cut, "mullion-casing");
  const anchors: [string, Pt][] = [
    [nameOf(cut, "casing-head"), { x: S + r + c - 1.5 * c, y: legTop + c / 2 }],
    [nameOf(cut, "casing-leg"), { x: S + r + c / 2, y: legTop + (legFoot - legTop) * 0.3 }],
    [`${mullName}, ${tapeLength(mullion)}`, { x: right(n - 2) + g / 2 + (bay ? (g / 2 - r) / 2 : 0), y: mullTop + mullion * 0.45 }],
  ];
  if (frame) anchors.push([nameOf(cut, "casing-bottom"), { x: S + r, y: legFoot - c / 2 }]);
  if (stoolRuns.length) anchors.push([nameOf(cut, seat ? "seat-board" : "stool"), { x: stoolEdge - horn / 2, y: H + stoolThickness / 2 }]);
  if (apronRuns.length) {
    anchors.push([nameOf(cut, "apron"), { x: S * 0.75, y: apronTop + apronWidth / 2 }]);
    if (lengthOf(cut, "apron-return") !== undefined) anchors.push([nameOf(cut, "apron-return"), { x: apronRuns[apronRuns.length - 1]![1], y: apronTop + apronWidth * 0.75 }]);
  }
  if (side !== undefined) anchors.push([nameOf(cut, "extension-side"), { x: S + t / 2, y: legTop + (legFoot - legTop) * 0.6 }]);
  if (lengthOf(cut, "extension-head") !== undefined) anchors.push([nameOf(cut, "extension-head"), { x: S - o.widths[n - 1]! / 4, y: -t / 2 }]);
  if (lengthOf(cut, "extension-bottom") !== undefined) anchors.push([nameOf(cut, "extension-bottom"), { x: S - o.widths[n - 1]! / 4, y: H + t / 2 }]);
  return finish(f, unit, below, { openings, pieces, dimensions, anchors, marks, notes });
}

