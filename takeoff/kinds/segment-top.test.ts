import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { cutList } from "../cut-list";
import { exact } from "../exact";
import type { CutPiece, TrimSpec } from "../types";
import { segmentRadius } from "./segment-top";

const find = (pieces: CutPiece[], part: string) => pieces.find((p) => p.part === part);
const spec: TrimSpec = { style: "stool-and-apron", casingWidth: 3.5, casingThickness: 0.75, reveal: 0.25 };

describe("segment (eyebrow) heads", () => {
  it("radius from span and rise, R = (c²/4 + s²)/(2s): chord 8, rise 2 → 5 and chord 10, rise 3 → 5.67 (worked examples, calculator.7search.cc chord-to-radius)", () => {
    expect(segmentRadius(exact(8), exact(2)).valueOf()).toBe(5);
    expect(segmentRadius(exact(10), exact(3)).valueOf()).toBeCloseTo(5.67, 2);
    expect(segmentRadius(exact(48), exact(8)).valueOf()).toBe(40);
  });

  it("a 48 in span rising 8 in (R = 40) with 1/4 reveal and 3 1/2 casing: legs meet the ring in a miter (derived)", () => {
    const pieces = cutList({ kind: "segment-top", width: 48, springHeight: 40, rise: 8, setback: 1 }, spec);
    // Centre 32 below the spring line; the leg's outer edge (x = 27.75) meets the outer circle (43.75) at
    // y = √(43.75² − 27.75²) − 32 = 1.823, its inner edge (24.25) the inner circle (40.25) at √1032 − 32 = 0.1248.
    const yo = Math.sqrt(43.75 ** 2 - 27.75 ** 2) - 32;
    const yi = Math.sqrt(40.25 ** 2 - 24.25 ** 2) - 32;
    expect(yi).toBeCloseTo(0.1248, 4);
    const leg = find(pieces, "casing-leg");
    expect(leg).toMatchObject({ quantity: 2, length: Math.round((40 + yo) * 16) / 16, ends: ["square", "miter"] });
    expect(leg?.cutAngles?.[1]).toBeCloseTo((Math.atan((yo - yi) / 3.5) * 180) / Math.PI, 2);
    const sweep = 2 * Math.asin(27.75 / 43.75);
    expect(find(pieces, "casing-arch")).toMatchObject({ radius: 40.25, length: Math.round(43.75 * sweep * 16) / 16, ends: ["miter", "miter"] });
    expect(find(pieces, "casing-arch")?.sweep).toBeCloseTo((sweep * 180) / Math.PI, 2);
    // The jamb arc: R · 2·asin(24/40).
    expect(find(pieces, "extension-arch")).toMatchObject({ radius: 40, length: Math.round(40 * 2 * Math.asin(0.6) * 16) / 16, width: 1 });
    expect(find(pieces, "stool")?.length).toBe(48 + 0.5 + 7 + 3);
  });

  it("property (derived): a segment rising half its span is the half-round, piece for piece", () => {
    const len = (lo: number, hi: number) => fc.integer({ min: lo * 16, max: hi * 16 }).map((n) => n / 16);
    fc.assert(
      fc.property(len(12, 72), len(12, 72), len(0, 4), fc.constantFrom("stool-and-apron" as const, "picture-frame" as const), (width, springHeight, setback, style) => {
        const s = { ...spec, style };
        const segment = cutList({ kind: "segment-top", width, springHeight, rise: width / 2, setback }, s);
        expect(segment).toEqual(cutList({ kind: "round-top", width, springHeight, setback }, s));
      }),
      { numRuns: 100 },
    );
  });

  it("a flatter arch has a larger radius, a shorter arch and a steeper leg top", () => {
    const at = (rise: number) => cutList({ kind: "segment-top", width: 48, springHeight: 40, rise, setback: 0 }, spec);
    const [flat, steep] = [at(4), at(12)];
    expect(find(flat, "casing-arch")!.radius!).toBeGreaterThan(find(steep, "casing-arch")!.radius!);
    expect(find(flat, "casing-arch")!.length).toBeLessThan(find(steep, "casing-arch")!.length);
    expect(find(flat, "casing-leg")!.cutAngles![1]).toBeGreaterThan(find(steep, "casing-leg")!.cutAngles![1]);
  });
});
