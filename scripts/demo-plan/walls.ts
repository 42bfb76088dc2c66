/**
 * Wall faces of a layout as axis-aligned lines with gaps — where openings break both faces and where an
 * interior wall meets another wall's face — so the plan reads as cleaned-up double lines, the way walls
 * are drawn on construction plans. Real inches, layout coordinates.
 */
import type { DoorDef, Side, UnitLayout, WindowDef } from "./layouts";
import { DEMO_WINDOW_TYPES } from "./layouts";

export type Interval = [number, number];

export interface Face {
  axis: "h" | "v";
  /** The fixed coordinate: y for a horizontal face, x for a vertical one. */
  at: number;
  from: number;
  to: number;
  gaps: Interval[];
}

/** A wall body: the band between its two faces, for poché and for finding which wall an opening is in. */
export interface WallBody {
  axis: "h" | "v";
  /** Centerline coordinate. */
  line: number;
  thickness: number;
  from: number;
  to: number;
  exterior: boolean;
  /** Faces on the low and high side of the centerline. */
  faces: [Face, Face];
}

export interface Cap {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
}

const EPS = 1e-6;

/** What remains of [from, to] once the gaps are taken out. */
export function subtract(from: number, to: number, gaps: readonly Interval[]): Interval[] {
  const sorted = [...gaps].sort((a, b) => a[0] - b[0]);
  const out: Interval[] = [];
  let start = from;
  for (const [g0, g1] of sorted) {
    if (g1 <= start + EPS) continue;
    if (g0 >= to - EPS) break;
    if (g0 > start + EPS) out.push([start, g0]);
    start = Math.max(start, g1);
  }
  if (to > start + EPS) out.push([start, to]);
  return out;
}

function face(axis: "h" | "v", at: number, from: number, to: number): Face {
  return { axis, at, from, to, gaps: [] };
}

function exteriorBodies(l: UnitLayout): WallBody[] {
  const t = l.exteriorWall;
  const { width: W, depth: D } = l;
  const body = (axis: "h" | "v", line: number, len: number, outerLow: boolean): WallBody => {
    const outer = face(axis, outerLow ? line - t / 2 : line + t / 2, 0, len);
    const inner = face(axis, outerLow ? line + t / 2 : line - t / 2, t, len - t);
    return { axis, line, thickness: t, from: 0, to: len, exterior: true, faces: outerLow ? [outer, inner] : [inner, outer] };
  };
  return [body("h", t / 2, W, true), body("h", D - t / 2, W, false), body("v", t / 2, D, true), body("v", W - t / 2, D, false)];
}

export function exteriorBody(bodies: readonly WallBody[], side: Side, l: UnitLayout): WallBody {
  const t = l.exteriorWall;
  const want = { bottom: ["h", t / 2], top: ["h", l.depth - t / 2], left: ["v", t / 2], right: ["v", l.width - t / 2] }[side];
  const found = bodies.find((b) => b.exterior && b.axis === want[0] && Math.abs(b.line - (want[1] as number)) < EPS);
  if (!found) throw new Error(`no exterior wall on side ${side}`);
  return found;
}

function bodyAt(bodies: readonly WallBody[], door: DoorDef): WallBody {
  const found = bodies.find((b) => b.axis === door.axis && Math.abs(b.line - door.line) < EPS && b.from <= door.at && door.at <= b.to);
  if (!found) throw new Error(`door at ${door.axis} ${door.line}/${door.at} is not in a wall`);
  return found;
}

export interface WallPlan {
  bodies: WallBody[];
  caps: Cap[];
  /** Rough openings: the body they break and the interval along it. */
  windows: { def: WindowDef; body: WallBody; span: Interval }[];
  doors: { def: DoorDef; body: WallBody; span: Interval }[];
}

export function planWalls(l: UnitLayout): WallPlan {
  const bodies = exteriorBodies(l);
  const ti = l.interiorWall;
  for (const w of l.walls) {
    const axis = w.y1 === w.y2 ? "h" : "v";
    const line = axis === "h" ? w.y1 : w.x1;
    const [from, to] = axis === "h" ? [w.x1, w.x2] : [w.y1, w.y2];
    const faces: [Face, Face] = [face(axis, line - ti / 2, from, to), face(axis, line + ti / 2, from, to)];
    bodies.push({ axis, line, thickness: ti, from, to, exterior: false, faces });
  }
  // Each interior wall end either meets a perpendicular face (break it there) or stands free (cap it).
  const caps: Cap[] = [];
  for (const b of bodies.filter((x) => !x.exterior)) {
    for (const end of [b.from, b.to]) {
      const lo = b.line - b.thickness / 2;
      const hi = b.line + b.thickness / 2;
      const hit = bodies
        .flatMap((o) => o.faces)
        .find((f) => f.axis !== b.axis && Math.abs(f.at - end) < EPS && f.from <= lo + EPS && hi <= f.to + EPS);
      if (hit) hit.gaps.push([lo, hi]);
      else caps.push(b.axis === "h" ? { x1: end, y1: lo, x2: end, y2: hi } : { x1: lo, y1: end, x2: hi, y2: end });
    }
  }
  const windows = l.windows.map((def) => {
    const body = exteriorBody(bodies, def.side, l);
    const half = DEMO_WINDOW_TYPES[def.mark].widthInches / 2;
    const span: Interval = [def.at - half, def.at + half];
    for (const f of body.faces) f.gaps.push(span);
    return { def, body, span };
  });
  const doors = l.doors.map((def) => {
    const body = bodyAt(bodies, def);
    const span: Interval = [def.at - def.width / 2, def.at + def.width / 2];
    for (const f of body.faces) f.gaps.push(span);
    return { def, body, span };
  });
  return { bodies, caps, windows, doors };
}
