import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { cutList } from "../cut-list";
import type { CutPiece } from "../types";
import { splitLongPieces } from "./scarf";

const head = (length: number): CutPiece => ({ part: "casing-head", material: "casing", quantity: 1, length, ends: ["miter", "miter"] });

describe("scarf joints for pieces longer than every stock length (45° overlapping bevels: common practice)", () => {
  it("splits a head over a mulled triple into equal parts, the joint shown in the cut list", () => {
    const pieces = cutList({ kind: "mulled", widths: [48, 48, 48], height: 60, setback: 0, mullGap: 4 }, { style: "stool-and-apron", casingWidth: 3.5, casingThickness: 0.75 });
    const long = pieces.find((p) => p.part === "casing-head")!;
    expect(long.length).toBe(144 + 8 + 0.25 + 7); // 159 1/4: over a 12 ft board
    const split = splitLongPieces([long], [96, 144], { overlap: 1 });
    expect(split).toEqual([
      { ...long, length: 80.125, ends: ["miter", "scarf"], scarf: { part: 1, of: 2, overlap: 1 } },
      { ...long, length: 80.125, ends: ["scarf", "miter"], scarf: { part: 2, of: 2, overlap: 1 } },
    ]);
  });

  it("takes as many parts as it must, with a kerf to spare on each board", () => {
    const split = splitLongPieces([head(300)], [144], { overlap: 1, kerf: 0.125 });
    expect(split.map((p) => [p.length, p.ends, p.scarf?.part])).toEqual([
      [100.6875, ["miter", "scarf"], 1],
      [100.6875, ["scarf", "scarf"], 2],
      [100.6875, ["scarf", "miter"], 3],
    ]);
  });

  it("passes pieces that fit, and curved pieces, unchanged", () => {
    const arch: CutPiece = { part: "casing-arch", material: "casing", quantity: 1, length: 200, radius: 60, sweep: 180, ends: ["square", "square"] };
    expect(splitLongPieces([head(144), arch], [144], { overlap: 2 })).toEqual([head(144), arch]);
  });

  it("property: the fewest parts that fit; together, less the overlaps, they cover the piece to within a sixteenth each", () => {
    const len = (lo: number, hi: number) => fc.integer({ min: lo * 16, max: hi * 16 }).map((n) => n / 16);
    fc.assert(
      fc.property(len(1, 600), fc.array(len(48, 192), { minLength: 1, maxLength: 4 }), len(0, 6), len(0, 0.25), (length, stock, overlap, kerf) => {
        const room = Math.max(...stock) - kerf;
        fc.pre(room > overlap);
        const parts = splitLongPieces([head(length)], stock, { overlap, kerf });
        const k = parts.length;
        for (const p of parts) expect(p.length + kerf).toBeLessThanOrEqual(Math.max(...stock));
        if (k === 1) {
          expect(parts[0]).toEqual(head(length));
          return;
        }
        const covered = parts.reduce((sum, p) => sum + p.length, 0) - (k - 1) * overlap;
        expect(covered).toBeGreaterThanOrEqual(length);
        expect(covered).toBeLessThan(length + k / 16);
        // One part fewer would not fit: (L + (k−2)·overlap)/(k−1) > room.
        expect((length + (k - 2) * overlap) / (k - 1)).toBeGreaterThan(room);
      }),
      { numRuns: 300 },
    );
  });

  it("refuses an overlap as long as the stock, naming the setting", () => {
    expect(() => splitLongPieces([head(200)], [96], { overlap: 96 })).toThrow(/^overlap: /);
    expect(() => splitLongPieces([head(200)], [], { overlap: 1 })).toThrow(/^stockLengths: /);
    expect(() => splitLongPieces([head(200)], [96], { overlap: -1 })).toThrow(/^overlap: /);
  });
});
