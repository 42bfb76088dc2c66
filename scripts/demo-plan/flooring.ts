/**
 * Extra vector paths for heavy-sheet benchmarks, drawn as floor finish patterns so the sheet still looks
 * like a plan: plank flooring with staggered joints in dry rooms, 1:2 tile in wet rooms. The pattern is
 * made finer until it has at least N strokes, then joints are thinned evenly to exactly N — missing
 * joints in a running-bond pattern are invisible in practice.
 */
import type { Pen } from "./pen";
import type { Placement } from "./draw-plan";
import type { RoomDef, RoomKind } from "./layouts";
import { prng } from "@/lib/prng";

export const FLOORING_WEIGHT = 0.15;
const WET: ReadonlySet<RoomKind> = new Set(["bath", "kitchen", "laundry", "mail"]);
const SKIP: ReadonlySet<RoomKind> = new Set(["stair"]);

type Segment = [number, number, number, number];

function pattern(rooms: readonly RoomDef[], p: Placement, spacing: number, seed: number): { rows: Segment[]; joints: Segment[] } {
  const rows: Segment[] = [];
  const joints: Segment[] = [];
  const random = prng(seed);
  for (const room of rooms) {
    if (SKIP.has(room.kind)) continue;
    const [x0, y0, x1, y1] = room.rect.map((v) => v * p.k) as [number, number, number, number];
    const s = spacing * p.k;
    const length = (WET.has(room.kind) ? 2 : 6) * s;
    for (let y = y0 + s; y < y1 - 1e-9; y += s) {
      rows.push([p.ox + x0, p.oy + y, p.ox + x1, p.oy + y]);
      const below = y - s;
      for (let x = x0 + random() * length; x < x1 - 1e-9; x += length) joints.push([p.ox + x, p.oy + below, p.ox + x, p.oy + y]);
    }
  }
  return { rows, joints };
}

/** Exactly `count` flooring strokes for these rooms (none when count is 0). */
export function flooringSegments(rooms: readonly RoomDef[], p: Placement, count: number, seed = 1): Segment[] {
  if (count <= 0) return [];
  let spacing = 24;
  let found = pattern(rooms, p, spacing, seed);
  while (found.rows.length + found.joints.length < count) {
    if (spacing < 0.05) throw new RangeError(`cannot fit ${count} flooring paths in these rooms`);
    spacing *= 0.85;
    found = pattern(rooms, p, spacing, seed);
  }
  if (found.rows.length >= count) return found.rows.slice(0, count);
  const keep = count - found.rows.length;
  const J = found.joints.length;
  const kept = found.joints.filter((_, i) => Math.floor(((i + 1) * keep) / J) > Math.floor((i * keep) / J));
  return [...found.rows, ...kept];
}

export function drawFlooring(pen: Pen, segments: readonly Segment[]): void {
  pen.style(FLOORING_WEIGHT, 0.55);
  for (const [x1, y1, x2, y2] of segments) pen.line(x1, y1, x2, y2);
  pen.style(FLOORING_WEIGHT, 0);
}
