import type { PriceItemSnapshot, RoundTopOpening, SegmentTopOpening } from "@/takeoff";
import { inchesText, tapeLength } from "../format";
import { arcPoints, band, finish, itemSizes, lengthOf, nameOf, pieceOf, rect, trim, unitFor, type ElevationInput } from "./common";
import type { Dimension, DrawnPiece, Pt, RadiusLabel } from "./types";

/**
 * A round or segment head on straight legs; origin on the left jamb at the spring line, y downward.
 * The jamb arc has radius R = (c²/4 + s²)/(2s) for span c and rise s (R = width/2 for a half-round), its
 * centre R − s below the spring line; the casing ring is concentric, inner edge R + r, outer R + r + w.
 * Each leg meets the ring along the line from where its inner edge crosses the inner circle to where its
 * outer edge crosses the outer circle (the engine's convention, takeoff/kinds/segment-top.ts); for a
 * half-round both crossings lie on the spring line, so the legs are square there. Derived geometry.
 */
export function archElevation(ot: ElevationInput, o: RoundTopOpening | SegmentTopOpening, items: PriceItemSnapshot[]) {
  const { width: W, springHeight: Hs } = o;
  const rise = o.kind === "segment-top" ? Math.min(Math.max(o.rise, 1e-6), W / 2) : W / 2;
  const { c, r, t, horn, frame } = trim(ot.spec);
  const cut = ot.cutList;
  const R = (W * W) / 4 / (2 * rise) + rise / 2;
  const drop = R - rise; // centre below the spring line
  const cx = W / 2;
  const ri = R + r;
  const ro = ri + c;
  const xi = W / 2 + r;
  const xo = xi + c;
  const yi = Math.sqrt(Math.max(0, (ri - xi) * (ri + xi))) - drop;
  const yo = Math.sqrt(Math.max(0, (ro - xo) * (ro + xo))) - drop;
  const at = (x: number, y: number) => Math.atan2(drop - y, x - cx); // angle about the centre, as seen
  const outL = -r - c;
  const outR = W + r + c;
  const leg = lengthOf(cut, "casing-leg") ?? Hs + yo;
  const legTop = -yo;
  const legFoot = legTop + leg;
  const pieces: DrawnPiece[] = [];
  const footMiter = frame ? c : 0;
  pieces.push({ part: "casing-leg", hidden: false, points: [{ x: outL, y: legFoot }, { x: outL, y: legTop }, { x: -r, y: -yi }, { x: -r, y: legFoot - footMiter }] });
  pieces.push({ part: "casing-leg", hidden: false, points: [{ x: outR, y: legTop }, { x: outR, y: legFoot }, { x: W + r, y: legFoot - footMiter }, { x: W + r, y: -yi }] });

  // The ring between the two leg joints: outer arc left to right over the top, inner arc back.
  const a0 = at(outL, -yo);
  const b0 = at(-r, -yi);
  const ring = (cxr: number, inner: number, outer: number, from: number, fromIn: number): { d: string; points: Pt[] } => {
    const outerPts = arcPoints(cxr, drop, outer, from, Math.PI - from);
    const innerPts = arcPoints(cxr, drop, inner, Math.PI - fromIn, fromIn);
    const large = from - (Math.PI - from) > Math.PI + 1e-9 ? 1 : 0;
    const p0 = outerPts[0]!;
    const p1 = outerPts[outerPts.length - 1]!;
    const q0 = innerPts[0]!;
    const q1 = innerPts[innerPts.length - 1]!;
    return { d: `M${p0.x} ${p0.y}A${outer} ${outer} 0 ${large} 1 ${p1.x} ${p1.y}L${q0.x} ${q0.y}A${inner} ${inner} 0 ${large} 0 ${q1.x} ${q1.y}Z`, points: [...outerPts, ...innerPts] };
  };
  pieces.push({ part: "casing-arch", hidden: false, ...ring(cx, ri, ro, a0, b0) });

  const { stoolThickness, apronWidth } = itemSizes(ot, items);
  const OD = W + 2 * (r + c);
  const stool = lengthOf(cut, "stool");
  const apron = lengthOf(cut, "apron");
  let foot = legFoot;
  if (frame) {
    const bottom = lengthOf(cut, "casing-bottom") ?? OD;
    pieces.push(band("casing-bottom", cx - bottom / 2, cx + bottom / 2, legFoot, -c, [true, true]));
  }
  if (!frame && stool !== undefined) {
    pieces.push({ part: "stool", hidden: false, points: rect(cx - stool / 2, Hs, cx + stool / 2, Hs + stoolThickness) });
    foot = Hs + stoolThickness;
  }
  const apronTop = foot;
  if (!frame && apron !== undefined) {
    pieces.push({ part: "apron", hidden: false, points: rect(cx - apron / 2, apronTop, cx + apron / 2, apronTop + apronWidth) });
    foot = apronTop + apronWidth;
  }
  const side = lengthOf(cut, "extension-side");
  const extArch = pieceOf(cut, "extension-arch");
  if (side !== undefined) {
    pieces.push({ part: "extension-side", hidden: true, points: rect(-t, 0, 0, Hs) });
    pieces.push({ part: "extension-side", hidden: true, points: rect(W, 0, W + t, Hs) });
  }
  if (extArch) {
    const j = at(0, 0);
    pieces.push({ part: "extension-arch", hidden: true, ...ring(cx, R, R + t, j, j) });
  }
  if (lengthOf(cut, "extension-bottom") !== undefined) pieces.push({ part: "extension-bottom", hidden: true, points: rect(0, Hs, W, Hs + t) });

  const left = Math.min(outL, stool === undefined || frame ? outL : cx - stool / 2);
  const right = Math.max(outR, stool === undefined || frame ? outR : cx + stool / 2);
  const top = drop - ro;
  const f = { left, right, top, foot };
  const unit = unitFor(f);
  const gap = 2.6 * unit;
  const dimensions: Dimension[] = [
    { key: "outside-width", label: "Outside width", axis: "x", from: outL, to: outR, base: top, at: top - gap, value: OD },
    { key: "leg", label: "Casing leg", axis: "y", from: legTop, to: legFoot, base: outL, at: left - gap, value: leg },
  ];
  let below = foot;
  if (!frame && apron !== undefined) {
    below += gap;
    dimensions.push({ key: "apron", label: "Apron", axis: "x", from: cx - apron / 2, to: cx + apron / 2, base: foot, at: below, value: apron });
  }
  if (!frame && stool !== undefined) {
    below += gap;
    dimensions.push({ key: "stool", label: "Stool", axis: "x", from: cx - stool / 2, to: cx + stool / 2, base: Hs + stoolThickness, at: below, value: stool });
  }

  // The radius leader points from inside the opening to the ring's inner edge, a little left of the crown.
  const arch = pieceOf(cut, "casing-arch");
  const radius = arch?.radius ?? ri;
  const half = Math.PI / 2 - b0;
  const theta = Math.PI / 2 + 0.45 * half;
  const to = { x: cx + ri * Math.cos(theta), y: drop - ri * Math.sin(theta) };
  const reach = Math.min(0.55 * ri, 0.45 * (rise + Hs));
  const from = { x: to.x - reach * Math.cos(theta), y: to.y + reach * Math.sin(theta) };
  const radii: RadiusLabel[] = [{ from, to, text: `R ${inchesText(radius)}`, value: radius }];

  const archLength = arch?.length;
  const anchors: [string, Pt][] = [
    [`${nameOf(cut, "casing-arch")}${archLength === undefined ? "" : `, ${tapeLength(archLength)} outer edge`}`, { x: cx + ro * Math.cos(Math.PI / 4 + 0.1), y: drop - (ri + c / 2) * Math.sin(Math.PI / 4 + 0.1) }],
    [nameOf(cut, "casing-leg"), { x: outR - c / 2, y: legTop + leg * 0.4 }],
  ];
  if (frame) anchors.push([nameOf(cut, "casing-bottom"), { x: outR - 1.5 * c, y: legFoot - c / 2 }]);
  if (!frame && stool !== undefined) anchors.push([nameOf(cut, "stool"), { x: cx + stool / 2 - horn / 2, y: Hs + stoolThickness / 2 }]);
  if (!frame && apron !== undefined) {
    anchors.push([nameOf(cut, "apron"), { x: cx + apron / 4, y: apronTop + apronWidth / 2 }]);
    if (lengthOf(cut, "apron-return") !== undefined) anchors.push([nameOf(cut, "apron-return"), { x: cx + apron / 2, y: apronTop + apronWidth * 0.75 }]);
  }
  if (side !== undefined) anchors.push([nameOf(cut, "extension-side"), { x: W + t / 2, y: Hs * 0.6 }]);
  if (extArch) anchors.push([`${nameOf(cut, "extension-arch")}, R ${inchesText(extArch.radius ?? R)}`, { x: cx + (R + t / 2) * Math.cos(Math.PI / 3), y: drop - (R + t / 2) * Math.sin(Math.PI / 3) }]);

  const jamb = arcPoints(cx, drop, R, at(0, 0), Math.PI - at(0, 0));
  const jambPts = [{ x: 0, y: Hs }, ...jamb, { x: W, y: Hs }];
  // rise ≤ width/2, so the jamb arc never exceeds a half circle: the small-arc flag is always right.
  const openingD = `M0 ${Hs}V0A${R} ${R} 0 0 1 ${W} 0V${Hs}Z`;
  const sweep = arch?.sweep;
  return finish(f, unit, below, {
    openings: [{ d: openingD, points: jambPts, lines: ["Jamb opening", `${tapeLength(W)} wide, ${tapeLength(Hs)} to spring`], at: { x: cx, y: Hs / 2 } }],
    pieces,
    dimensions,
    anchors,
    radii,
    notes: [`Arch casing: inner edge R ${inchesText(radius)}${sweep === undefined ? "" : `, sweeps ${Math.round(sweep * 10) / 10}°`}; its length is measured on the outer edge.`],
  });
}
