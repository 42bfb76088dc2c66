import { describe, expect, it } from "vitest";
import type { Material } from "../types";
import { orderBoards } from "./board-orders";
import { materialCost, summarizeMaterials } from "./materials";
import type { BoardOrder, PriceItemSnapshot } from "./types";

/** One board order bought as planned: `boards` boards of one length at `price` each, no allowance. */
function order(itemId: string, material: Material, price: number, boards = 1, extra = 0): BoardOrder {
  const cost = Number((price * boards).toFixed(10));
  return {
    itemId,
    itemName: itemId,
    material,
    supplierCode: null,
    pieces: boards,
    linearInches: boards * 90,
    plan: {
      boards: [{ stockLength: 96, count: boards, cuts: [90], offcut: 5.875 }],
      boardCount: boards,
      purchasedLength: boards * 96,
      cost,
      lowerBound: { length: boards * 96, cost },
    },
    toBuy: [{ stockLength: 96, count: boards + extra, price }],
  };
}

describe("money of a job's orders", () => {
  it("sums material from board orders to the cent", () => {
    expect(materialCost([order("a", "casing", 10.1), order("b", "stool", 20.2)])).toBe(30.3);
  });

  // Derived: 10.001 and 0.074 are not exact in binary floating point; their float sum is 10.074999…,
  // which rounds down, while the exact sum 10.075 rounds half up. (A price snapshot may carry sub-cent
  // prices; only whole-cent totals are shown.)
  it("adds cents exactly and rounds once: a float sum that drifts below a half cent does not lose the cent", () => {
    const orders = [order("a", "casing", 10.001), order("b", "casing", 0.074)];
    const floatCents = (xs: number[]) => Math.round(xs.reduce((t, x) => t + x, 0) * 100) / 100;
    expect(0.1 + 0.2).not.toBe(0.3);
    expect(floatCents(orders.map((o) => o.plan.cost))).toBe(10.07);
    const [casing] = summarizeMaterials(orders);
    expect(casing!.cost).toBe(10.08);
    expect(casing!.lowerBound).toBe(10.08);
    expect(casing!.gapPercent).toBe(0);
    expect(materialCost(orders)).toBe(10.08);
  });

  it("the allowance is what is bought beyond the plan, in boards and money", () => {
    const orders = [order("a", "extension", 12.35, 10, 1), order("b", "extension", 14.6, 3, 1)];
    const [ext] = summarizeMaterials(orders);
    expect(ext).toMatchObject({ material: "extension", pieces: 13, boardCount: 13, allowanceBoards: 2, cost: 167.3, allowanceCost: 26.95 });
    expect(ext!.boards).toEqual([{ stockLength: 96, count: 13 }]);
    expect(materialCost(orders)).toBe(194.25);
  });

  it("works the waste allowance exactly: 2.2 % of 1,500 boards is 33 more, where floating point makes it 33.00000000000001", async () => {
    const casing: PriceItemSnapshot = {
      id: "c", name: "Casing", kind: "casing", faceWidth: 2.5, thickness: 0.6875, species: null, supplierCode: null,
      stock: [{ length: 96, price: 9.6 }],
    };
    expect((1500 * 2.2) / 100).toBeGreaterThan(33);
    const piece = { part: "casing-leg" as const, material: "casing" as const, quantity: 1, length: 95, ends: ["square", "square"] as ["square", "square"] };
    const [o] = await orderBoards([{ quantity: 1500, pieces: [piece], items: { casing } }], { kerf: 0.125, wastePercent: 2.2, placeholders: new Set() });
    expect(o!.plan.boardCount).toBe(1500);
    expect(o!.toBuy).toEqual([{ stockLength: 96, count: 1533, price: 9.6 }]);
  });
});
