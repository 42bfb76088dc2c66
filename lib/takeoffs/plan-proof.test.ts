import { describe, expect, it } from "vitest";
import { testPrices } from "@/takeoff/testing/job-fixtures";
import { fewestBoards, planProofText, proofSummary } from "./plan-proof";
import { crosscutOrder, rippedOrder } from "./testing/board-orders";

const items = testPrices().items; // casing-25 comes in 8', 10' and 12'
const withPlan = (plan: Partial<ReturnType<typeof crosscutOrder>["plan"]>) => crosscutOrder({ plan: { ...crosscutOrder().plan, ...plan } });

describe("a board order's proof state in words", () => {
  it("says nothing new for a takeoff saved before proofs", () => {
    expect(planProofText(crosscutOrder(), items)).toBeNull();
    expect(proofSummary([crosscutOrder()])).toBeNull();
  });

  it("optimal: proven, nothing cheaper", () => {
    expect(planProofText(withPlan({ proof: "optimal", cost: 251.3 }), items)).toEqual({
      proof: "optimal",
      label: "Optimal — proven",
      detail: "No cutting plan for these pieces costs less (before the waste allowance).",
    });
  });

  it("best found within the time limit: the board bound is the length bound over the longest stock, rounded up", () => {
    // 2260.5 in ÷ 144 in = 15.7 → no plan can buy fewer than 16 boards (derived: n boards hold ≤ n × 144 in).
    const text = planProofText(withPlan({ proof: "best-found", budgetSpent: true }), items);
    expect(text?.label).toBe("Best found within the time limit");
    expect(text?.detail).toBe(
      "Proven: no cutting plan can use fewer than 16 boards, and none can cost less than $251.30 (before the waste allowance), so this plan costs at most $12.70 more than the cheapest.",
    );
  });

  it("the board bound uses the longest length the item comes in, not the longest the plan happened to use", () => {
    // The plan uses only 8' boards; dividing by 96 would claim 24, which a 12' plan could beat.
    const order = withPlan({ proof: "best-found", boards: [{ stockLength: 96, count: 30, cuts: [41.25, 41.25], offcut: 13.25 }] });
    expect(fewestBoards(order, items)).toBe(16);
  });

  it("a length bound exactly on whole boards is not rounded up past them", () => {
    expect(fewestBoards(withPlan({ lowerBound: { length: 144 * 15, cost: 198 } }), items)).toBe(15);
  });

  it("best found for another reason (not the clock) does not blame the time limit", () => {
    expect(planProofText(withPlan({ proof: "best-found", budgetSpent: false }), items)?.label).toBe("Best found — not proven optimal");
  });

  it("money bounds round so the sentence stays true: the bound down, the excess up", () => {
    const text = planProofText(withPlan({ proof: "best-found", cost: 264.001, lowerBound: { length: 2260.5, cost: 251.309 } }), items);
    expect(text?.detail).toContain("cost less than $251.30");
    expect(text?.detail).toContain("at most $12.70 more");
  });

  it("a ripped order gives only the cost bound: its length bound counts strips, not boards", () => {
    const text = planProofText(rippedOrder(), items);
    expect(fewestBoards(rippedOrder(), items)).toBeNull();
    expect(text?.detail).toBe("Proven: no cutting plan can cost less than $338.50 (before the waste allowance), so this plan costs at most $15.50 more than the cheapest.");
  });

  it("an item missing from the snapshot (a placeholder) gives only the cost bound", () => {
    expect(planProofText(withPlan({ proof: "best-found" }), [])?.detail).toMatch(/^Proven: no cutting plan can cost less than \$251\.30/);
  });

  it("the summary counts best-found orders and whether the clock stopped any", () => {
    const orders = [crosscutOrder(), withPlan({ proof: "optimal" }), rippedOrder(), withPlan({ proof: "best-found", budgetSpent: false })];
    expect(proofSummary(orders)).toEqual({ bestFound: 2, total: 4, budgetSpent: true, over: 28.2 });
    expect(proofSummary([withPlan({ proof: "best-found", budgetSpent: false })])?.budgetSpent).toBe(false);
    expect(proofSummary([withPlan({ proof: "optimal" })])).toBeNull();
  });
});
