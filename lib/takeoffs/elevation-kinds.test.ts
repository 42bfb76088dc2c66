/** Elevations of every opening kind, drawn from the engine's own cut lists (cutList from "@/takeoff"). */
import { describe, expect, it } from "vitest";
import { cutList, type Opening, type TrimSpec } from "@/takeoff";
import { elevation, type Elevation } from "./elevation";

const SA: TrimSpec = { style: "stool-and-apron", casingWidth: 3.5, casingThickness: 0.75, reveal: 0.25 };
const PF: TrimSpec = { ...SA, style: "picture-frame" };
const input = (opening: Opening, spec: TrimSpec) => ({ opening, spec, cutList: cutList(opening, spec), items: {} });
const draw = (opening: Opening, spec: TrimSpec = SA) => elevation(input(opening, spec));

const KINDS: [string, Opening][] = [
  ["mulled twin", { kind: "mulled", widths: [30, 30], height: 48, setback: 0.75, mullGap: 1.5 }],
  ["mulled triple", { kind: "mulled", widths: [24, 36, 24], height: 60, setback: 0.5, mullGap: 2 }],
  ["door", { kind: "door", width: 30, height: 81, sides: 2 }],
  ["round-top", { kind: "round-top", width: 48, springHeight: 40, setback: 0.75 }],
  ["segment-top", { kind: "segment-top", width: 48, springHeight: 40, rise: 8, setback: 0.75 }],
  ["flat segment-top", { kind: "segment-top", width: 60, springHeight: 36, rise: 1, setback: 0 }],
  ["45° bay", { kind: "bay", widths: [24, 48, 24], turn: 45, height: 54, setback: 0.75, mullGap: 3 }],
  ["bow, one-piece seat", { kind: "bay", widths: [20, 20, 20, 20, 20], turn: 10, height: 50, setback: 0.5, mullGap: 2, seat: "one-piece" }],
];

/** Every number the drawing carries, so one NaN or infinity anywhere fails the test. */
function numbers(e: Elevation): number[] {
  const pts = [...e.pieces.flatMap((p) => p.points), ...e.openings.flatMap((o) => o.points), ...e.radii.flatMap((r) => [r.from, r.to]), ...e.marks.flatMap((m) => [...m.line, m.at])];
  return [
    ...pts.flatMap((p) => [p.x, p.y]),
    ...e.dimensions.flatMap((d) => [d.from, d.to, d.at, d.base, d.value]),
    ...e.callouts.flatMap((c) => [c.y, c.anchor.x, c.anchor.y]),
    e.calloutX,
    e.unit,
    ...Object.values(e.bounds),
  ];
}

const inBounds = (e: Elevation, p: { x: number; y: number }) =>
  p.x >= e.bounds.minX - 1e-9 && p.x <= e.bounds.maxX + 1e-9 && p.y >= e.bounds.minY - 1e-9 && p.y <= e.bounds.maxY + 1e-9;

describe("elevation of every opening kind", () => {
  for (const [name, opening] of KINDS) {
    for (const spec of [SA, PF]) {
      it(`${name}, ${spec.style}: finite, every piece and its dimension inside the view box`, () => {
        const e = draw(opening, spec);
        expect(numbers(e).every(Number.isFinite)).toBe(true);
        expect(e.unit).toBeGreaterThan(0);
        for (const p of e.pieces) for (const q of p.points) expect(inBounds(e, q)).toBe(true);
        for (const r of e.radii) expect(inBounds(e, r.from) && inBounds(e, r.to)).toBe(true);
        for (const d of e.dimensions) {
          const ends = d.axis === "x" ? [{ x: d.from, y: d.at }, { x: d.to, y: d.at }] : [{ x: d.at, y: d.from }, { x: d.at, y: d.to }];
          for (const q of ends) expect(inBounds(e, q)).toBe(true);
        }
        // Every part of the cut list is drawn (the seat board stands in for the stool it replaces).
        const drawn = new Set(e.pieces.map((p) => p.part));
        for (const p of cutList(opening, spec)) if (p.part !== "apron-return") expect(drawn, p.part).toContain(p.part);
      });
    }
  }

  it("never throws on a kind it does not know", () => {
    const odd = { kind: "porthole", width: 20 } as unknown as Opening;
    const e = elevation({ opening: odd, spec: SA, cutList: [], items: {} });
    expect(numbers(e).every(Number.isFinite)).toBe(true);
    expect(e.pieces).toHaveLength(0);
  });
});
