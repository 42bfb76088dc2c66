import { TRIM_DEFAULTS, type CutPiece, type Material, type Opening, type Part, type PriceItemSnapshot, type TrimSpec } from "@/takeoff";
import { placeCallouts, textWidth } from "../elevation-callouts";
import { PART_LABELS } from "../labels";
import type { Dimension, DrawnPiece, Elevation, Mark, OpeningShape, Pt, RadiusLabel } from "./types";

/** What a drawing needs of an opening type: the opening as entered, its spec, the engine's cut list. */
export interface ElevationInput {
  opening: Opening;
  /** The engine opening of a kind other than a plain window (OpeningTypeResult.kindOpening); drawn instead of `opening`. */
  kindOpening?: Opening;
  spec: TrimSpec;
  cutList: CutPiece[];
  items: Partial<Record<Material, string>>;
}

export const rect = (x0: number, y0: number, x1: number, y1: number): Pt[] => [
  { x: x0, y: y0 },
  { x: x1, y: y0 },
  { x: x1, y: y1 },
  { x: x0, y: y1 },
];

export const pathOf = (points: Pt[]) => `M${points.map((p) => `${p.x} ${p.y}`).join("L")}Z`;

export function rectOutline(x0: number, y0: number, x1: number, y1: number): Pick<OpeningShape, "d" | "points"> {
  const points = rect(x0, y0, x1, y1);
  return { d: pathOf(points), points };
}

export const lengthOf = (cut: CutPiece[], part: Part) => cut.find((p) => p.part === part)?.length;
export const pieceOf = (cut: CutPiece[], part: Part) => cut.find((p) => p.part === part);

/** The cut-list length of `part` nearest `value` (several lines of one part: bay heads per unit). */
export function nearestLength(cut: CutPiece[], part: Part, value: number): number {
  const lengths = cut.filter((p) => p.part === part).map((p) => p.length);
  if (lengths.length === 0) return value;
  return lengths.reduce((best, l) => (Math.abs(l - value) < Math.abs(best - value) ? l : best));
}

/** Face size of the stool's front edge and of the apron: the price-book items they are cut from, when known. */
export function itemSizes(ot: ElevationInput, items: PriceItemSnapshot[]) {
  const find = (id: string | undefined) => items.find((i) => i.id === id);
  return {
    stoolThickness: find(ot.items.stool)?.thickness ?? 1,
    apronWidth: find(ot.items.apron)?.faceWidth ?? ot.spec.casingWidth,
  };
}

/** The spec's trim sizes with the engine's defaults filled in. */
export function trim(spec: TrimSpec) {
  return {
    c: spec.casingWidth,
    r: spec.reveal ?? TRIM_DEFAULTS.reveal,
    t: spec.extensionThickness ?? TRIM_DEFAULTS.extensionThickness,
    horn: spec.stoolHorn ?? TRIM_DEFAULTS.hornPerCasingThickness * spec.casingThickness,
    inset: spec.apronInset ?? TRIM_DEFAULTS.apronInset,
    frame: spec.style === "picture-frame",
  };
}

/** The window's two outer legs: mitered at the top, and at the foot too in a picture frame. */
export function outerLegs(left: number, right: number, r: number, c: number, top: number, foot: number, frame: boolean): DrawnPiece[] {
  const footMiter = frame ? c : 0;
  const outL = left - r - c;
  const outR = right + r + c;
  return [
    {
      part: "casing-leg",
      hidden: false,
      points: [
        { x: outL, y: foot },
        { x: outL, y: top },
        { x: left - r, y: top + c },
        { x: left - r, y: foot - footMiter },
      ],
    },
    {
      part: "casing-leg",
      hidden: false,
      points: [
        { x: outR, y: top },
        { x: outR, y: foot },
        { x: right + r, y: foot - footMiter },
        { x: right + r, y: top + c },
      ],
    },
  ];
}

/**
 * A head (edge at y, growing by dy = ±c toward the opening) from x0 to x1, each end mitered or square:
 * a mitered end's long point is on the outer edge.
 */
export function band(part: Part, x0: number, x1: number, y: number, dy: number, miters: [boolean, boolean]): DrawnPiece {
  const c = Math.abs(dy);
  return {
    part,
    hidden: false,
    points: [
      { x: x0, y },
      { x: x1, y },
      { x: x1 - (miters[1] ? c : 0), y: y + dy },
      { x: x0 + (miters[0] ? c : 0), y: y + dy },
    ],
  };
}

export const nameOf = (cut: CutPiece[], part: Part, per = 1) => {
  const q = cut.filter((p) => p.part === part).reduce((s, p) => s + p.quantity, 0) / per;
  return `${PART_LABELS[part]}${q > 1 ? ` ×${q}` : ""}`;
};

/** Points of an arc about (cx, cy), angles measured anticlockwise from +x as seen (y is downward). */
export function arcPoints(cx: number, cy: number, radius: number, from: number, to: number, steps = 24): Pt[] {
  return Array.from({ length: steps + 1 }, (_, i) => {
    const a = from + ((to - from) * i) / steps;
    return { x: cx + radius * Math.cos(a), y: cy - radius * Math.sin(a) };
  });
}

export interface Frame {
  left: number;
  right: number;
  top: number;
  foot: number;
}

/** Text size for a drawing that spans `f`, as the window drawing sizes it. */
export const unitFor = (f: Frame) => Math.max(f.right - f.left, f.foot - f.top) / 30;

/**
 * Places the names in a column right of the drawing and bounds everything drawn, so no kind can put a
 * piece, a dimension or a note outside the view box.
 */
export function finish(
  f: Frame,
  unit: number,
  below: number,
  parts: { openings: OpeningShape[]; pieces: DrawnPiece[]; dimensions: Dimension[]; anchors: [string, Pt][]; radii?: RadiusLabel[]; marks?: Mark[]; notes?: string[] },
): Elevation {
  const gap = 2.6 * unit;
  const callouts = placeCallouts(
    parts.anchors.map(([text, anchor]) => ({ text, anchor })),
    1.7 * unit,
    Math.max(f.foot, below),
  );
  const calloutX = f.right + 3 * unit;
  const widest = Math.max(0, ...callouts.map((co) => textWidth(co.text, unit)));
  const scaleBar = { x: f.left, y: below + gap, length: 12 };
  const xs: number[] = [f.left - gap - 1.6 * unit, calloutX + widest + unit];
  const ys: number[] = [f.top - gap - 1.4 * unit, scaleBar.y + 2 * unit, ...callouts.map((co) => co.y - unit)];
  const take = (p: Pt) => {
    xs.push(p.x);
    ys.push(p.y);
  };
  for (const p of parts.pieces) p.points.forEach(take);
  for (const o of parts.openings) o.points.forEach(take);
  for (const d of parts.dimensions) {
    const span = [d.from, d.to];
    if (d.axis === "x") span.forEach((x) => take({ x, y: d.at - 1.4 * unit }));
    else span.forEach((y) => take({ x: d.at - 1.4 * unit, y }));
  }
  for (const rl of parts.radii ?? []) {
    take(rl.to);
    const w = textWidth(rl.text, unit);
    take({ x: rl.from.x - w / 2, y: rl.from.y - unit });
    take({ x: rl.from.x + w / 2, y: rl.from.y + 1.5 * unit });
  }
  for (const m of parts.marks ?? []) {
    m.line.forEach(take);
    const w = textWidth(m.text, 0.85 * unit);
    take({ x: m.at.x - w / 2, y: m.at.y - unit });
    take({ x: m.at.x + w / 2, y: m.at.y + 0.5 * unit });
  }
  return {
    openings: parts.openings,
    pieces: parts.pieces,
    dimensions: parts.dimensions,
    callouts,
    calloutX,
    radii: parts.radii ?? [],
    marks: parts.marks ?? [],
    notes: parts.notes ?? [],
    unit,
    scaleBar,
    bounds: { minX: Math.min(...xs), minY: Math.min(...ys), maxX: Math.max(...xs), maxY: Math.max(...ys) },
  };
}
