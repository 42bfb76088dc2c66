import { describe, expect, it } from "vitest";
import { cutList } from "../cut-list";
import { takeoffTotals } from "../totals";
import type { CutPiece, TrimSpec } from "../types";
import { archSegments } from "./arch-segments";

const find = (pieces: CutPiece[], part: string) => pieces.find((p) => p.part === part);
const spec: TrimSpec = { style: "stool-and-apron", casingWidth: 3.5, casingThickness: 0.75, reveal: 0.25, stoolHorn: 0.25 };
const opening = { kind: "round-top", width: 48, springHeight: 40, setback: 1 } as const;

describe("round-top (issue 12 contract)", () => {
  it("a 48 in half-round with 1/4 reveal and 3 1/2 casing → inner arc 76.18, outer 87.18", () => {
    const arch = find(cutList(opening, spec), "casing-arch");
    expect(arch).toMatchObject({ material: "casing", quantity: 1, radius: 24.25, sweep: 180, ends: ["square", "square"] });
    // The outer arc is the length, rounded to 1/16: 87.18 → 87 3/16; the inner arc is π × radius.
    expect(arch?.length).toBe(87.1875);
    expect(Math.abs((arch?.length ?? 0) - 87.18)).toBeLessThan(1 / 32);
    expect(Math.PI * (arch?.radius ?? 0)).toBeCloseTo(76.18, 2);
  });

  it("legs stand on the stool, square both ends at the spring line; stool and apron from OD (JLC: stool 8 in longer than the jamb opening)", () => {
    const pieces = cutList(opening, spec);
    expect(find(pieces, "casing-leg")).toEqual({ part: "casing-leg", material: "casing", quantity: 2, length: 40, ends: ["square", "square"] });
    expect(find(pieces, "stool")?.length).toBe(48 + 8);
    expect(find(pieces, "apron")?.length).toBe(48 + 0.5 + 7);
  });

  it("extensions: two sides of springHeight and one bent arch of π·width/2, radius width/2", () => {
    const pieces = cutList(opening, spec);
    expect(find(pieces, "extension-side")).toMatchObject({ quantity: 2, length: 40, width: 1 });
    const arch = find(pieces, "extension-arch");
    expect(arch).toMatchObject({ material: "extension", quantity: 1, radius: 24, width: 1, sweep: 180 });
    expect(arch?.length).toBe(Math.round(Math.PI * 24 * 16) / 16);
  });

  it("picture-frame (derived): legs rise from the bottom miter, springHeight + r + w, with a bottom of OD", () => {
    const pieces = cutList(opening, { ...spec, style: "picture-frame" });
    expect(find(pieces, "casing-leg")).toMatchObject({ quantity: 2, length: 40 + 0.25 + 3.5, ends: ["miter", "square"] });
    expect(find(pieces, "casing-bottom")).toMatchObject({ quantity: 1, length: 55.5, ends: ["miter", "miter"] });
    expect(find(pieces, "extension-side")?.length).toBe(40.75);
    expect(find(pieces, "extension-bottom")?.length).toBe(48);
  });
});

describe("curved casing in the totals", () => {
  it("from 5 1/2 in stock: four 45° segments, blanks 21 1/4, end cuts 22 1/2° (derived: ring segment in a board)", () => {
    // Depth of a 45° segment: 27.75 − 24.25·cos 22.5° = 5.35 ≤ 5.5; of a 60° one 6.75 > 5.5, so three do not fit.
    expect(archSegments(24.25, 27.75, 180, 5.5)).toEqual({ boardWidth: 5.5, count: 4, blankLength: 21.25, endCut: 22.5 });
    const totals = takeoffTotals([{ opening, spec: { ...spec, curvedCasing: "segments", segmentBoardWidth: 5.5 }, quantity: 3 }]);
    const casing = totals.find((t) => t.material === "casing");
    expect(casing?.curved).toEqual([
      {
        part: "casing-arch",
        radius: 24.25,
        outerRadius: 27.75,
        sweep: 180,
        length: 87.1875,
        pieces: 3,
        segments: { boardWidth: 5.5, count: 4, blankLength: 21.25, endCut: 22.5, blanks: 12 },
      },
    ]);
    // Straight casing is only the legs: 3 openings × 2 × 40.
    expect(casing).toMatchObject({ pieces: 6, linearInches: 240 });
  });

  it("by radius and count when the spec does not say segments; bent extensions are always by radius", () => {
    const totals = takeoffTotals([
      { opening, spec, quantity: 2 },
      { opening: { ...opening, springHeight: 30 }, spec, quantity: 1 },
    ]);
    expect(totals.find((t) => t.material === "casing")?.curved).toEqual([
      { part: "casing-arch", radius: 24.25, outerRadius: 27.75, sweep: 180, length: 87.1875, pieces: 3 },
    ]);
    expect(totals.find((t) => t.material === "extension")?.curved).toEqual([
      { part: "extension-arch", radius: 24, sweep: 180, length: 75.375, pieces: 3 },
    ]);
  });

  it("segments: a wider board takes fewer; a board barely wider than the casing takes many; never one over 180°", () => {
    expect(archSegments(24.25, 27.75, 180, 8).count).toBe(3);
    expect(archSegments(24.25, 27.75, 180, 100).count).toBe(1);
    const many = archSegments(24.25, 27.75, 180, 3.6);
    const phi = ((180 / many.count) * Math.PI) / 180;
    expect(27.75 - 24.25 * Math.cos(phi / 2)).toBeLessThanOrEqual(3.6);
    const fewer = ((180 / (many.count - 1)) * Math.PI) / 180;
    expect(27.75 - 24.25 * Math.cos(fewer / 2)).toBeGreaterThan(3.6);
  });

  it("refuses segments without a board width, or a board no wider than the casing, naming the field", () => {
    expect(() => cutList(opening, { ...spec, curvedCasing: "segments" })).toThrow(/segmentBoardWidth: segment board width is needed/);
    expect(() => cutList(opening, { ...spec, curvedCasing: "segments", segmentBoardWidth: 3.5 })).toThrow(/segmentBoardWidth: .*more than the casing width/);
  });
});
