import type { DoorOpening } from "@/takeoff";
import { tapeLength } from "../format";
import { band, finish, lengthOf, nameOf, outerLegs, rectOutline, trim, unitFor, type ElevationInput } from "./common";
import type { Dimension, Elevation } from "./types";

/**
 * One side of a cased door: the legs stand on the finished floor (y = height, origin at the top-left of
 * the jamb opening) and rise their cut length to the head's long point; the head spans their outer edges.
 * Both sides of an interior door are cased alike, so one side is drawn and the note says how many.
 */
export function doorElevation(ot: ElevationInput, o: DoorOpening): Elevation {
  const { width: W, height: H } = o;
  const { c, r } = trim(ot.spec);
  const cut = ot.cutList;
  const leg = lengthOf(cut, "casing-leg") ?? H + r + c;
  const head = lengthOf(cut, "casing-head") ?? W + 2 * (r + c);
  const legTop = H - leg;
  const pieces = outerLegs(0, W, r, c, legTop, H, false);
  const cx = W / 2;
  pieces.push(band("casing-head", cx - head / 2, cx + head / 2, legTop, c, [true, true]));
  const f = { left: Math.min(-r - c, cx - head / 2), right: Math.max(W + r + c, cx + head / 2), top: legTop, foot: H };
  const unit = unitFor(f);
  const gap = 2.6 * unit;
  const dimensions: Dimension[] = [
    { key: "casing-width", label: "Overall casing width", axis: "x", from: cx - head / 2, to: cx + head / 2, base: legTop, at: legTop - gap, value: head },
    { key: "leg", label: "Casing leg", axis: "y", from: legTop, to: H, base: -r - c, at: f.left - gap, value: leg },
  ];
  const sides = o.sides === 2 ? 2 : 1;
  const perSide = sides === 2 ? " per side" : "";
  const below = H + 1.5 * unit;
  return finish(f, unit, below, {
    openings: [{ ...rectOutline(0, 0, W, H), lines: ["Door opening", `${tapeLength(W)} × ${tapeLength(H)}`], at: { x: cx, y: H / 2 } }],
    pieces,
    dimensions,
    anchors: [
      [`${nameOf(cut, "casing-head", sides)}${perSide}`, { x: cx + head / 2 - 1.5 * c, y: legTop + c / 2 }],
      [`${nameOf(cut, "casing-leg", sides)}${perSide}`, { x: W + r + c / 2, y: legTop + leg * 0.3 }],
    ],
    marks: [{ kind: "floor", line: [{ x: f.left - c, y: H }, { x: f.right + c, y: H }], text: "Finished floor", at: { x: cx, y: H + 1.2 * unit } }],
    notes: [sides === 2 ? "One side drawn; the door is cased both sides (× 2 sides): the cut list counts both." : "Cased one side."],
  });
}
