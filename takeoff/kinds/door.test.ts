import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { cutList } from "../cut-list";
import type { TrimSpec } from "../types";

describe("doors (issue 12 contract)", () => {
  const spec: TrimSpec = { style: "stool-and-apron", casingWidth: 2.25, casingThickness: 0.625, reveal: 0.1875 };

  it("a 30 × 81 door with 3/16 reveal and 2 1/4 casing → legs 83 7/16, head 34 7/8 per side (fits a 7' + 3' set)", () => {
    const pieces = cutList({ kind: "door", width: 30, height: 81, sides: 1 }, spec);
    expect(pieces).toEqual([
      { part: "casing-leg", material: "casing", quantity: 2, length: 83.4375, ends: ["square", "miter"] },
      { part: "casing-head", material: "casing", quantity: 1, length: 34.875, ends: ["miter", "miter"] },
    ]);
    expect(83.4375).toBeLessThanOrEqual(84);
    expect(34.875).toBeLessThanOrEqual(36);
  });

  it("has no stool, apron or extensions, and the spec's style does not change it", () => {
    const sa = cutList({ kind: "door", width: 32, height: 80, sides: 2 }, spec);
    const pf = cutList({ kind: "door", width: 32, height: 80, sides: 2 }, { ...spec, style: "picture-frame" });
    expect(pf).toEqual(sa);
    expect(sa.map((p) => p.material)).toEqual(["casing", "casing"]);
  });

  it("property: a two-sided door is twice a one-sided one", () => {
    const len = (lo: number, hi: number) => fc.integer({ min: lo * 16, max: hi * 16 }).map((n) => n / 16);
    fc.assert(
      fc.property(len(18, 72), len(60, 120), len(1.5, 5), (width, height, casingWidth) => {
        const s: TrimSpec = { style: "stool-and-apron", casingWidth, casingThickness: 0.75 };
        const one = cutList({ kind: "door", width, height, sides: 1 }, s);
        const two = cutList({ kind: "door", width, height, sides: 2 }, s);
        expect(two).toEqual(one.map((p) => ({ ...p, quantity: 2 * p.quantity })));
      }),
      { numRuns: 100 },
    );
  });
});
