import { describe, expect, it } from "vitest";
import { orderMaterials, summarizeOrders, type StockCatalog } from "./order";
import { checkPlan } from "./testing/plan-check";
import { takeoffTotals } from "./totals";
import type { TakeoffLine, TrimSpec } from "./types";

const sa: TrimSpec = { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.6875 };
const pf: TrimSpec = { style: "picture-frame", casingWidth: 2.5, casingThickness: 0.6875 };
const lines: TakeoffLine[] = [
  { opening: { width: 30, height: 40, setback: 1.1875 }, spec: sa, quantity: 4 },
  { opening: { width: 24, height: 36, setback: 4 }, spec: pf, quantity: 3 },
  { opening: { width: 48, height: 60, setback: 1.1875 }, spec: pf, quantity: 2 },
];
const feet = (ft: number[], perFoot: number, width?: number) =>
  ft.map((f) => ({ length: f * 12, price: Math.round(f * perFoot * 100) / 100, ...(width ? { width } : {}) }));
const catalog: StockCatalog = {
  casing: feet([7, 8, 10, 12, 14, 16], 1.39),
  stool: feet([8, 10, 12], 3.1),
  apron: feet([7, 8, 10], 1.39),
  // 1x4, 1x6, 1x8 dressed widths 3 1/2, 5 1/2, 7 1/4 (PS 20)
  extension: [...feet([8, 10, 12], 1.1, 3.5), ...feet([8, 10, 12], 1.65, 5.5), ...feet([8, 12], 2.3, 7.25)],
};

describe("orderMaterials", () => {
  // Common practice: rip a board to one width, then crosscut; the narrowest board wide enough wastes least.
  it("plans every material; extensions grouped by width, each from the narrowest board wide enough", async () => {
    const orders = await orderMaterials(lines, catalog, { kerf: 0.125 });
    expect(orders.map((o) => [o.material, o.width, o.stockWidth])).toEqual([
      ["casing", undefined, undefined],
      ["stool", undefined, undefined],
      ["apron", undefined, undefined],
      ["extension", 1.1875, 3.5],
      ["extension", 4, 5.5],
    ]);
    for (const o of orders) {
      const stock = o.stockWidth === undefined ? catalog[o.material] ?? [] : (catalog[o.material] ?? []).filter((s) => s.width === o.stockWidth);
      checkPlan(o.plan, o.demand, stock, 0.125);
    }
    const totals = takeoffTotals(lines);
    for (const s of summarizeOrders(orders)) {
      expect(s.pieces).toBe(totals.find((t) => t.material === s.material)?.pieces);
      expect(s.cost).toBeGreaterThanOrEqual(s.lowerBound);
      expect(s.gap).toBeCloseTo((s.cost - s.lowerBound) / s.lowerBound, 12);
      expect(s.boards.reduce((t, b) => t + b.count, 0)).toBe(s.boardCount);
    }
  });

  it("throws naming the width when no board is wide enough", async () => {
    const wide = [{ ...lines[0]!, opening: { width: 30, height: 40, setback: 8 } }];
    await expect(orderMaterials(wide, catalog, { kerf: 0.125 })).rejects.toThrow(/extension pieces 8" wide/);
  });

  it("throws naming the material when its stock is missing", async () => {
    const { stool: _omit, ...noStool } = catalog;
    await expect(orderMaterials(lines, noStool, { kerf: 0.125 })).rejects.toThrow(/catalog\.stool/);
  });

  it("names the material when a piece is longer than its stock", async () => {
    const short: StockCatalog = { ...catalog, casing: [{ length: 48, price: 5 }] };
    await expect(orderMaterials(lines, short, { kerf: 0.125 })).rejects.toThrow(/^casing: piece/);
  });
});
