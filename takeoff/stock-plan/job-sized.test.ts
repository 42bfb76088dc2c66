import highsLoader from "highs";
import { describe, expect, it } from "vitest";
import { checkPlan } from "../testing/plan-check";
import { planStock } from "./plan-stock";

/** Deterministic job-sized demand: 40 lengths, thousands of pieces, six stock lengths at uneven prices. */
function job() {
  let state = 20240611;
  const next = () => (state = (state * 48271) % 2147483647) / 2147483647;
  const demand = Array.from({ length: 40 }, () => ({ length: Math.round((14 + next() * 76) * 16) / 16, quantity: 20 + Math.floor(next() * 180) }));
  const stock = [
    [7, 1.49], [8, 1.39], [10, 1.36], [12, 1.41], [14, 1.52], [16, 1.58],
  ].map(([ft, perFoot]) => ({ length: ft! * 12, price: Math.round(ft! * perFoot! * 100) / 100 }));
  return { demand, stock, kerf: 0.125 };
}

describe("job-sized demand", () => {
  it("comes within 0.5 % of its proven lower bound, and the bound is below the HiGHS LP over the plan's own patterns", async () => {
    const inst = job();
    const plan = await planStock(inst.demand, inst.stock, { kerf: inst.kerf });
    checkPlan(plan, inst.demand, inst.stock, inst.kerf);
    expect(plan.boardCount).toBeGreaterThan(1000);
    expect((plan.cost - plan.lowerBound.cost) / plan.lowerBound.cost).toBeLessThanOrEqual(0.005);

    // Any LP restricted to some patterns is ≥ the full LP ≥ a valid bound. Patterns: the plan's plus one
    // single-length pattern per piece on its cheapest board, solved by HiGHS (highs package).
    const lengths = inst.demand.map((d) => d.length).filter((l, i, all) => all.indexOf(l) === i);
    const patterns = plan.boards.map((b) => ({ price: inst.stock.find((s) => s.length === b.stockLength)!.price, cuts: b.cuts }));
    for (const l of lengths) {
      for (const s of inst.stock) {
        const fit = Math.floor(s.length / (l + inst.kerf));
        if (fit > 0) patterns.push({ price: s.price, cuts: Array<number>(fit).fill(l) });
      }
    }
    const need = new Map<number, number>();
    for (const d of inst.demand) need.set(d.length, (need.get(d.length) ?? 0) + d.quantity);
    const text = [
      "Minimize",
      ` cost: ${patterns.map((p, j) => `${p.price} x${j}`).join(" + ")}`,
      "Subject To",
      ...lengths.map((l, i) => ` d${i}: ${patterns.map((p, j) => `${p.cuts.filter((c) => c === l).length} x${j}`).join(" + ")} >= ${need.get(l)}`),
      "End",
    ].join("\n");
    const lp = (await highsLoader()).solve(text, { output_flag: false });
    expect(lp.Status).toBe("Optimal");
    expect(plan.lowerBound.cost).toBeLessThanOrEqual(lp.ObjectiveValue + 1e-6);
  });
});
