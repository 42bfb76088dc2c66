import { describe, expect, it } from "vitest";
import { checkPlan } from "../testing/plan-check";
import { referenceOptimum, type RefInstance } from "../testing/reference-cutting-stock";
import type { Demand, StockItem } from "../types";
import { planStock } from "./plan-stock";

async function plan(inst: RefInstance) {
  const p = await planStock(inst.demand, inst.stock, { kerf: inst.kerf });
  checkPlan(p, inst.demand, inst.stock, inst.kerf);
  return p;
}

describe("published textbook cutting-stock instances, checked against HiGHS over every pattern (highs package)", () => {
  // Chvátal, "Linear Programming" (1983), ch. 13: 100-in raws; 97×45, 610×36, 395×31, 211×14
  // (data recalled from memory; LP optimum 452.25, integer optimum 453 also recalled, and re-derived here by HiGHS).
  const chvatal: RefInstance = {
    demand: [{ length: 45, quantity: 97 }, { length: 36, quantity: 610 }, { length: 31, quantity: 395 }, { length: 14, quantity: 211 }],
    stock: [{ length: 100, price: 1 }],
    kerf: 0,
  };

  it("Chvátal's paper-roll instance: 453 raws, the proven optimum, LP bound 452.25 rounded up", async () => {
    const p = await plan(chvatal);
    expect(await referenceOptimum(chvatal, true)).toBeCloseTo(452.25, 9);
    expect(await referenceOptimum(chvatal)).toBe(453);
    expect(p.boardCount).toBe(453);
    expect(p.cost).toBe(453);
    expect(p.lowerBound.cost).toBe(453);
    expect(p.lowerBound.length).toBe(45300);
  });

  // Fourer, Gay & Kernighan, "AMPL" (cutting-stock example): 110-in rolls; 48×20, 35×45, 24×50, 10×55, 8×75
  // (data recalled from memory; LP optimum 46.25 recalled, re-derived here by HiGHS).
  const ampl: RefInstance = {
    demand: [
      { length: 20, quantity: 48 },
      { length: 45, quantity: 35 },
      { length: 50, quantity: 24 },
      { length: 55, quantity: 10 },
      { length: 75, quantity: 8 },
    ],
    stock: [{ length: 110, price: 1 }],
    kerf: 0,
  };

  it("AMPL roll-cutting instance: optimum equals the HiGHS MIP over every pattern", async () => {
    const p = await plan(ampl);
    const lp = await referenceOptimum(ampl, true);
    expect(lp).toBeCloseTo(46.25, 9);
    const optimum = await referenceOptimum(ampl);
    expect(p.cost).toBe(optimum);
    expect(p.lowerBound.cost).toBe(optimum);
  });
});

describe("planStock on small instances reaches the HiGHS MIP optimum (highs package, all patterns)", () => {
  const cases: [string, RefInstance][] = [
    [
      "two lengths, non-proportional prices, 1/8 kerf",
      {
        demand: [{ length: 25.875, quantity: 8 }, { length: 35.25, quantity: 4 }, { length: 41.5, quantity: 3 }],
        stock: [{ length: 96, price: 11.49 }, { length: 120, price: 13.99 }],
        kerf: 0.125,
      },
    ],
    [
      "three stock lengths where the longest is cheapest per foot",
      {
        demand: [{ length: 30, quantity: 5 }, { length: 47.0625, quantity: 5 }, { length: 13.5, quantity: 3 }, { length: 70, quantity: 2 }],
        stock: [{ length: 84, price: 9.1 }, { length: 96, price: 10.2 }, { length: 192, price: 19.5 }],
        kerf: 0.125,
      },
    ],
    [
      "pieces that just fit with the kerf",
      {
        demand: [{ length: 47.875, quantity: 4 }, { length: 31.875, quantity: 3 }],
        stock: [{ length: 96, price: 10 }, { length: 64, price: 7 }],
        kerf: 0.125,
      },
    ],
  ];
  it.each(cases)("%s", async (_name, inst) => {
    const p = await plan(inst);
    const optimum = await referenceOptimum(inst);
    expect(p.cost).toBeCloseTo(optimum, 9);
    expect(p.lowerBound.cost).toBeCloseTo(optimum, 9);
  });
});

// Rules of the board-order contract (kerf per cut is common practice: every cut, the factory end included, loses a kerf).
describe("planStock rules", () => {
  it("breaks cost ties by purchased length", async () => {
    const p = await plan({ demand: [{ length: 90, quantity: 1 }], stock: [{ length: 120, price: 10 }, { length: 96, price: 10 }], kerf: 0.125 });
    expect(p.boards).toEqual([{ stockLength: 96, count: 1, cuts: [90], offcut: 5.875 }]);
  });

  it("puts cost before length", async () => {
    const p = await plan({ demand: [{ length: 90, quantity: 1 }], stock: [{ length: 120, price: 9 }, { length: 96, price: 10 }], kerf: 0.125 });
    expect(p.boards[0]?.stockLength).toBe(120);
  });

  it("charges one kerf per piece, so a piece as long as the board needs kerf 0", async () => {
    const exactFit = await plan({ demand: [{ length: 96, quantity: 2 }], stock: [{ length: 96, price: 10 }], kerf: 0 });
    expect(exactFit.boardCount).toBe(2);
    expect(() => planStock([{ length: 96, quantity: 1 }], [{ length: 96, price: 10 }], { kerf: 0.125 })).toThrow(/96/);
  });

  it("throws, naming the piece, when a piece is longer than every stock length", () => {
    expect(() => planStock([{ length: 30, quantity: 2 }, { length: 200.5, quantity: 1 }], [{ length: 192, price: 20 }], { kerf: 0.125 })).toThrow(
      /200 1\/2"|200\.5/,
    );
  });

  it.each<[string, Demand[], StockItem[], number, RegExp]>([
    ["no stock", [{ length: 10, quantity: 1 }], [], 0, /stock/],
    ["negative kerf", [{ length: 10, quantity: 1 }], [{ length: 96, price: 1 }], -0.1, /kerf/],
    ["zero-length piece", [{ length: 0, quantity: 1 }], [{ length: 96, price: 1 }], 0, /demand\[0\]\.length/],
    ["fractional quantity", [{ length: 10, quantity: 0.5 }], [{ length: 96, price: 1 }], 0, /demand\[0\]\.quantity/],
    ["negative price", [{ length: 10, quantity: 1 }], [{ length: 96, price: -1 }], 0, /stock\[0\]\.price/],
    ["NaN stock length", [{ length: 10, quantity: 1 }], [{ length: Number.NaN, price: 1 }], 0, /stock\[0\]\.length/],
  ])("rejects %s by name", (_label, demand, stock, kerf, message) => {
    expect(() => planStock(demand, stock, { kerf })).toThrow(message);
  });

  it("plans nothing for no demand", async () => {
    const p = await planStock([{ length: 10, quantity: 0 }], [{ length: 96, price: 5 }], { kerf: 0.125 });
    expect(p).toEqual({ boards: [], boardCount: 0, purchasedLength: 0, cost: 0, lowerBound: { length: 0, cost: 0 }, proof: "optimal", budgetSpent: false });
  });

  it("merges equal lengths given twice", async () => {
    const p = await plan({ demand: [{ length: 40, quantity: 1 }, { length: 40, quantity: 1 }], stock: [{ length: 96, price: 5 }], kerf: 0.125 });
    expect(p.boards).toEqual([{ stockLength: 96, count: 1, cuts: [40, 40], offcut: 15.75 }]);
  });

  it("works exactly with decimal lengths and kerf (tenths of an inch)", async () => {
    const inst = { demand: [{ length: 10.1, quantity: 7 }, { length: 33.3, quantity: 3 }], stock: [{ length: 48.2, price: 3.3 }], kerf: 0.1 };
    const p = await plan(inst);
    expect(p.cost).toBeCloseTo(await referenceOptimum(inst), 9);
  });

  it("stays valid on lengths with long decimal expansions (metric conversions), via the coarse grid", async () => {
    const mm = (x: number) => x / 25.4;
    const inst = {
      demand: [{ length: mm(700), quantity: 9 }, { length: mm(450), quantity: 7 }, { length: mm(1333), quantity: 2 }],
      stock: [{ length: mm(2400), price: 8.5 }, { length: mm(3000), price: 10 }],
      kerf: mm(3),
    };
    const p = await plan(inst);
    expect(p.lowerBound.cost).toBeLessThanOrEqual(await referenceOptimum(inst));
  });
});
