import { describe, expect, it } from "vitest";
import { labourMinutes, type LabourRates } from "./pricing";
import type { Opening, TakeoffLine, TrimSpec } from "./types";

// Rates are a contractor's own (invented here); the figures are worked by hand from them. The rule — a
// premium per mull, per arched head and per bay corner on the style's minutes, doors per side — is common practice.
const rates: LabourRates = {
  minutesPerOpening: { "stool-and-apron": 75, "picture-frame": 50 },
  minutesPerExtensionFoot: 0, // extension minutes are tested in pricing.test.ts; here only the per-opening part
  hourlyRate: 60,
  minutesPerDoorSide: 35,
  minutesPerMull: 20,
  minutesArchPremium: 90,
  minutesPerBayCorner: 30,
};
const spec: TrimSpec = { style: "stool-and-apron", casingWidth: 3.5, casingThickness: 0.75 };
const line = (opening: Opening, quantity = 1): TakeoffLine => ({ opening, spec, quantity });

describe("labour per opening kind", () => {
  it("a window takes its style's minutes", () => {
    expect(labourMinutes([line({ width: 30, height: 40, setback: 1 }, 2)], rates)).toBe(150);
  });
  it("a mulled triple adds one mull rate per mull (two)", () => {
    expect(labourMinutes([line({ kind: "mulled", widths: [30, 30, 30], height: 48, setback: 1, mullGap: 1.5 })], rates)).toBe(75 + 2 * 20);
  });
  it("a door is priced per side, its style not applying; a two-sided door is twice a one-sided one", () => {
    const one = labourMinutes([line({ kind: "door", width: 30, height: 81, sides: 1 })], rates);
    const two = labourMinutes([line({ kind: "door", width: 30, height: 81, sides: 2 })], rates);
    expect(one).toBe(35);
    expect(two).toBe(2 * one);
  });
  it("a door side without its own rate is priced as a picture-frame opening, never as nothing", () => {
    const { minutesPerDoorSide: _, ...older } = rates;
    expect(labourMinutes([line({ kind: "door", width: 30, height: 81, sides: 2 })], older)).toBe(2 * 50);
  });
  it("a round-top and a segment head add the arched-head premium", () => {
    expect(labourMinutes([line({ kind: "round-top", width: 48, springHeight: 40, setback: 1 })], rates)).toBe(75 + 90);
    expect(labourMinutes([line({ kind: "segment-top", width: 48, springHeight: 40, rise: 8, setback: 1 })], rates)).toBe(75 + 90);
  });
  it("a three-unit bay adds a mull and a corner rate at each of its two corners", () => {
    expect(labourMinutes([line({ kind: "bay", widths: [24, 48, 24], turn: 45, height: 54, setback: 4, mullGap: 3 })], rates)).toBe(75 + 2 * (20 + 30));
  });
  it("price books written before kinds (no per-kind rates) add nothing for mulls, arches or corners", () => {
    const older: LabourRates = { minutesPerOpening: rates.minutesPerOpening, minutesPerExtensionFoot: 0, hourlyRate: 60 };
    expect(labourMinutes([line({ kind: "mulled", widths: [30, 30], height: 48, setback: 1, mullGap: 1.5 })], older)).toBe(75);
  });
  it("refuses a negative per-kind rate by name", () => {
    expect(() => labourMinutes([line({ width: 30, height: 40, setback: 1 })], { ...rates, minutesPerMull: -1 })).toThrow(/minutesPerMull/);
  });
});
