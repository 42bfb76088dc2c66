/**
 * Where a sheet's drawing lands in PDF user space. Everything is drawn in "paper points": 1/72 inch on
 * the sheet as displayed, origin bottom-left, ARCH D landscape. A /Rotate page gets a box turned the
 * other way and a matching `cm`, so it still displays landscape — as plotters often write rotated sheets.
 * /UserUnit u makes one unit u/72 inch (ISO 32000-1 §14.11.2), so the box and drawing shrink by 1/u.
 */

export type Rotation = 0 | 90 | 180 | 270;

/** ARCH D, 36 × 24 in, in points (ISO 32000-1 §8.3.2.3: 72 units per inch). */
export const SHEET_WIDTH_PT = 36 * 72;
export const SHEET_HEIGHT_PT = 24 * 72;

export type Matrix = [number, number, number, number, number, number];

export interface SheetFrame {
  rotation: Rotation;
  userUnit: number;
  /** The unrotated page box, user-space units. */
  pageWidth: number;
  pageHeight: number;
  /** Paper points → user space, as a PDF `cm` matrix. */
  matrix: Matrix;
  toUser(x: number, y: number): { x: number; y: number };
}

export function sheetFrame(rotation: Rotation = 0, userUnit = 1): SheetFrame {
  if (!(userUnit > 0)) throw new RangeError("userUnit must be positive");
  const W = SHEET_WIDTH_PT;
  const H = SHEET_HEIGHT_PT;
  const turned = rotation === 90 || rotation === 270;
  // Inverse of the viewer's clockwise turn: displayed (px, py) → unrotated user space.
  const base: Record<Rotation, Matrix> = {
    0: [1, 0, 0, 1, 0, 0],
    90: [0, 1, -1, 0, H, 0],
    180: [-1, 0, 0, -1, W, H],
    270: [0, -1, 1, 0, 0, W],
  };
  const matrix = base[rotation].map((v) => v / userUnit) as Matrix;
  const [a, b, c, d, e, f] = matrix;
  return {
    rotation,
    userUnit,
    pageWidth: (turned ? H : W) / userUnit,
    pageHeight: (turned ? W : H) / userUnit,
    matrix,
    toUser: (x, y) => ({ x: a * x + c * y + e, y: b * x + d * y + f }),
  };
}
