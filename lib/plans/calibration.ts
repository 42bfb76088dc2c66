/**
 * Sheet calibration: how many real inches one PDF user-space unit stands for, and measuring with it.
 * Pure; runs in the browser viewer and on the server. Every point is in PDF user space of the page
 * (unrotated, y up), never in screen pixels, so a calibration survives zoom, rotation and screen density.
 */

export interface Point {
  x: number;
  y: number;
}

/**
 * Inches per default user-space unit. ISO 32000-1:2008 §8.3.2.3: "the default for the size of the unit
 * in default user space (1/72 inch) is approximately the same as a point". A page's /UserUnit
 * (ISO 32000-1:2008 §14.11.2, default 1.0) multiplies that unit, so one unit is userUnit/72 inch.
 */
export const PDF_UNIT_INCHES = 1 / 72;

export type ScaleFamily = "architectural" | "engineering" | "metric";

export interface StandardScale {
  id: string;
  /** As printed on a sheet: 1/4" = 1'-0", 1" = 20', 1:50. */
  label: string;
  /** Real length over paper length: 1/4" = 1'-0" → 12 / 0.25 = 48. */
  ratio: number;
  family: ScaleFamily;
}

/** [id, label, paper inches per real foot] — ratio is 12 / paper inches. */
const ARCHITECTURAL: [string, string, number][] = [
  ["arch-1-16", `1/16" = 1'-0"`, 1 / 16],
  ["arch-1-8", `1/8" = 1'-0"`, 1 / 8],
  ["arch-3-16", `3/16" = 1'-0"`, 3 / 16],
  ["arch-1-4", `1/4" = 1'-0"`, 1 / 4],
  ["arch-3-8", `3/8" = 1'-0"`, 3 / 8],
  ["arch-1-2", `1/2" = 1'-0"`, 1 / 2],
  ["arch-3-4", `3/4" = 1'-0"`, 3 / 4],
  ["arch-1", `1" = 1'-0"`, 1],
  ["arch-1-1-2", `1 1/2" = 1'-0"`, 3 / 2],
  ["arch-3", `3" = 1'-0"`, 3],
];

/** Engineering scales: 1 inch of paper = N feet, so ratio = 12 N. */
const ENGINEERING_FEET = [10, 20, 30, 40, 50, 60, 100];
const METRIC = [20, 25, 50, 100, 200];

export const STANDARD_SCALES: readonly StandardScale[] = [
  ...ARCHITECTURAL.map(([id, label, paper]) => ({ id, label, ratio: 12 / paper, family: "architectural" as const })),
  ...ENGINEERING_FEET.map((feet) => ({ id: `eng-${feet}`, label: `1" = ${feet}'`, ratio: 12 * feet, family: "engineering" as const })),
  ...METRIC.map((n) => ({ id: `metric-${n}`, label: `1:${n}`, ratio: n, family: "metric" as const })),
];

export function scaleById(id: string): StandardScale | undefined {
  return STANDARD_SCALES.find((s) => s.id === id);
}

function assertPositive(name: string, value: number): void {
  if (!Number.isFinite(value) || value <= 0) throw new RangeError(`${name} must be a positive number, got ${value}`);
}

/** Real inches per user-space unit for a drawing at `ratio` (real/paper) on a page with this UserUnit. */
export function inchesPerUnitFromScale(ratio: number, userUnit = 1): number {
  assertPositive("scale ratio", ratio);
  assertPositive("userUnit", userUnit);
  return (ratio * userUnit) / 72;
}

export function distance(a: Point, b: Point): number {
  return Math.hypot(b.x - a.x, b.y - a.y);
}

/**
 * Real inches per unit from two picked points and the real length between them. UserUnit does not enter:
 * both the points and the result are in the page's own user-space units.
 */
export function inchesPerUnitFromPoints(a: Point, b: Point, inches: number): number {
  assertPositive("known length", inches);
  const d = distance(a, b);
  if (!(d > 0)) throw new RangeError("the two calibration points must be different");
  return inches / d;
}

export function measureInches(a: Point, b: Point, inchesPerUnit: number): number {
  assertPositive("inches per unit", inchesPerUnit);
  return distance(a, b) * inchesPerUnit;
}

/** How far picked points disagree with the chosen scale, as a percentage of the scale's value (always ≥ 0). */
export function scaleMismatchPercent(pointsIpu: number, scaleIpu: number): number {
  assertPositive("inches per unit from points", pointsIpu);
  assertPositive("inches per unit from scale", scaleIpu);
  return (Math.abs(pointsIpu - scaleIpu) / scaleIpu) * 100;
}

/**
 * Shift-constrained measuring: keeps `to` on the horizontal or vertical through `from`, whichever is closer
 * (a tie goes horizontal). Page rotations are multiples of 90°, so user-space axes stay screen axes.
 */
export function constrainToAxis(from: Point, to: Point): Point {
  return Math.abs(to.x - from.x) >= Math.abs(to.y - from.y) ? { x: to.x, y: from.y } : { x: from.x, y: to.y };
}
