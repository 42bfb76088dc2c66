import { describe, expect, it } from "vitest";
import { finishPlan, planCost } from "./assemble";
import { fitDecreasing, type FitRule } from "./first-fit";
import { buildInstance } from "./instance";
import { planStock } from "./plan-stock";
import type { Demand, StockItem } from "../types";

/** Boards as sorted cut lists, for comparing with a hand-worked packing. */
function pack(demand: Demand[], stock: StockItem[], kerf: number, rule: FitRule) {
  const inst = buildInstance(demand, stock, { kerf });
  const d = inst.items.map((it) => it.demand);
  const plan = finishPlan(inst, fitDecreasing(inst, d, rule) ?? [], d);
  const boards: { stock: number; cuts: number[] }[] = [];
  for (const c of plan) {
    const cuts = inst.items.flatMap((it, i) => Array<number>(c.a[i] ?? 0).fill(it.lengthNum));
    for (let k = 0; k < c.count; k++) boards.push({ stock: inst.stocks[c.stock]?.lengthNum ?? 0, cuts });
  }
  boards.sort((x, y) => y.stock - x.stock || (y.cuts[0] ?? 0) - (x.cuts[0] ?? 0) || y.cuts.length - x.cuts.length);
  return { boards, cost: planCost(inst, plan).valueOf() };
}

describe("first-fit and best-fit decreasing (hand-worked, derived)", () => {
  it("counts one kerf per piece exactly: two 47 7/8 in pieces share a 96 in board at 1/8 kerf, two 48 in pieces do not", () => {
    // (47.875 + 0.125) × 2 = 96 fits exactly; (48 + 0.125) × 2 = 96.25 does not.
    for (const rule of ["first", "best"] as const) {
      expect(pack([{ length: 47.875, quantity: 2 }], [{ length: 96, price: 10 }], 0.125, rule).boards).toEqual([
        { stock: 96, cuts: [47.875, 47.875] },
      ]);
      expect(pack([{ length: 48, quantity: 2 }], [{ length: 96, price: 10 }], 0.125, rule).boards).toHaveLength(2);
    }
  });

  it("packs 4,4,3,3,2,2 into 9 in boards as 4+4 | 3+3+2 | 2: three boards, where 4+3+2 twice needs two", async () => {
    const demand = [{ length: 4, quantity: 2 }, { length: 3, quantity: 2 }, { length: 2, quantity: 2 }];
    const stock = [{ length: 9, price: 1 }];
    for (const rule of ["first", "best"] as const) {
      expect(pack(demand, stock, 0, rule).boards).toEqual([
        { stock: 9, cuts: [4, 4] },
        { stock: 9, cuts: [3, 3, 2] },
        { stock: 9, cuts: [2] },
      ]);
    }
    const plan = await planStock(demand, stock, { kerf: 0 });
    expect(plan.boardCount).toBe(2);
    expect(plan.lowerBound.cost).toBe(2);
  });

  it("opens the longest stock length, then moves each board to the cheapest length that holds its cuts", () => {
    // 60+60 fills 120 ($12); the 30 left over goes to a 96 ($10): $22.
    const p = pack([{ length: 60, quantity: 2 }, { length: 30, quantity: 1 }], [{ length: 96, price: 10 }, { length: 120, price: 12 }], 0, "first");
    expect(p.boards).toEqual([{ stock: 120, cuts: [60, 60] }, { stock: 96, cuts: [30] }]);
    expect(p.cost).toBe(22);
  });

  it("best fit puts a piece on the fullest board that holds it, first fit on the earliest", () => {
    // 10 in boards, 7,4,4,2: 7 opens board 1 (3 free), 4+4 fill board 2 (2 free). The 2 fits both:
    // first fit takes board 1 (7+2 | 4+4), best fit the fuller board 2 (7 | 4+4+2).
    const demand = [{ length: 7, quantity: 1 }, { length: 4, quantity: 2 }, { length: 2, quantity: 1 }];
    const stock = [{ length: 10, price: 1 }];
    expect(pack(demand, stock, 0, "first").boards).toEqual([{ stock: 10, cuts: [7, 2] }, { stock: 10, cuts: [4, 4] }]);
    expect(pack(demand, stock, 0, "best").boards).toEqual([{ stock: 10, cuts: [7] }, { stock: 10, cuts: [4, 4, 2] }]);
  });
});
