import { describe, expect, it } from "vitest";
import { TINTS, contrastRatio, tintAt } from "./palette";

describe("tag palette", () => {
  it("gives every tint a text colour that meets WCAG AA (4.5:1)", () => {
    for (const t of TINTS) expect(contrastRatio(t.fill, t.text), t.name).toBeGreaterThanOrEqual(4.5);
  });

  it("computes the contrast of known pairs", () => {
    expect(contrastRatio("#000000", "#ffffff")).toBeCloseTo(21, 5);
    expect(contrastRatio("#777777", "#777777")).toBeCloseTo(1, 5);
  });

  it("has distinct fills and cycles past the end", () => {
    expect(new Set(TINTS.map((t) => t.fill)).size).toBe(TINTS.length);
    expect(tintAt(TINTS.length)).toBe(TINTS[0]);
    expect(tintAt(-1)).toBe(TINTS[TINTS.length - 1]);
  });
});
