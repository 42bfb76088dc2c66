/**
 * Dimension strings, graphic scale and north arrow. Conventions (common practice for architectural
 * plans): extension lines start a small gap off the object and run a little past the dimension line,
 * 45° slash ticks instead of arrows, text above the line reading from the bottom or the right.
 */
import { formatLength } from "@/takeoff";
import type { Pen } from "./pen";

export const DIM_WEIGHT = 0.25;
export const TICK_WEIGHT = 0.7;
const TICK = 4;
const GAP = 4;
const OVERRUN = 4;
const TEXT_SIZE = 7;

export function feetInches(inches: number): string {
  return formatLength(inches, { style: "feet-inches" });
}

/**
 * A chain of horizontal dimensions through the x stations, on the line at yLine; extension lines start
 * from yFrom (the object). `k` converts paper points back to real inches for the text.
 */
export function dimensionChainH(pen: Pen, xs: readonly number[], yLine: number, yFrom: number, k: number): void {
  const dir = yLine < yFrom ? -1 : 1;
  pen.style(DIM_WEIGHT);
  const first = xs[0];
  const last = xs[xs.length - 1];
  if (first === undefined || last === undefined) return;
  pen.line(first - OVERRUN, yLine, last + OVERRUN, yLine);
  for (const x of xs) pen.line(x, yFrom + dir * GAP, x, yLine + dir * OVERRUN);
  pen.style(TICK_WEIGHT);
  for (const x of xs) pen.line(x - TICK, yLine - TICK, x + TICK, yLine + TICK);
  for (let i = 1; i < xs.length; i++) {
    const a = xs[i - 1] ?? 0;
    const b = xs[i] ?? 0;
    pen.text(feetInches((b - a) / k), (a + b) / 2, yLine + 3, { size: TEXT_SIZE, align: "center" });
  }
}

/** Vertical counterpart of dimensionChainH; text is turned to read from the right side of the sheet. */
export function dimensionChainV(pen: Pen, ys: readonly number[], xLine: number, xFrom: number, k: number): void {
  const dir = xLine < xFrom ? -1 : 1;
  pen.style(DIM_WEIGHT);
  const first = ys[0];
  const last = ys[ys.length - 1];
  if (first === undefined || last === undefined) return;
  pen.line(xLine, first - OVERRUN, xLine, last + OVERRUN);
  for (const y of ys) pen.line(xFrom + dir * GAP, y, xLine + dir * OVERRUN, y);
  pen.style(TICK_WEIGHT);
  for (const y of ys) pen.line(xLine - TICK, y - TICK, xLine + TICK, y + TICK);
  for (let i = 1; i < ys.length; i++) {
    const a = ys[i - 1] ?? 0;
    const b = ys[i] ?? 0;
    pen.text(feetInches((b - a) / k), xLine - 3, (a + b) / 2, { size: TEXT_SIZE, align: "center", angle: 90 });
  }
}

/** Graphic scale 0–4'–8'–16' at `k` points per real inch, with the written scale under it. */
export function scaleBar(pen: Pen, x: number, y: number, k: number, note: string): void {
  const foot = 12 * k;
  const stops = [0, 4, 8, 16];
  pen.style(0.4);
  for (let i = 1; i < stops.length; i++) {
    const a = x + (stops[i - 1] ?? 0) * foot;
    const b = x + (stops[i] ?? 0) * foot;
    if (i % 2 === 1) pen.rect(a, y, b - a, 5, 0);
    else pen.rect(a, y, b - a, 5);
  }
  for (const s of stops) pen.text(s === 0 ? "0" : `${s}'`, x + s * foot, y + 9, { size: 6, align: "center" });
  pen.text(note, x, y - 11, { size: 7 });
}

export function northArrow(pen: Pen, cx: number, cy: number): void {
  pen.style(0.5).circle(cx, cy, 18);
  pen.polyline(
    [
      [cx, cy + 24],
      [cx - 7, cy - 12],
      [cx, cy - 6],
      [cx + 7, cy - 12],
    ],
    true,
  );
  pen.filledRect(cx - 0.5, cy - 6, 1, 30, 0);
  pen.text("N", cx, cy + 30, { size: 10, align: "center", bold: true });
  pen.text("PLAN NORTH", cx, cy - 30, { size: 5, align: "center" });
}
