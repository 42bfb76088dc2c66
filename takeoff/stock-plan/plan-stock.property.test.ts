import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkPlan } from "../testing/plan-check";
import { referenceOptimum, type RefInstance } from "../testing/reference-cutting-stock";
import { planStock } from "./plan-stock";

const sixteenths = (lo: number, hi: number) => fc.integer({ min: lo * 16, max: hi * 16 }).map((n) => n / 16);

/** Small random jobs: up to 4 piece lengths and 3 stock lengths, prices in cents. */
const small: fc.Arbitrary<RefInstance> = fc.record({
  demand: fc.uniqueArray(fc.record({ length: sixteenths(6, 60), quantity: fc.integer({ min: 1, max: 7 }) }), {
    minLength: 1,
    maxLength: 4,
    selector: (d) => d.length,
  }),
  stock: fc.uniqueArray(fc.record({ length: fc.constantFrom(64, 72, 84, 96, 120), price: fc.integer({ min: 300, max: 2500 }).map((c) => c / 100) }), {
    minLength: 1,
    maxLength: 3,
    selector: (s) => s.length,
  }),
  kerf: fc.constantFrom(0, 0.0625, 0.125),
});

/** Bigger random jobs for the structural properties only. */
const medium: fc.Arbitrary<RefInstance> = fc.record({
  demand: fc.array(fc.record({ length: sixteenths(1, 90), quantity: fc.integer({ min: 0, max: 300 }) }), { minLength: 1, maxLength: 25 }),
  stock: fc.array(fc.record({ length: fc.integer({ min: 91, max: 192 }), price: fc.integer({ min: 0, max: 4000 }).map((c) => c / 100) }), {
    minLength: 1,
    maxLength: 4,
  }),
  kerf: fc.constantFrom(0, 0.125, 0.1),
});

describe("planStock properties (fast-check)", () => {
  it("every plan cuts every piece, never overfills a board, and never costs less than its own lower bound", async () => {
    await fc.assert(
      fc.asyncProperty(medium, async (inst) => {
        const plan = await planStock(inst.demand, inst.stock, { kerf: inst.kerf });
        checkPlan(plan, inst.demand, inst.stock, inst.kerf);
      }),
      { numRuns: 40 },
    );
  }, 30_000);

  it("small instances reach the proven optimum of the HiGHS MIP over every pattern; the bounds are valid and tight (highs package)", async () => {
    await fc.assert(
      fc.asyncProperty(small, async (inst) => {
        fc.pre(inst.demand.every((d) => inst.stock.some((s) => d.length + inst.kerf <= s.length)));
        const plan = await planStock(inst.demand, inst.stock, { kerf: inst.kerf });
        checkPlan(plan, inst.demand, inst.stock, inst.kerf);
        const optimum = await referenceOptimum(inst);
        const lp = await referenceOptimum(inst, true);
        expect(plan.cost).toBeCloseTo(optimum, 9);
        expect(plan.lowerBound.cost).toBeLessThanOrEqual(optimum + 1e-9);
        expect(plan.lowerBound.cost).toBeGreaterThanOrEqual(lp - 1e-6);
        const shortest = await referenceOptimum({ ...inst, stock: inst.stock.map((s) => ({ length: s.length, price: s.length })) });
        expect(plan.lowerBound.length).toBeLessThanOrEqual(shortest + 1e-9);
      }),
      { numRuns: 30 },
    );
  });
});
