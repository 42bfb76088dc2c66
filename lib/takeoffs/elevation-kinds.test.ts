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

describe("each kind's drawing carries the cut list's dimensions", () => {
  const dim = (e: Elevation, key: string) => e.dimensions.find((d) => d.key === key)!;
  const piece = (opening: Opening, part: string, spec: TrimSpec = SA) => cutList(opening, spec).find((p) => p.part === part)!;

  it("half-round 48 in: the arch's inner radius R 24 1/4 in is labelled, the ring drawn as true arcs", () => {
    // Issue 12's published check: 48 in half-round, 1/4 in reveal, 3 1/2 in casing → inner edge radius 24 1/4 in.
    const o: Opening = { kind: "round-top", width: 48, springHeight: 40, setback: 0.75 };
    const e = draw(o);
    expect(piece(o, "casing-arch").radius).toBe(24.25);
    expect(e.radii.map((r) => r.text)).toEqual(['R 24 1/4"']);
    const arch = e.pieces.find((p) => p.part === "casing-arch")!;
    expect(arch.d).toMatch(/A27\.75 27\.75 0 0 1 .*A24\.25 24\.25 0 0 0/);
    // The ring's crown is the outer radius above the spring line; the legs stop at the spring line.
    expect(Math.min(...arch.points.map((p) => p.y))).toBeCloseTo(-27.75, 9);
    for (const leg of e.pieces.filter((p) => p.part === "casing-leg")) {
      expect(Math.min(...leg.points.map((p) => p.y))).toBeCloseTo(0, 9);
      expect(Math.max(...leg.points.map((p) => p.y)) - Math.min(...leg.points.map((p) => p.y))).toBeCloseTo(piece(o, "casing-leg").length, 9);
    }
    expect(dim(e, "stool").value).toBe(piece(o, "stool").length);
    expect(e.callouts.some((c) => c.text.startsWith("Casing arch, 7'-3 3/16\" outer edge"))).toBe(true);
  });

  it("segment head 48 in with 8 in rise: R = (c²/4 + s²)/(2s) = 40 in, inner edge R 40 1/4 in", () => {
    // Sagitta formula as cited in takeoff/kinds/segment-top.ts (Machinery's Handbook).
    const o: Opening = { kind: "segment-top", width: 48, springHeight: 40, rise: 8, setback: 0.75 };
    const e = draw(o);
    expect(e.radii[0]!.text).toBe(`R 40 1/4"`);
    expect(e.radii[0]!.value).toBe(piece(o, "casing-arch").radius);
    // The legs' long points are drawn at their cut length above the stool.
    const leg = e.pieces.find((p) => p.part === "casing-leg")!;
    expect(40 - Math.min(...leg.points.map((p) => p.y))).toBeCloseTo(piece(o, "casing-leg").length, 1);
  });

  it("door 30 × 81 in, 3/16 in reveal, 2 1/4 in casing: legs 83 7/16 in, head 34 7/8 in, one side drawn of two", () => {
    // Issue 12's published check (a 7' + 3' casing set).
    const spec: TrimSpec = { style: "stool-and-apron", casingWidth: 2.25, casingThickness: 0.6875, reveal: 0.1875 };
    const o: Opening = { kind: "door", width: 30, height: 81, sides: 2 };
    const e = draw(o, spec);
    expect(dim(e, "leg").value).toBe(83 + 7 / 16);
    expect(dim(e, "leg").to).toBe(81); // on the floor
    expect(dim(e, "casing-width").value).toBe(34 + 7 / 8);
    expect(e.pieces.filter((p) => p.part === "casing-leg")).toHaveLength(2);
    expect(e.callouts.map((c) => c.text)).toContain("Casing leg ×2 per side");
    expect(e.notes.join(" ")).toContain("× 2 sides");
    expect(e.marks.map((m) => m.text)).toEqual(["Finished floor"]);
  });

  it("mulled triple: one head of the outside dimension, a mullion casing at each mull, every unit's width", () => {
    const o: Opening = { kind: "mulled", widths: [24, 36, 24], height: 60, setback: 0.5, mullGap: 2 };
    const e = draw(o);
    expect(dim(e, "casing-width").value).toBe(piece(o, "casing-head").length);
    expect(dim(e, "casing-width").to - dim(e, "casing-width").from).toBeCloseTo(24 + 36 + 24 + 2 * 2 + 2 * 0.25 + 2 * 3.5, 9);
    const mulls = e.pieces.filter((p) => p.part === "mullion-casing");
    expect(mulls).toHaveLength(2);
    const m = piece(o, "mullion-casing");
    for (const p of mulls) {
      expect(Math.max(...p.points.map((q) => q.x)) - Math.min(...p.points.map((q) => q.x))).toBeCloseTo(m.width!, 9);
      expect(Math.max(...p.points.map((q) => q.y)) - Math.min(...p.points.map((q) => q.y))).toBeCloseTo(m.length, 9);
    }
    expect(e.dimensions.filter((d) => d.key.startsWith("unit-")).map((d) => d.value)).toEqual([24, 36, 24]);
    expect(dim(e, "stool").value).toBe(piece(o, "stool").length);
    expect(e.openings).toHaveLength(3);
  });

  it("45° bay, unfolded: each unit's head at its cut length, the corners marked 45° and the 22 1/2° saw setting noted", () => {
    // Fine Homebuilding (as cited in takeoff/kinds/bay.ts): saw setting = half the turn, 45° flankers → 22 1/2°.
    const o: Opening = { kind: "bay", widths: [24, 48, 24], turn: 45, height: 54, setback: 0.75, mullGap: 3 };
    const e = draw(o);
    const heads = cutList(o, SA).filter((p) => p.part === "casing-head");
    const drawnHeads = e.dimensions.filter((d) => d.key.startsWith("head-"));
    expect(drawnHeads).toHaveLength(3);
    for (const d of drawnHeads) {
      expect(heads.map((h) => h.length)).toContain(d.value);
      expect(Math.abs(d.to - d.from - d.value)).toBeLessThanOrEqual(1 / 32);
    }
    expect(e.marks.map((m) => m.text)).toEqual(["45° corner", "45° corner"]);
    expect(e.notes.join(" ")).toContain("22 1/2°");
    expect(e.pieces.filter((p) => p.part === "mullion-casing")).toHaveLength(4);
    expect(e.pieces.filter((p) => p.part === "stool")).toHaveLength(3);
  });
});
