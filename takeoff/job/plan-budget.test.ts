import { describe, expect, it, vi } from "vitest";
import type { CutPiece, Demand, PlanOptions, StockItem } from "../types";
import type { PriceItemSnapshot } from "./types";

// planStock is watched, not replaced: every call still plans, and the options it was given are kept.
const calls: { pieces: number; opts: PlanOptions }[] = [];
let spend: (ms: number) => void = () => {};
vi.mock("../stock-plan/plan-stock", async (importOriginal) => {
  const real = await importOriginal<typeof import("../stock-plan/plan-stock")>();
  return {
    planStock: (demand: Demand[], stock: StockItem[], opts: PlanOptions) => {
      calls.push({ pieces: demand.reduce((t, d) => t + d.quantity, 0), opts });
      spend(opts.budgetMs ?? 0);
      return real.planStock(demand, stock, opts);
    },
  };
});

const { orderBoards } = await import("./board-orders");
const { DEFAULT_RUN_PLAN_SECONDS, PlanBudget, planningSummary, runPlanSeconds } = await import("./plan-budget");

/** A clock the test moves by hand. */
const clock = (start = 0) => {
  const c = { t: start, now: () => c.t };
  return c;
};

describe("the run's planning budget", () => {
  it("gives each call its pieces' share of what remains, and hands time left by a quick call to the rest", () => {
    const c = clock();
    const budget = new PlanBudget(2, c.now);
    budget.expect(100);
    expect(budget.share(25)).toBe(500); // 2000 ms × 25 / 100
    c.t = 100; // that call took 100 ms, not 500: the 1,900 left go to the remaining 75 pieces
    expect(budget.share(50)).toBe(Math.floor((1900 * 50) / 75));
    c.t = 1900;
    // A call not announced beforehand is counted in as it comes: 100 ms over 25 + 25 pieces.
    expect(budget.share(25, false)).toBe(50);
    expect(budget.share(25)).toBe(100);
  });

  it("past the deadline each call still gets 1 ms, so every planner is asked for a plan", () => {
    const c = clock();
    const budget = new PlanBudget(1, c.now);
    budget.expect(10);
    c.t = 5000;
    expect(budget.share(10)).toBe(1);
    expect(budget.share(3, false)).toBe(1);
  });

  it("planSeconds absent or no duration reads as the default of 2 s", () => {
    expect(DEFAULT_RUN_PLAN_SECONDS).toBe(2);
    expect([undefined, Number.NaN, -1, Infinity].map(runPlanSeconds)).toEqual([2, 2, 2, 2]);
    expect(runPlanSeconds(0.5)).toBe(0.5);
  });

  it("orderBoards passes each planStock call its share, weighted by pieces, and the run keeps to its budget", async () => {
    const piece = (material: CutPiece["material"], quantity: number, width?: number): CutPiece => ({
      part: material === "extension" ? "extension-side" : "casing-leg", material, quantity, length: 30, ...(width ? { width } : {}), ends: ["square", "square"],
    });
    const item = (id: string, kind: PriceItemSnapshot["kind"]) => ({
      id, name: id, kind, faceWidth: 3.5, thickness: 0.75, species: null, supplierCode: null, stock: [{ length: 96, price: 9.6 }],
    });
    calls.length = 0;
    // Every call is made to use all of its share: the clock moves on by it.
    const c = clock();
    spend = (ms) => (c.t += ms);
    const budget = new PlanBudget(4, c.now);
    const lines = [
      { quantity: 1, pieces: [piece("casing", 30)], items: { casing: item("casing", "casing") } },
      { quantity: 1, pieces: [piece("extension", 6, 1.5), piece("extension", 4, 0.75)], items: { extension: item("1x4", "extension") } },
    ];
    await orderBoards(lines, { kerf: 0.125, ripKerf: 0.0625, wastePercent: 0, placeholders: new Set(), budget });
    spend = () => {};
    // Weights 30 (casing) + 6 + 4 (the two strip widths) + 10 (the rip step: the order's pieces) = 50.
    // 4,000 ms × 30/50 = 2,400; then 1,600 × 6/20 = 480; 1,120 × 4/14 = 320; the rip step packs the
    // 2 + 2 strips at 96" (three 30" cuts a strip) with what is left, 800 × 10/10. Sum: the 4,000 ms.
    expect(calls.map((k) => [k.pieces, k.opts.budgetMs])).toEqual([
      [30, 2400],
      [6, 480],
      [4, 320],
      [4, 800],
    ]);
    // Crosscuts take the saw kerf, the rip step (strip widths across the board face) the rip kerf.
    expect(calls.map((k) => k.opts.kerf)).toEqual([0.125, 0.125, 0.125, 0.0625]);
  });

  it("sums up the orders' proof states", () => {
    const order = (proof?: "optimal" | "best-found", budgetSpent?: boolean) => ({ plan: { proof, budgetSpent } });
    expect(planningSummary([order("optimal", false), order("best-found", true), order("best-found", false)], 2)).toEqual({
      budgetSeconds: 2,
      allOptimal: false,
      bestFound: 2,
      budgetSpent: 1,
    });
    expect(planningSummary([order("optimal")], 1)).toEqual({ budgetSeconds: 1, allOptimal: true, bestFound: 0, budgetSpent: 0 });
  });
});
