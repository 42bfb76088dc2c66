import { Q } from "./rational";
import type { Demand, StockItem, StockPlan } from "../types";

/**
 * Test helper: checks a plan against the contract with BigInt rationals —
 * every piece cut exactly once, no board overfilled, offcuts, counts, length
 * and cost consistent, and the cost never below its own lower bound.
 */
/** Equal as numbers: exact values returned as doubles may differ from their decimal reading in the last bit. */
const near = (a: number, b: Q) => Math.abs(a - b.toNumber()) <= 1e-9 * Math.max(1, Math.abs(b.toNumber()));

export function checkPlan(plan: StockPlan, demand: readonly Demand[], stock: readonly StockItem[], kerf: number): void {
  const want = new Map<string, number>();
  for (const d of demand) if (d.quantity > 0) want.set(Q.of(d.length).toString(), (want.get(Q.of(d.length).toString()) ?? 0) + d.quantity);
  const got = new Map<string, number>();
  let boards = 0;
  let length = new Q(0n);
  let cheapestCost = new Q(0n);
  for (const b of plan.boards) {
    if (!(b.count > 0) || !Number.isInteger(b.count)) throw new Error(`bad count ${b.count}`);
    const used = b.cuts.reduce((t, c) => t.add(Q.of(c).add(kerf)), new Q(0n));
    if (used.cmp(b.stockLength) > 0) throw new Error(`board of ${b.stockLength} overfilled: ${used.toNumber()}`);
    if (!near(b.offcut, Q.of(b.stockLength).sub(used))) throw new Error(`offcut ${b.offcut} wrong`);
    for (const c of b.cuts) got.set(Q.of(c).toString(), (got.get(Q.of(c).toString()) ?? 0) + b.count);
    boards += b.count;
    length = length.add(Q.of(b.stockLength).mul(b.count));
    const prices = stock.filter((s) => s.length === b.stockLength).map((s) => Q.of(s.price));
    if (prices.length === 0) throw new Error(`board length ${b.stockLength} not in stock`);
    cheapestCost = cheapestCost.add(prices.reduce((m, p) => (p.cmp(m) < 0 ? p : m)).mul(b.count));
  }
  if (JSON.stringify([...got].sort()) !== JSON.stringify([...want].sort())) {
    throw new Error(`cuts ${JSON.stringify([...got])} differ from demand ${JSON.stringify([...want])}`);
  }
  if (plan.boardCount !== boards) throw new Error("boardCount");
  if (!near(plan.purchasedLength, length)) throw new Error("purchasedLength");
  if (!near(plan.cost, cheapestCost)) throw new Error(`cost ${plan.cost} vs ${cheapestCost.toNumber()}`);
  if (plan.cost < plan.lowerBound.cost) throw new Error(`cost ${plan.cost} below its lower bound ${plan.lowerBound.cost}`);
  if (plan.purchasedLength < plan.lowerBound.length) throw new Error("length below its lower bound");
}
