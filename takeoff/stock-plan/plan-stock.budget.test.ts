import { describe, expect, it } from "vitest";
import { checkPlan } from "../testing/plan-check";
import type { Demand } from "../types";
import { DEFAULT_PLAN_BUDGET_MS, planStock } from "./plan-stock";

/** Deterministic Park–Miller stream, so the instances are fixed. */
function stream(seed: number): () => number {
  let state = seed;
  return () => (state = (state * 48271) % 2147483647) / 2147483647;
}

/** 400 distinct whole-inch-sixteenth lengths, 10–90 in, one each, on 144-in boards. */
function manySizes(): Demand[] {
  const next = stream(777);
  const seen = new Set<number>();
  const out: Demand[] = [];
  while (out.length < 400) {
    const length = Math.round((10 + next() * 80) * 16) / 16;
    if (seen.has(length)) continue;
    seen.add(length);
    out.push({ length, quantity: 1 });
  }
  return out;
}

describe("planStock's time budget and proof state", () => {
  it("a 1 ms budget on 400 distinct sizes still returns a complete, valid plan, marked best-found and budget spent", async () => {
    const demand = manySizes();
    const stock = [{ length: 144, price: 14 }];
    const plan = await planStock(demand, stock, { kerf: 0.125, budgetMs: 1 });
    checkPlan(plan, demand, stock, 0.125);
    expect(plan.budgetSpent).toBe(true);
    expect(plan.proof).toBe(plan.cost <= plan.lowerBound.cost ? "optimal" : "best-found");
    // Trivial bound (derived): Σ(length + kerf) × $14/144 in, rounded up to whole dollars.
    const needed = demand.reduce((t, d) => t + (d.length + 0.125) * d.quantity, 0);
    expect(plan.lowerBound.cost).toBeGreaterThanOrEqual(Math.ceil((needed * 14) / 144 - 1e-9));
  }, 60_000);

  it("a small instance is proven optimal within the default budget, without spending it", async () => {
    expect(DEFAULT_PLAN_BUDGET_MS).toBeGreaterThan(0);
    // 4 × 50 and 4 × 46 on 96-in boards, no kerf: a 50 and a 46 fill each board exactly, so 4 boards (derived).
    const demand = [{ length: 50, quantity: 4 }, { length: 46, quantity: 4 }];
    const stock = [{ length: 96, price: 10 }];
    const plan = await planStock(demand, stock, { kerf: 0 });
    checkPlan(plan, demand, stock, 0);
    expect(plan.boardCount).toBe(4);
    expect(plan.proof).toBe("optimal");
    expect(plan.budgetSpent).toBe(false);
  });

  it("rejects a budget that is not a positive number, naming the field", () => {
    expect(() => planStock([{ length: 10, quantity: 1 }], [{ length: 96, price: 1 }], { kerf: 0, budgetMs: 0 })).toThrow(/budgetMs/);
    expect(() => planStock([{ length: 10, quantity: 1 }], [{ length: 96, price: 1 }], { kerf: 0, budgetMs: Number.NaN })).toThrow(/budgetMs/);
  });
});
