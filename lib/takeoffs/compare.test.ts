import { describe, expect, it } from "vitest";
import { computeTakeoff } from "@/takeoff";
import { column, explainDifferences, type ComparedTakeoff } from "./compare";
import { testInputs, testPrices } from "@/takeoff/testing/job-fixtures";
import type { TakeoffInputs, TakeoffPrices } from "@/takeoff";

async function takeoff(name: string, inputs: TakeoffInputs, prices: TakeoffPrices): Promise<ComparedTakeoff> {
  return { id: name, name, projectName: "Larkspur", status: "draft", createdAt: new Date(), inputs, prices, result: await computeTakeoff(inputs, prices) };
}

describe("comparing takeoffs", () => {
  it("explains a difference by counts, sizes, alternate casing, prices and settings", async () => {
    const base = await takeoff("Base", testInputs(), testPrices());
    const inputs = testInputs({ casingItemId: "casing-35", settings: { kerf: 0.125, wastePercent: 5 } });
    inputs.counts.job.w1 = 25;
    inputs.openingTypes[1]!.width = 26;
    const prices = testPrices();
    prices.items[2]!.stock[2]!.price = 44;
    prices.markup = 0.2;
    const alt = await takeoff("Alt", inputs, prices);
    expect(explainDifferences(base, alt)).toEqual([
      "W1: 23 → 25 openings.",
      "W1 casing: 2 1/2\" × 11/16\" → 3 1/2\" × 3/4\".",
      "W4 width: 2'-0\" → 2'-2\".",
      "W4 casing: 2 1/2\" × 11/16\" → 3 1/2\" × 3/4\".",
      "Alternate casing: each window's own → Casing 3 1/2 × 3/4 poplar.",
      "Stool 5 1/4 poplar, 12'-0\": $40.00 → $44.00.",
      "Markup: 15% → 20%.",
      "Waste allowance: 10% → 5%.",
    ]);
  });

  it("a kerf change finer than the 1/16 is written exactly (3/32\" → 1/8\", not 1/8\" → 1/8\")", async () => {
    const a = await takeoff("A", testInputs({ settings: { kerf: 3 / 32, wastePercent: 10 } }), testPrices());
    const b = await takeoff("B", testInputs({ settings: { kerf: 0.125, wastePercent: 10 } }), testPrices());
    expect(explainDifferences(a, b)).toContain('Kerf: 3/32" → 1/8".');
  });

  it("nothing to explain between identical runs", async () => {
    const a = await takeoff("A", testInputs(), testPrices());
    const b = await takeoff("B", testInputs(), testPrices());
    expect(explainDifferences(a, b)).toEqual([]);
  });

  it("per-opening and per-unit cost come from the bid total", async () => {
    const a = await takeoff("A", testInputs(), testPrices());
    const c = column(a);
    expect(c.perOpening).toBeCloseTo(a.result.bid.total / 33, 9);
    expect(c.perUnit).toBeCloseTo(a.result.bid.total / 10, 9);
    expect(c.materials.casing!.boards).toBe(a.result.materials.find((m) => m.material === "casing")!.boardCount + a.result.materials.find((m) => m.material === "casing")!.allowanceBoards);
  });
});
