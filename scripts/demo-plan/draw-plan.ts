/**
 * Draws a layout's walls, windows, doors and room names onto a sheet. Line weights and symbols follow
 * common drafting practice: heavy cut walls with light poché, the three-line window symbol (outer face,
 * glass, inner face) between jamb lines, door leaf with a quarter-circle swing, hexagonal window tags.
 */
import { formatLength } from "@/takeoff";
import type { Pen } from "./pen";
import type { UnitLayout, WindowMark } from "./layouts";
import { DEMO_WINDOW_TYPES } from "./layouts";
import { planWalls, subtract, type Interval, type WallBody } from "./walls";

/** Layout inches → paper points: origin of the layout on the sheet and points per real inch. */
export interface Placement {
  ox: number;
  oy: number;
  k: number;
}

export interface PlacedWindow {
  mark: WindowMark;
  /** Center of the rough opening on the wall centerline, paper points. */
  x: number;
  y: number;
}

export const WEIGHTS = { wall: 1, window: 0.35, door: 0.4, swing: 0.2, tag: 0.3 } as const;
const POCHE_GRAY = 0.78;
/** Window tags sit this far outside the wall's outer face, real inches. */
const TAG_OFFSET = 30;

/** A segment along a wall body (axis coordinate a0..a1, across coordinate c0..c1) in paper points. */
function bandRect(p: Placement, b: WallBody, [a0, a1]: Interval, c0: number, c1: number): [number, number, number, number] {
  return b.axis === "h"
    ? [p.ox + a0 * p.k, p.oy + c0 * p.k, (a1 - a0) * p.k, (c1 - c0) * p.k]
    : [p.ox + c0 * p.k, p.oy + a0 * p.k, (c1 - c0) * p.k, (a1 - a0) * p.k];
}

/** Point at `along` on the wall's axis and `across` perpendicular to it, paper points. */
function at(p: Placement, b: WallBody, along: number, across: number): [number, number] {
  return b.axis === "h" ? [p.ox + along * p.k, p.oy + across * p.k] : [p.ox + across * p.k, p.oy + along * p.k];
}

function hexagon(pen: Pen, cx: number, cy: number, r: number): void {
  const pts: [number, number][] = [];
  for (let i = 0; i < 6; i++) pts.push([cx + r * Math.cos((i * Math.PI) / 3), cy + r * Math.sin((i * Math.PI) / 3)]);
  pen.polyline(pts, true);
}

export function drawPlan(pen: Pen, layout: UnitLayout, p: Placement): PlacedWindow[] {
  const walls = planWalls(layout);
  const openingGaps = (b: WallBody) => [...walls.windows, ...walls.doors].filter((o) => o.body === b).map((o) => o.span);

  for (const b of walls.bodies) {
    for (const seg of subtract(b.from, b.to, openingGaps(b))) {
      const [x, y, w, h] = bandRect(p, b, seg, b.line - b.thickness / 2, b.line + b.thickness / 2);
      pen.filledRect(x, y, w, h, POCHE_GRAY);
    }
  }
  pen.style(WEIGHTS.wall);
  for (const b of walls.bodies) {
    for (const f of b.faces) {
      for (const [a0, a1] of subtract(f.from, f.to, f.gaps)) {
        const [x1, y1] = at(p, b, a0, f.at);
        const [x2, y2] = at(p, b, a1, f.at);
        pen.line(x1, y1, x2, y2);
      }
    }
  }
  for (const c of walls.caps) pen.line(p.ox + c.x1 * p.k, p.oy + c.y1 * p.k, p.ox + c.x2 * p.k, p.oy + c.y2 * p.k);

  // Jamb lines close the wall ends at every opening.
  for (const o of [...walls.windows, ...walls.doors]) {
    const lo = o.body.line - o.body.thickness / 2;
    const hi = o.body.line + o.body.thickness / 2;
    for (const end of o.span) pen.line(...at(p, o.body, end, lo), ...at(p, o.body, end, hi));
  }

  const placed: PlacedWindow[] = [];
  pen.style(WEIGHTS.window);
  for (const { def, body, span } of walls.windows) {
    const half = body.thickness / 2;
    for (const across of [body.line - half, body.line, body.line + half]) {
      pen.line(...at(p, body, span[0], across), ...at(p, body, span[1], across));
    }
    const [x, y] = at(p, body, def.at, body.line);
    placed.push({ mark: def.mark, x, y });
    // The tag goes outside: away from the building's middle.
    const outward = body.axis === "h" ? (body.line < layout.depth / 2 ? -1 : 1) : body.line < layout.width / 2 ? -1 : 1;
    const [tx, ty] = at(p, body, def.at, body.line + outward * (half + TAG_OFFSET));
    pen.style(WEIGHTS.tag);
    hexagon(pen, tx, ty, 11);
    pen.text(def.mark, tx, ty - 3, { size: 8, align: "center", bold: true });
    pen.style(WEIGHTS.window);
  }

  for (const { def, body } of walls.doors) {
    const half = body.thickness / 2;
    const hingeAlong = def.at + (def.hinge * def.width) / 2;
    const faceAcross = body.line + def.swing * half;
    const [hx, hy] = at(p, body, hingeAlong, faceAcross);
    const [lx, ly] = at(p, body, hingeAlong, faceAcross + def.swing * def.width);
    pen.style(WEIGHTS.door).line(hx, hy, lx, ly);
    const leafAngle = (Math.atan2(ly - hy, lx - hx) * 180) / Math.PI;
    const [cx, cy] = at(p, body, def.at - (def.hinge * def.width) / 2, faceAcross);
    const closedAngle = (Math.atan2(cy - hy, cx - hx) * 180) / Math.PI;
    let sweep = closedAngle - leafAngle;
    if (sweep > 180) sweep -= 360;
    if (sweep < -180) sweep += 360;
    pen.style(WEIGHTS.swing, 0.35).arc(hx, hy, def.width * p.k, leafAngle, leafAngle + sweep);
  }
  pen.style(WEIGHTS.wall, 0);

  for (const room of layout.rooms) {
    const [x0, y0, x1, y1] = room.rect;
    const cx = p.ox + ((x0 + x1) / 2) * p.k;
    const cy = p.oy + ((y0 + y1) / 2) * p.k;
    pen.text(room.name, cx, cy + 2, { size: 8, align: "center", bold: true });
    const size = `${formatLength(x1 - x0, { style: "feet-inches" })} x ${formatLength(y1 - y0, { style: "feet-inches" })}`;
    if (room.kind !== "corridor" && room.kind !== "closet") pen.text(size, cx, cy - 8, { size: 6, align: "center" });
  }
  return placed;
}

export function windowSize(mark: WindowMark): { widthInches: number; heightInches: number } {
  const { widthInches, heightInches } = DEMO_WINDOW_TYPES[mark];
  return { widthInches, heightInches };
}
