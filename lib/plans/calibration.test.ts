import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  PDF_UNIT_INCHES,
  STANDARD_SCALES,
  constrainToAxis,
  distance,
  inchesPerUnitFromPoints,
  inchesPerUnitFromScale,
  measureInches,
  scaleById,
  scaleMismatchPercent,
} from "./calibration";

/**
 * Scale ratios: "invert the fraction and multiply by 12" for architectural scales (1/8" = 1'-0" → 96) and
 * "multiply the feet by 12" for engineering scales (1" = 20' → 240), with the table of standard scales —
 * FAID Tech drafting standards, "Scale" (sites.google.com/view/faidtech/standards/scale). The engineering
 * 60' and the metric 1:20 … 1:200 entries are recalled from memory (common drafting series).
 */
const ratio = (id: string) => scaleById(id)?.ratio;

describe("PDF units", () => {
  it("are 1/72 inch by default (ISO 32000-1:2008 §8.3.2.3)", () => {
    expect(PDF_UNIT_INCHES).toBe(1 / 72);
  });

  it("grow with UserUnit (ISO 32000-1:2008 §14.11.2: a unit is UserUnit × 1/72 in)", () => {
    expect(inchesPerUnitFromScale(1, 1)).toBeCloseTo(1 / 72, 15);
    expect(inchesPerUnitFromScale(1, 2)).toBeCloseTo(2 / 72, 15);
    expect(inchesPerUnitFromScale(48, 1)).toBeCloseTo(2 / 3, 15);
    expect(inchesPerUnitFromScale(48, 2)).toBeCloseTo(4 / 3, 15);
  });
});

describe("standard scales (FAID Tech drafting standards, 'Scale')", () => {
  it("gives real/paper ratios for the architectural scales", () => {
    expect(ratio("arch-1-16")).toBe(192);
    expect(ratio("arch-1-8")).toBe(96);
    expect(ratio("arch-3-16")).toBe(64);
    expect(ratio("arch-1-4")).toBe(48);
    expect(ratio("arch-3-8")).toBe(32);
    expect(ratio("arch-1-2")).toBe(24);
    expect(ratio("arch-3-4")).toBe(16);
    expect(ratio("arch-1")).toBe(12);
    expect(ratio("arch-1-1-2")).toBe(8);
    expect(ratio("arch-3")).toBe(4);
  });

  it("gives 12 × feet for the engineering scales", () => {
    expect(ratio("eng-10")).toBe(120);
    expect(ratio("eng-20")).toBe(240);
    expect(ratio("eng-30")).toBe(360);
    expect(ratio("eng-40")).toBe(480);
    expect(ratio("eng-50")).toBe(600);
    expect(ratio("eng-60")).toBe(720); // recalled from memory as a standard engineer's-scale division
    expect(ratio("eng-100")).toBe(1200);
  });

  it("uses the ratio itself for metric scales (recalled from memory)", () => {
    expect(STANDARD_SCALES.filter((s) => s.family === "metric").map((s) => [s.label, s.ratio])).toEqual([
      ["1:20", 20],
      ["1:25", 25],
      ["1:50", 50],
      ["1:100", 100],
      ["1:200", 200],
    ]);
  });

  it("labels scales as they are printed and keeps ids unique", () => {
    expect(scaleById("arch-1-4")?.label).toBe(`1/4" = 1'-0"`);
    expect(scaleById("arch-1-1-2")?.label).toBe(`1 1/2" = 1'-0"`);
    expect(scaleById("eng-20")?.label).toBe(`1" = 20'`);
    expect(new Set(STANDARD_SCALES.map((s) => s.id)).size).toBe(STANDARD_SCALES.length);
    expect(scaleById("nope")).toBeUndefined();
  });
});

describe("measuring", () => {
  it("calibrates from two points and a known length", () => {
    // 12'-7 1/2" = 151.5 in at 1/4" = 1'-0" is 151.5 / 48 in of paper = 227.25 pt.
    const ipu = inchesPerUnitFromPoints({ x: 100, y: 200 }, { x: 327.25, y: 200 }, 151.5);
    expect(ipu).toBeCloseTo(inchesPerUnitFromScale(48), 12);
    expect(measureInches({ x: 0, y: 0 }, { x: 30, y: 40 }, ipu)).toBeCloseTo(50 * (2 / 3), 12);
    expect(distance({ x: 1, y: 1 }, { x: 4, y: 5 })).toBe(5);
  });

  it("measures back what it calibrated from, for any two distinct points", () => {
    const coord = fc.double({ min: -5000, max: 5000, noNaN: true });
    fc.assert(
      fc.property(coord, coord, coord, coord, fc.double({ min: 0.01, max: 10_000, noNaN: true }), (ax, ay, bx, by, inches) => {
        fc.pre(Math.hypot(bx - ax, by - ay) > 1e-3);
        const a = { x: ax, y: ay };
        const b = { x: bx, y: by };
        expect(measureInches(a, b, inchesPerUnitFromPoints(a, b, inches))).toBeCloseTo(inches, 6);
      }),
    );
  });

  it("reports how far picked points disagree with the chosen scale, in percent", () => {
    const scale = inchesPerUnitFromScale(48);
    expect(scaleMismatchPercent(scale * 1.01, scale)).toBeCloseTo(1, 10);
    expect(scaleMismatchPercent(scale * 0.98, scale)).toBeCloseTo(2, 10);
    expect(scaleMismatchPercent(scale, scale)).toBe(0);
    // Picking 1/8" = 1'-0" on a 1/4" sheet is off by half the scale's value.
    expect(scaleMismatchPercent(inchesPerUnitFromScale(48), inchesPerUnitFromScale(96))).toBeCloseTo(50, 10);
  });

  it("refuses calibrations that would divide by zero or measure negative", () => {
    expect(() => inchesPerUnitFromPoints({ x: 1, y: 1 }, { x: 1, y: 1 }, 12)).toThrow(RangeError);
    expect(() => inchesPerUnitFromPoints({ x: 0, y: 0 }, { x: 1, y: 1 }, 0)).toThrow(RangeError);
    expect(() => inchesPerUnitFromScale(-48)).toThrow(RangeError);
    expect(() => inchesPerUnitFromScale(48, 0)).toThrow(RangeError);
    expect(() => measureInches({ x: 0, y: 0 }, { x: 1, y: 0 }, Number.NaN)).toThrow(RangeError);
    expect(() => scaleMismatchPercent(1, 0)).toThrow(RangeError);
  });
});

describe("constrainToAxis", () => {
  const from = { x: 10, y: 10 };
  it("snaps to the horizontal when the run is longer than the rise", () => {
    expect(constrainToAxis(from, { x: 50, y: 20 })).toEqual({ x: 50, y: 10 });
    expect(constrainToAxis(from, { x: -30, y: 0 })).toEqual({ x: -30, y: 10 });
  });
  it("snaps to the vertical when the rise is longer", () => {
    expect(constrainToAxis(from, { x: 12, y: 90 })).toEqual({ x: 10, y: 90 });
    expect(constrainToAxis(from, { x: 0, y: -40 })).toEqual({ x: 10, y: -40 });
  });
  it("goes horizontal on a 45° tie", () => {
    expect(constrainToAxis(from, { x: 20, y: 20 })).toEqual({ x: 20, y: 10 });
  });
});
