import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { cutList } from "../cut-list";
import { Q } from "../testing/rational";
import type { CutPiece, MulledOpening, TrimSpec } from "../types";

const find = (pieces: CutPiece[], part: string) => pieces.find((p) => p.part === part);
const r16 = (q: Q) => q.nearestSixteenth().toNumber();
const jlc: TrimSpec = { style: "stool-and-apron", casingWidth: 3.5, casingThickness: 0.75, reveal: 0.25, stoolHorn: 0.25 };

describe("mulled units (issue 12 contract)", () => {
  it("JLC 'Production Jamb Extensions': 3 1/2 in casing with 1/4 in reveals → stool 8 in longer than the jamb opening, here the whole mulled opening", () => {
    const pieces = cutList({ kind: "mulled", widths: [30, 36], height: 48, setback: 0, mullGap: 4 }, jlc);
    // The jamb opening of a mulled pair runs from the left unit's outer jamb to the right unit's: 30 + 4 + 36.
    expect(find(pieces, "stool")?.length).toBe(70 + 8);
    expect(find(pieces, "apron")?.length).toBe(70 + 7.5);
  });

  it("a triple: one continuous head of OD, the window's two outer legs, one mullion casing per mull of mullGap − 2r, H + r", () => {
    const spec: TrimSpec = { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.6875 };
    const pieces = cutList({ kind: "mulled", widths: [30, 30, 30], height: 50, setback: 0.5, mullGap: 3.5 }, spec);
    const od = 90 + 2 * 3.5 + 0.25 + 5;
    expect(pieces).toEqual([
      { part: "casing-leg", material: "casing", quantity: 2, length: 50 + 0.125 + 2.5, ends: ["square", "miter"] },
      { part: "casing-head", material: "casing", quantity: 1, length: od, ends: ["miter", "miter"] },
      { part: "mullion-casing", material: "mullion", quantity: 2, length: 50.125, width: 3.25, ends: ["square", "square"] },
      { part: "stool", material: "stool", quantity: 1, length: od + 2 * 1.375, width: 1.5, ends: ["square", "square"] },
      { part: "apron", material: "apron", quantity: 1, length: od, ends: ["return", "return"] },
      { part: "apron-return", material: "apron", quantity: 2, length: 0.6875, ends: ["miter", "square"] },
      // Extensions per unit: two sides H + t each, and one head of the unit's width; equal units merge.
      { part: "extension-side", material: "extension", quantity: 6, length: 50.75, width: 0.5, ends: ["square", "square"] },
      { part: "extension-head", material: "extension", quantity: 3, length: 30, width: 0.5, ends: ["square", "square"] },
    ]);
  });

  it("picture-frame: head and bottom of OD, mullion casing between them H + 2r, per-unit extensions with bottoms", () => {
    const spec: TrimSpec = { style: "picture-frame", casingWidth: 3, casingThickness: 0.75, reveal: 0.25 };
    const pieces = cutList({ kind: "mulled", widths: [24, 32], height: 40, setback: 1, mullGap: 2 }, spec);
    expect(find(pieces, "casing-head")).toMatchObject({ quantity: 1, length: 56 + 2 + 0.5 + 6 });
    expect(find(pieces, "casing-bottom")).toMatchObject({ quantity: 1, length: 64.5 });
    expect(find(pieces, "casing-leg")).toMatchObject({ quantity: 2, length: 40 + 0.5 + 6, ends: ["miter", "miter"] });
    expect(find(pieces, "mullion-casing")).toEqual({ part: "mullion-casing", material: "mullion", quantity: 1, length: 40.5, width: 1.5, ends: ["square", "square"] });
    expect(find(pieces, "stool")).toBeUndefined();
    expect(pieces.filter((p) => p.part === "extension-bottom").map((p) => p.length).sort()).toEqual([24, 32]);
  });

  it("property: a mulled pair's head and stool equal a window's of the combined width plus the mull gap; legs equal the window's", () => {
    const len = (lo: number, hi: number) => fc.integer({ min: lo * 16, max: hi * 16 }).map((n) => n / 16);
    fc.assert(
      fc.property(len(12, 60), len(12, 60), len(20, 80), len(0.5, 6), fc.constantFrom("stool-and-apron" as const, "picture-frame" as const), (a, b, h, gap, style) => {
        const spec: TrimSpec = { style, casingWidth: 2.5, casingThickness: 0.75, reveal: 0.125 };
        const mulled = cutList({ kind: "mulled", widths: [a, b], height: h, setback: 0, mullGap: gap }, spec);
        const window = cutList({ width: a + b + gap, height: h, setback: 0 }, spec);
        for (const part of ["casing-head", "casing-leg", "casing-bottom", "stool", "apron"]) expect(find(mulled, part)).toEqual(find(window, part));
        expect(find(mulled, "mullion-casing")?.width).toBe(r16(Q.of(gap).sub(0.25)));
      }),
      { numRuns: 200 },
    );
  });

  it("lengths are exact until rounded once on the way out: a sum at an exact half sixteenth rounds up", () => {
    // OD = 30 1/32 + 30 + 4 + 1/4 + 5 = 69 9/32 exactly, a half sixteenth: rounds up to 69 5/16.
    const o: MulledOpening = { kind: "mulled", widths: [30.03125, 30], height: 40, setback: 0, mullGap: 4 };
    const head = find(cutList(o, { style: "picture-frame", casingWidth: 2.5, casingThickness: 0.75 }), "casing-head");
    expect(head?.length).toBe(r16(Q.decimal("30.03125").add(34).add(Q.decimal("5.25"))));
    expect(head?.length).toBe(69.3125);
  });
});
