import { describe, expect, it } from "vitest";
import { exact } from "../exact";
import { planStock } from "../stock-plan/plan-stock";
import type { CutPiece, Demand } from "../types";
import { orderBoards, type PricedLine } from "./board-orders";
import { PlanBudget } from "./plan-budget";
import { fullestRip, packStrips, stripsPerBoard } from "./rip";
import { checkRipped } from "./ripped-check";
import type { PriceItemSnapshot } from "./types";

const board = (faceWidth: number, stock: PriceItemSnapshot["stock"]): PriceItemSnapshot => ({
  id: `1x${faceWidth}`, name: `board ${faceWidth}`, kind: "extension", faceWidth, thickness: 0.75, species: null, supplierCode: null, stock,
});
const opts = { kerf: 0.125, wastePercent: 0, placeholders: new Set<string>() };
const piece = (length: number, quantity: number, width: number): CutPiece => ({
  part: "extension-side", material: "extension", quantity, length, width, ends: ["square", "square"],
});
const line = (item: PriceItemSnapshot, pieces: CutPiece[]): PricedLine => ({ quantity: 1, pieces, items: { extension: item } });
const demandOf = (pieces: CutPiece[]) => {
  const m = new Map<number, Demand[]>();
  for (const p of pieces) m.set(p.width!, [...(m.get(p.width!) ?? []), { length: p.length, quantity: p.quantity }]);
  return m;
};
const eight = [{ length: 96, price: 9.6 }];
/** A small seeded generator (mulberry32), so the "random" jobs are the same on every run. */
function prng(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe("strips of several widths ripped from one board", () => {
  it("derived: 1 1/2\" + 3/4\" + 3/4\" fit one 3 1/2\" board at 1/8\" rip kerf (1.5 + 0.75 + 0.75 + 2 × 0.125 = 3.25 ≤ 3.5)", async () => {
    const packed = await packStrips([{ width: 1.5, count: 1 }, { width: 0.75, count: 2 }], 3.5, 0.125, 1000);
    expect(packed.layouts).toEqual([{ count: 1, strips: [1.5, 0.75, 0.75], offcutWidth: 0.25 }]);
    expect(packed.proof).toBe("optimal");
  });

  it("derived: the fullest a 3 1/2\" board gets with 1 1/2\" and 3/4\" strips is four 3/4\" (Σ(w + k) = 4 × 0.875 = 3.5)", () => {
    // 1.625 + 2 × 0.875 = 3.375 and 2 × 1.625 = 3.25 fall short; 3 × 0.875 + 1.625 = 4.25 > W + k = 3.625.
    expect(fullestRip([1.5, 0.75], 3.5, 0.125).valueOf()).toBe(3.5);
    // One width: n(w + k), so a strip's share of the board is 1/n.
    expect(fullestRip([1], 3.5, 0.125).valueOf()).toBe(3 * 1.125);
  });

  it("a strip wider than the board (within the 1/64\" the book allows) takes a board of its own", async () => {
    const packed = await packStrips([{ width: 3.51, count: 2 }, { width: 0.75, count: 5 }], 3.5, 0.125, 1000);
    expect(packed.layouts).toEqual([
      { count: 2, strips: [3.51], offcutWidth: 0 },
      { count: 1, strips: [0.75, 0.75, 0.75, 0.75], offcutWidth: 0.125 },
      { count: 1, strips: [0.75], offcutWidth: 2.75 },
    ]);
  });

  it("mixing buys fewer boards than ripping each width apart: 1 board where separate widths need 2", async () => {
    // By hand: three 30" pieces fit one 96" strip (3 × 30.125 = 90.375 ≤ 96). 1 1/2" wide: 3 pieces → 1
    // strip; 3/4" wide: 6 pieces → 2 strips. Apart: ceil(1/2) + ceil(2/4) = 2 boards. Together the three
    // strips rip from one board (the case above): 1 board, $9.60.
    const item = board(3.5, eight);
    const pieces = [piece(30, 3, 1.5), piece(30, 6, 0.75)];
    const [mixed] = await orderBoards([line(item, pieces)], opts);
    expect(mixed!.widths).toEqual([1.5, 0.75]);
    expect(mixed!.width).toBeUndefined();
    expect(mixed!.stockWidth).toBe(3.5);
    expect(mixed!.rip!.layouts).toEqual([{ stockLength: 96, count: 1, strips: [1.5, 0.75, 0.75], offcutWidth: 0.25 }]);
    expect(mixed!.rip!.boards).toEqual([{ stockLength: 96, strips: 3, boards: 1 }]);
    expect(mixed!.plan.boardCount).toBe(1);
    expect(mixed!.plan.cost).toBe(9.6);
    expect(mixed!.toBuy).toEqual([{ stockLength: 96, count: 1, price: 9.6 }]);
    checkRipped(mixed!, demandOf(pieces), item.stock, 0.125, 0.125);
    // Every plan costs a whole number of $9.60 boards, so the bound rounds up to one board: proven optimal.
    expect(mixed!.plan.proof).toBe("optimal");

    const apart = await Promise.all(pieces.map((p) => orderBoards([line(item, [p])], opts)));
    expect(apart.map(([o]) => o!.plan.boardCount)).toEqual([1, 1]);
  });

  it("rips take the rip kerf, crosscuts the saw kerf", async () => {
    // 31 7/8" pieces: three fit a 96" strip at 1/8" crosscut kerf (3 × 32 = 96), so 12 pieces → 4 strips.
    // A 1/4" rip kerf gives three 3/4" strips a 3 1/2" board (floor(3.75 / 1)), so 2 boards; at the 1/8"
    // saw kerf it would be four strips a board, 1 board (derived).
    const item = board(3.5, eight);
    const [wide] = await orderBoards([line(item, [piece(31.875, 12, 0.75)])], { ...opts, ripKerf: 0.25 });
    expect(wide!.plan.boards).toEqual([{ stockLength: 96, count: 4, cuts: [31.875, 31.875, 31.875], offcut: 0, width: 0.75 }]);
    expect(wide!.rip).toMatchObject({ stripsPerBoard: 3, strips: 4, boards: [{ stockLength: 96, strips: 4, boards: 2 }] });
    expect(wide!.rip!.layouts![0]).toEqual({ stockLength: 96, count: 1, strips: [0.75, 0.75, 0.75], offcutWidth: 0.75 });
    const [same] = await orderBoards([line(item, [piece(31.875, 12, 0.75)])], opts);
    expect(same!.rip).toMatchObject({ stripsPerBoard: 4, boards: [{ stockLength: 96, strips: 4, boards: 1 }] });
  });

  it("one width gives the boards it gave before widths mixed: planStock's strips, ceil(strips / n) per length", async () => {
    const rand = prng(7);
    const stock = [
      { length: 96, price: 12 },
      { length: 120, price: 14.5 },
      { length: 144, price: 17 },
    ];
    for (const width of [0.5, 0.75, 1, 1.1875, 1.4375]) {
      const pieces = Array.from({ length: 3 }, () => piece(12 + Math.round(rand() * 800) / 8, 1 + Math.floor(rand() * 15), width));
      // Budgets far past what either needs, so a time budget cannot make the two plans differ.
      const [o] = await orderBoards([line(board(3.5, stock), pieces)], { ...opts, budget: new PlanBudget(3600) });
      const strips = await planStock(demandOf(pieces).get(width)!, stock, { kerf: 0.125, budgetMs: 3_600_000 });
      const n = stripsPerBoard(3.5, width, 0.125);
      expect(o!.plan.boards.map(({ width: _w, ...b }) => b)).toEqual(strips.boards);
      for (const b of o!.rip!.boards) {
        const used = strips.boards.filter((s) => s.stockLength === b.stockLength).reduce((t, s) => t + s.count, 0);
        expect(b).toEqual({ stockLength: b.stockLength, strips: used, boards: Math.ceil(used / n) });
      }
      expect(o!.rip!.offcutStrips).toBe(o!.plan.boardCount * n - o!.rip!.strips);
      expect(o!.plan.purchasedLength).toBe(o!.rip!.boards.reduce((t, b) => t + b.boards * n * b.stockLength, 0));
      // The bound is at least the strip bound / n, floored to the cent (what it was before).
      expect(exact(o!.plan.lowerBound.cost).mul(100).floor().lte(exact(o!.plan.lowerBound.cost).mul(100))).toBe(true);
      expect(o!.plan.lowerBound.cost).toBeGreaterThanOrEqual(Math.floor((strips.lowerBound.cost / n) * 100) / 100 - 1e-9);
      checkRipped(o!, demandOf(pieces), stock, 0.125, 0.125);
    }
  }, 30_000);

  it("a job of five widths from one 5 1/2\" board: a valid rip of every strip, never more boards than the widths apart", async () => {
    const rand = prng(11);
    const stock = [
      { length: 96, price: 18 },
      { length: 120, price: 22 },
      { length: 144, price: 26 },
    ];
    const item = board(5.5, stock);
    const widths = [2.25, 1.4375, 1.1875, 0.75, 0.5];
    const pieces = widths.flatMap((w) => Array.from({ length: 3 }, () => piece(14 + Math.round(rand() * 560) / 8, 2 + Math.floor(rand() * 30), w)));
    const [mixed] = await orderBoards([line(item, pieces)], opts);
    checkRipped(mixed!, demandOf(pieces), stock, 0.125, 0.125);
    expect(mixed!.pieces).toBe(pieces.reduce((t, p) => t + p.quantity, 0));
    let apart = 0;
    for (const w of widths) apart += (await orderBoards([line(item, pieces.filter((p) => p.width === w))], opts))[0]!.plan.boardCount;
    expect(mixed!.plan.boardCount).toBeLessThanOrEqual(apart);
    expect(mixed!.plan.boardCount).toBeLessThan(apart);
  }, 30_000);
});
