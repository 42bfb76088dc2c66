import { TRIM_DEFAULTS, type Part, type PriceItemSnapshot, type WindowOpening } from "@/takeoff";
import { placeCallouts, textWidth } from "../elevation-callouts";
import { PART_LABELS } from "../labels";
import { tapeLength } from "../format";
import { itemSizes, lengthOf, rect, rectOutline, type ElevationInput } from "./common";
import type { Dimension, DrawnPiece, Elevation, Pt } from "./types";

/**
 * One window's trim, with the origin at the top-left corner of the jamb opening. Every piece is drawn at
 * its cut-list length, so the picture and the cut list cannot disagree: a leg stands on the stool and rises
 * its cut length; the head spans the legs' outer edges.
 */
export function windowElevation(ot: ElevationInput, o: WindowOpening, items: PriceItemSnapshot[]): Elevation {
  const { width: W, height: H } = o;
  const c = ot.spec.casingWidth;
  const r = ot.spec.reveal ?? TRIM_DEFAULTS.reveal;
  const t = ot.spec.extensionThickness ?? TRIM_DEFAULTS.extensionThickness;
  const cut = ot.cutList;
  const cx = W / 2;
  const frame = ot.spec.style === "picture-frame";
  const pieces: DrawnPiece[] = [];
  const add = (part: Part, points: Pt[], hidden = false) => pieces.push({ part, points, hidden });

  const leg = lengthOf(cut, "casing-leg") ?? 0;
  const head = lengthOf(cut, "casing-head") ?? W + 2 * (r + c);
  // Stool-and-apron legs stand on the stool (y = H); picture-frame legs are centred on the opening.
  const legTop = frame ? H / 2 - leg / 2 : H - leg;
  const legFoot = frame ? H / 2 + leg / 2 : H;
  const outL = -r - c;
  const outR = W + r + c;
  const topMiter = c;
  const footMiter = frame ? c : 0;
  add("casing-leg", [
    { x: outL, y: legFoot },
    { x: outL, y: legTop },
    { x: -r, y: legTop + topMiter },
    { x: -r, y: legFoot - footMiter },
  ]);
  add("casing-leg", [
    { x: outR, y: legTop },
    { x: outR, y: legFoot },
    { x: W + r, y: legFoot - footMiter },
    { x: W + r, y: legTop + topMiter },
  ]);
  const hx0 = cx - head / 2;
  const hx1 = cx + head / 2;
  add("casing-head", [
    { x: hx0, y: legTop },
    { x: hx1, y: legTop },
    { x: hx1 - c, y: legTop + c },
    { x: hx0 + c, y: legTop + c },
  ]);

  const { stoolThickness, apronWidth } = itemSizes(ot, items);
  const stool = lengthOf(cut, "stool");
  const apron = lengthOf(cut, "apron");
  let foot = legFoot;
  if (frame) {
    const bottom = lengthOf(cut, "casing-bottom") ?? head;
    add("casing-bottom", [
      { x: cx + bottom / 2, y: legFoot },
      { x: cx - bottom / 2, y: legFoot },
      { x: cx - bottom / 2 + c, y: legFoot - c },
      { x: cx + bottom / 2 - c, y: legFoot - c },
    ]);
  }
  if (!frame && stool !== undefined) {
    add("stool", rect(cx - stool / 2, H, cx + stool / 2, H + stoolThickness));
    foot = H + stoolThickness;
  }
  const apronTop = foot;
  if (!frame && apron !== undefined) {
    add("apron", rect(cx - apron / 2, apronTop, cx + apron / 2, apronTop + apronWidth));
    foot = apronTop + apronWidth;
  }

  // Extensions continue the window's jambs out to the wall face: their edges sit just outside the opening.
  const side = lengthOf(cut, "extension-side");
  const extHead = lengthOf(cut, "extension-head");
  const extBottom = lengthOf(cut, "extension-bottom");
  if (side !== undefined) {
    const sTop = frame ? H / 2 - side / 2 : H - side;
    const sFoot = frame ? H / 2 + side / 2 : H;
    add("extension-side", rect(-t, sTop, 0, sFoot), true);
    add("extension-side", rect(W, sTop, W + t, sFoot), true);
  }
  if (extHead !== undefined) add("extension-head", rect(cx - extHead / 2, -t, cx + extHead / 2, 0), true);
  if (extBottom !== undefined) add("extension-bottom", rect(cx - extBottom / 2, H, cx + extBottom / 2, H + t), true);

  const leftEdge = Math.min(outL, hx0, stool === undefined || frame ? outL : cx - stool / 2);
  const rightEdge = Math.max(outR, hx1, stool === undefined || frame ? outR : cx + stool / 2);
  const unit = Math.max(rightEdge - leftEdge, foot - legTop) / 30;
  const gap = 2.6 * unit;

  const dimensions: Dimension[] = [
    { key: "casing-width", label: "Overall casing width", axis: "x", from: hx0, to: hx1, base: legTop, at: legTop - gap, value: head },
    { key: "leg", label: "Casing leg", axis: "y", from: legTop, to: legFoot, base: outL, at: leftEdge - gap, value: leg },
  ];
  let below = foot;
  if (!frame && apron !== undefined) {
    below += gap;
    dimensions.push({ key: "apron", label: "Apron", axis: "x", from: cx - apron / 2, to: cx + apron / 2, base: foot, at: below, value: apron });
  }
  if (!frame && stool !== undefined) {
    below += gap;
    dimensions.push({ key: "stool", label: "Stool", axis: "x", from: cx - stool / 2, to: cx + stool / 2, base: H + stoolThickness, at: below, value: stool });
  }

  const quantity = (part: Part) => cut.find((p) => p.part === part)?.quantity ?? 1;
  // Names only: the lengths are on the dimension lines and in the cut list, and short names keep the text large.
  const name = (part: Part) => `${PART_LABELS[part]}${quantity(part) > 1 ? ` ×${quantity(part)}` : ""}`;
  const anchors: [Part, Pt][] = [
    ["casing-head", { x: hx1 - 1.5 * c, y: legTop + c / 2 }],
    ["casing-leg", { x: outR - c / 2, y: legTop + (legFoot - legTop) * 0.3 }],
  ];
  if (side !== undefined) anchors.push(["extension-side", { x: W + t / 2, y: legTop + (legFoot - legTop) * 0.6 }]);
  if (extHead !== undefined) anchors.push(["extension-head", { x: cx + W / 4, y: -t / 2 }]);
  if (extBottom !== undefined) anchors.push(["extension-bottom", { x: cx + W / 4, y: H + t / 2 }]);
  if (frame) anchors.push(["casing-bottom", { x: hx1 - 1.5 * c, y: legFoot - c / 2 }]);
  if (!frame && stool !== undefined) anchors.push(["stool", { x: cx + stool / 2 - Math.max((stool - head) / 4, 0.25), y: H + stoolThickness / 2 }]);
  if (!frame && apron !== undefined) {
    anchors.push(["apron", { x: cx + apron / 4, y: apronTop + apronWidth / 2 }]);
    if (lengthOf(cut, "apron-return") !== undefined) anchors.push(["apron-return", { x: cx + apron / 2, y: apronTop + apronWidth * 0.75 }]);
  }
  const lineGap = 1.7 * unit;
  // Names may run down beside the dimension lines: pinned at the drawing's foot, low leaders would cross.
  const callouts = placeCallouts(anchors.map(([part, anchor]) => ({ text: name(part), anchor })), lineGap, Math.max(foot, below));
  const calloutX = rightEdge + 3 * unit;
  const widest = Math.max(0, ...callouts.map((co) => textWidth(co.text, unit)));

  const scaleBar = { x: leftEdge, y: below + gap, length: 12 };
  const top = Math.min(legTop - gap - 1.4 * unit, ...callouts.map((co) => co.y - unit));
  return {
    openings: [{ ...rectOutline(0, 0, W, H), lines: ["Jamb opening", `${tapeLength(W)} × ${tapeLength(H)}`], at: { x: W / 2, y: H / 2 } }],
    pieces,
    radii: [],
    marks: [],
    notes: [],
    dimensions,
    callouts,
    calloutX,
    unit,
    scaleBar,
    bounds: { minX: leftEdge - gap - 1.6 * unit, minY: top, maxX: calloutX + widest + unit, maxY: scaleBar.y + 2 * unit },
  };
}
