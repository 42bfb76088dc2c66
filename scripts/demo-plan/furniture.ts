/**
 * Light furniture and fixtures, so a plan reads like one. Sizes are typical nominal ones recalled from
 * memory (queen bed 60×80, tub 30×60, base cabinets 24 deep); they carry no meaning for the takeoff.
 */
import type { Pen } from "./pen";
import type { Placement } from "./draw-plan";
import type { RoomDef } from "./layouts";

export const FURNITURE_WEIGHT = 0.2;

export function drawFurniture(pen: Pen, room: RoomDef, p: Placement): void {
  const [x0, y0, x1, y1] = room.rect;
  const w = x1 - x0;
  const h = y1 - y0;
  const cx = (x0 + x1) / 2;
  const R = (x: number, y: number, rw: number, rh: number) => pen.rect(p.ox + x * p.k, p.oy + y * p.k, rw * p.k, rh * p.k);
  const C = (x: number, y: number, r: number) => pen.circle(p.ox + x * p.k, p.oy + y * p.k, r * p.k);
  const L = (ax: number, ay: number, bx: number, by: number) =>
    pen.line(p.ox + ax * p.k, p.oy + ay * p.k, p.ox + bx * p.k, p.oy + by * p.k);
  pen.style(FURNITURE_WEIGHT, 0.25);
  switch (room.kind) {
    case "bed": {
      const bw = w > 130 ? 60 : 54;
      R(cx - bw / 2, y1 - 82, bw, 80);
      R(cx - bw / 2 + 4, y1 - 18, bw / 2 - 6, 14);
      R(cx + 2, y1 - 18, bw / 2 - 6, 14);
      if (w > bw + 44) {
        R(cx - bw / 2 - 20, y1 - 20, 18, 18);
        R(cx + bw / 2 + 2, y1 - 20, 18, 18);
      }
      break;
    }
    case "living": {
      R(cx - 42, y0 + 30, 84, 34);
      R(cx - 24, y0 + 72, 48, 20);
      if (h > 190) C(cx, y1 - 40, 21);
      break;
    }
    case "kitchen": {
      R(x0, y1 - 24, w, 24);
      R(cx - 16, y1 - 20, 14, 16);
      R(cx + 2, y1 - 20, 14, 16);
      for (const [dx, dy] of [[-8, -6], [8, -6], [-8, 8], [8, 8]] as const) C(x0 + 24 + dx / 2, y1 - 12 + dy / 2, 3.5);
      if (h > 100) R(cx - 30, y0 + 20, 60, 36);
      break;
    }
    case "bath": {
      R(x0, y1 - 30, Math.min(60, w), 30);
      R(x1 - 22, y0 + 60, 20, 8);
      C(x1 - 12, y0 + 52, 8);
      R(x0, y0 + 90, 21, 36);
      C(x0 + 11, y0 + 108, 6);
      break;
    }
    case "closet":
      L(x0 + 2, y1 - 14, x1 - 2, y1 - 14);
      L(x0 + 2, y1 - 12, x1 - 2, y1 - 12);
      break;
    case "laundry":
      R(x0 + 2, y1 - 29, 27, 27);
      R(x0 + 31, y1 - 29, 27, 27);
      break;
    case "lobby":
      R(cx - 48, y1 - 60, 96, 30);
      break;
    case "mail":
      for (let i = 0; i < 6; i++) R(x0 + 4 + i * 30, y1 - 18, 28, 16);
      break;
    case "fitness":
      for (let i = 0; i < 3; i++) R(x0 + 20 + i * 60, y1 - 90, 32, 78);
      break;
    case "stair": {
      for (let y = y0 + 11; y < y1 - 40; y += 11) L(x0, y, cx - 2, y);
      L(cx, y0, cx, y1 - 40);
      pen.text("UP", p.ox + (x0 + 10) * p.k, p.oy + (y1 - 30) * p.k, { size: 6 });
      break;
    }
    case "corridor":
      break;
  }
  pen.style(FURNITURE_WEIGHT, 0);
}
