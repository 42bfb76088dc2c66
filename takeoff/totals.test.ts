import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { cutList } from "./cut-list";
import { pieceDemand } from "./demand";
import { Q } from "./testing/rational";
import { takeoffTotals } from "./totals";
import type { Material, TakeoffLine, TrimSpec } from "./types";

const sa: TrimSpec = { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.6875 };
const pf: TrimSpec = { style: "picture-frame", casingWidth: 3.25, casingThickness: 0.75 };

describe("takeoffTotals", () => {
  it("adds every line's cut list times its quantity, per material, in a fixed order", () => {
    const lines: TakeoffLine[] = [
      { opening: { width: 30, height: 23.25, setback: 0.5 }, spec: sa, quantity: 3 },
      { opening: { width: 36, height: 60, setback: 0 }, spec: pf, quantity: 2 },
    ];
    const totals = takeoffTotals(lines);
    expect(totals.map((t) => t.material)).toEqual(["casing", "stool", "apron", "extension"]);
    // stool-and-apron casing: 2 legs 25 7/8 + head 35 1/4; picture-frame: 2 legs 66 3/4 + 2 × 42 3/4
    const casing = totals[0];
    const inches = 3 * (2 * 25.875 + 35.25) + 2 * (2 * 66.75 + 2 * 42.75);
    expect(casing).toEqual({ material: "casing", pieces: 3 * 3 + 2 * 4, linearInches: inches, linearFeet: inches / 12 });
    expect(totals[3]).toMatchObject({ material: "extension", pieces: 9, linearInches: 3 * (2 * 24 + 30) });
  });

  it("equals an independent BigInt sum over the cut lists for random jobs", () => {
    const line = fc.record({
      opening: fc.record({
        width: fc.integer({ min: 12 * 8, max: 72 * 8 }).map((n) => n / 8),
        height: fc.integer({ min: 12 * 8, max: 84 * 8 }).map((n) => n / 8),
        setback: fc.integer({ min: 0, max: 40 }).map((n) => n / 16),
      }),
      spec: fc.constantFrom(sa, pf),
      quantity: fc.integer({ min: 0, max: 50 }),
    });
    fc.assert(
      fc.property(fc.array(line, { maxLength: 12 }), (lines) => {
        const want = new Map<Material, { pieces: number; inches: Q }>();
        for (const l of lines) {
          for (const p of cutList(l.opening, l.spec)) {
            const t = want.get(p.material) ?? { pieces: 0, inches: new Q(0n) };
            t.pieces += p.quantity * l.quantity;
            t.inches = t.inches.add(Q.of(p.length).mul(p.quantity * l.quantity));
            want.set(p.material, t);
          }
        }
        const got = takeoffTotals(lines);
        for (const t of got) {
          const w = want.get(t.material);
          expect(t.pieces).toBe(w?.pieces);
          expect(Q.of(t.linearInches).eq(w?.inches ?? new Q(0n))).toBe(true);
          expect(t.linearFeet).toBe((w?.inches ?? new Q(0n)).div(12).toNumber());
        }
        expect(got.length).toBe([...want.values()].filter((w) => w.pieces > 0).length);
      }),
      { numRuns: 100 },
    );
  });

  it("merges equal pieces across lines for ordering", () => {
    const o = { width: 30, height: 40, setback: 0 };
    const demand = pieceDemand([
      { opening: o, spec: pf, quantity: 1 },
      { opening: { ...o, height: 35 }, spec: pf, quantity: 1 },
    ]);
    const heads = demand.filter((d) => d.material === "casing" && d.length === 30 + 0.25 + 6.5);
    expect(heads).toEqual([{ material: "casing", length: 36.75, quantity: 4, parts: ["casing-head", "casing-bottom"] }]);
  });

  it("names the bad line in errors", () => {
    const good = { opening: { width: 30, height: 40, setback: 0 }, spec: pf, quantity: 1 };
    expect(() => takeoffTotals([good, { ...good, quantity: -1 }])).toThrow(/lines\[1\]\.quantity/);
    expect(() => takeoffTotals([good, { ...good, quantity: 1.5 }])).toThrow(/lines\[1\]\.quantity/);
    expect(() => takeoffTotals([good, { ...good, opening: { ...good.opening, height: 0 } }])).toThrow(/lines\[1\]\.opening\.height/);
  });

  it("is empty for an empty job", () => {
    expect(takeoffTotals([])).toEqual([]);
  });
});

describe("takeoffTotals with opening kinds", () => {
  it("reports mullion casing as its own material, after the casing", () => {
    const totals = takeoffTotals([
      { opening: { kind: "mulled", widths: [30, 30, 30], height: 50, setback: 0, mullGap: 3.5 }, spec: sa, quantity: 4 },
      { opening: { kind: "door", width: 30, height: 81, sides: 2 }, spec: sa, quantity: 1 },
    ]);
    expect(totals.map((t) => t.material)).toEqual(["casing", "mullion", "stool", "apron"]);
    // Two mullion casings per triple, each H + r = 50 1/8.
    expect(totals[1]).toEqual({ material: "mullion", pieces: 8, linearInches: 8 * 50.125, linearFeet: (8 * 50.125) / 12 });
  });

  it("keeps curved pieces out of the straight stock demand and the straight totals", () => {
    const lines: TakeoffLine[] = [{ opening: { kind: "round-top", width: 36, springHeight: 30, setback: 1 }, spec: sa, quantity: 2 }];
    expect(pieceDemand(lines).some((d) => d.parts.includes("casing-arch") || d.parts.includes("extension-arch"))).toBe(false);
    const straightCasing = cutList(lines[0]!.opening, sa).filter((p) => p.material === "casing" && p.radius === undefined);
    const casing = takeoffTotals(lines).find((t) => t.material === "casing");
    expect(casing?.linearInches).toBe(2 * straightCasing.reduce((sum, p) => sum + p.quantity * p.length, 0));
    expect(casing?.curved?.[0]).toMatchObject({ part: "casing-arch", radius: 18.125, pieces: 2 });
  });
});
