import { describe, expect, it } from "vitest";
import { checkPlan } from "../testing/plan-check";
import { planStock } from "./plan-stock";

/** 200 distinct 1/16-in lengths, 10–90 in, one to three of each; three stock lengths (deterministic). */
function manySizes() {
  let state = 12345;
  const next = () => (state = (state * 48271) % 2147483647) / 2147483647;
  const seen = new Set<number>();
  const demand: { length: number; quantity: number }[] = [];
  while (demand.length < 200) {
    const length = Math.round((10 + next() * 80) * 16) / 16;
    if (seen.has(length)) continue;
    seen.add(length);
    demand.push({ length, quantity: 1 + Math.floor(next() * 3) });
  }
  return { demand, stock: [{ length: 96, price: 10 }, { length: 144, price: 14 }, { length: 192, price: 19 }], kerf: 0.125 };
}

describe("hundreds of distinct sizes", () => {
  it("reports a cost bound no lower than the trivial one: length needed × cheapest price per inch, rounded up to whole dollars (derived)", async () => {
    const inst = manySizes();
    const plan = await planStock(inst.demand, inst.stock, { kerf: inst.kerf });
    checkPlan(plan, inst.demand, inst.stock, inst.kerf);
    // In sixteenths, exactly: Σ (length + kerf) × quantity; the cheapest rate is $14 / 144 in.
    const needed = inst.demand.reduce((t, d) => t + (d.length + inst.kerf) * 16 * d.quantity, 0);
    const trivial = Math.ceil((needed * 14) / (144 * 16));
    expect(plan.lowerBound.cost).toBeGreaterThanOrEqual(trivial);
    expect(plan.lowerBound.cost).toBeLessThanOrEqual(plan.cost);
    expect(plan.lowerBound.length).toBeGreaterThanOrEqual(Math.ceil(needed / (48 * 16)) * 48);
  }, 60_000);
});
