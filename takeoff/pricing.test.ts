import { describe, expect, it } from "vitest";
import { bidTotal, labourCost, labourMinutes, type LabourRates } from "./pricing";
import type { TakeoffLine } from "./types";

const rates: LabourRates = {
  minutesPerOpening: { "stool-and-apron": 75, "picture-frame": 50 },
  minutesPerExtensionFoot: 4,
  hourlyRate: 68,
};
const lines: TakeoffLine[] = [
  // stool-and-apron, extension pieces 2 × 40 3/4 + 30 = 111 1/2 in each
  { opening: { width: 30, height: 40, setback: 1 }, spec: { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.75 }, quantity: 2 },
  // picture-frame without extension
  { opening: { width: 24, height: 24, setback: 0 }, spec: { style: "picture-frame", casingWidth: 2.5, casingThickness: 0.75 }, quantity: 3 },
];

// Expected figures are worked by hand from the stated rates; the rates themselves are the contractor's own.
describe("labour", () => {
  it("minutes per opening by style plus minutes per linear foot of extension", () => {
    const extensionFeet = (2 * 111.5) / 12;
    expect(labourMinutes(lines, rates)).toBeCloseTo(2 * 75 + 3 * 50 + 4 * extensionFeet, 12);
  });

  it("cost = minutes / 60 × hourly rate, rounded half up to the cent", () => {
    // (300 + 4 × 223/12) min = 374 1/3 min → 374 1/3 / 60 × 68 = 424.2444… → 424.24
    expect(labourCost(lines, rates)).toBe(424.24);
  });

  it("rejects negative rates by name", () => {
    expect(() => labourCost(lines, { ...rates, hourlyRate: -1 })).toThrow(/hourlyRate/);
  });
});

describe("bid", () => {
  // Common practice: many US states tax materials a contractor resells but not installation labour.
  it("marks up the subtotal and taxes the marked-up materials only by default", () => {
    const bid = bidTotal({ material: 1000, labour: 500 }, { markup: 0.15, taxRate: 0.0825 });
    expect(bid).toEqual({ material: 1000, labour: 500, subtotal: 1500, markup: 225, tax: 94.88, total: 1819.88 });
  });

  it("taxes labour too when asked", () => {
    const bid = bidTotal({ material: 1000, labour: 500 }, { markup: 0.15, taxRate: 0.0825, taxLabour: true });
    expect(bid.tax).toBe(142.31); // 1725 × 0.0825 = 142.3125
    expect(bid.total).toBe(1867.31);
  });

  it("total is the sum of the rounded lines", () => {
    const bid = bidTotal({ material: 333.333, labour: 0.005 }, { markup: 0.1, taxRate: 0.07 });
    expect(bid.total).toBeCloseTo(bid.subtotal + bid.markup + bid.tax, 10);
    expect(bid.material).toBe(333.33);
    expect(bid.labour).toBe(0.01);
  });
});
