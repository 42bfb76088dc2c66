import { describe, expect, it } from "vitest";
import { cutList } from "../cut-list";
import { checkPlan } from "../testing/plan-check";
import { takeoffTotals } from "../totals";
import type { Demand, TrimSpec } from "../types";
import { computeTakeoff } from "./compute";
import { PriceGaps } from "./errors";
import type { PriceItemSnapshot, TakeoffInputs, TakeoffPrices } from "./types";

const sa: TrimSpec = { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.6875 };
const pf: TrimSpec = { style: "picture-frame", casingWidth: 2.5, casingThickness: 0.6875 };
const types = [
  { id: "a", mark: "A", width: 30, height: 40, setback: 1.1875, trimSpec: sa, quantity: 4 },
  { id: "b", mark: "B", width: 24, height: 36, setback: 4, trimSpec: pf, quantity: 3 },
  { id: "c", mark: "C", width: 48, height: 60, setback: 1.1875, trimSpec: pf, quantity: 2 },
];
const inputs = (setbackA = 1.1875): TakeoffInputs => ({
  settings: { kerf: 0.125, wastePercent: 10 },
  casingItemId: null,
  unitTypes: [],
  openingTypes: types.map(({ quantity: _q, ...t }) => (t.id === "a" ? { ...t, setback: setbackA } : t)),
  counts: { perUnit: {}, commonAreas: {}, job: Object.fromEntries(types.map((t) => [t.id, t.quantity])) },
});

const feet = (ft: number[], perFoot: number) => ft.map((f) => ({ length: f * 12, price: Math.round(f * perFoot * 100) / 100 }));
const item = (id: string, kind: PriceItemSnapshot["kind"], faceWidth: number, thickness: number, stock: PriceItemSnapshot["stock"]): PriceItemSnapshot => ({
  id, name: id, kind, faceWidth, thickness, species: null, supplierCode: null, stock,
});
const prices = (items?: PriceItemSnapshot[]): TakeoffPrices => ({
  priceBook: { id: "pb", name: "Book" },
  items: items ?? [
    item("casing", "casing", 2.5, 0.6875, feet([7, 8, 10, 12, 14, 16], 1.39)),
    item("stool", "stool", 5.5, 1, feet([8, 10, 12], 3.1)),
    item("apron", "apron", 2.5, 0.6875, feet([7, 8, 10], 1.39)),
    // 1x4, 1x6, 1x8 dressed widths 3 1/2, 5 1/2, 7 1/4 (PS 20)
    item("1x4", "extension", 3.5, 0.75, feet([8, 10, 12], 1.1)),
    item("1x6", "extension", 5.5, 0.75, feet([8, 10, 12], 1.65)),
    item("1x8", "extension", 7.25, 0.75, feet([8, 12], 2.3)),
  ],
  labour: { minutesPerOpening: { "stool-and-apron": 60, "picture-frame": 40 }, minutesPerExtensionFoot: 3, hourlyRate: 60 },
  markup: 0.15,
  taxRate: 0.08,
  taxLabour: false,
});

describe("board orders of a job", () => {
  // Common practice: rip a board to one width, then crosscut; the narrowest board wide enough wastes least.
  it("plans every material; extensions grouped by width, each from the narrowest board wide enough", async () => {
    const book = prices();
    const result = await computeTakeoff(inputs(), book);
    expect(result.orders.map((o) => [o.material, o.width, o.stockWidth]).sort()).toEqual([
      ["apron", undefined, undefined],
      ["casing", undefined, undefined],
      ["extension", 1.1875, 3.5],
      ["extension", 4, 5.5],
      ["stool", undefined, undefined],
    ]);
    // Every plan is checked against demand worked out here from the cut lists, not taken from the order.
    for (const o of result.orders) {
      const demand = new Map<number, number>();
      for (const t of types) {
        for (const p of cutList(t, t.trimSpec)) {
          if (p.material !== o.material || (o.width !== undefined && p.width !== o.width)) continue;
          demand.set(p.length, (demand.get(p.length) ?? 0) + p.quantity * t.quantity);
        }
      }
      const wanted: Demand[] = [...demand].map(([length, quantity]) => ({ length, quantity }));
      const stock = book.items.find((i) => i.id === o.itemId)!.stock;
      if (!o.rip) {
        checkPlan(o.plan, wanted, stock, 0.125);
        continue;
      }
      // A ripped plan is checked along its strips (each a stock piece at the board's length and price),
      // then its boards are ceil(strips / n) per length.
      const strips = o.rip.boards;
      const price = (length: number) => stock.find((s) => s.length === length)!.price;
      const stripView = {
        ...o.plan,
        boardCount: o.rip.strips,
        purchasedLength: strips.reduce((t, b) => t + b.strips * b.stockLength, 0),
        cost: strips.reduce((t, b) => t + b.strips * price(b.stockLength), 0),
        lowerBound: { length: o.plan.lowerBound.length, cost: 0 },
      };
      checkPlan(stripView, wanted, stock, 0.125);
      for (const b of strips) expect(b.boards).toBe(Math.ceil(b.strips / o.rip.stripsPerBoard));
      expect(o.plan.boardCount).toBe(strips.reduce((t, b) => t + b.boards, 0));
    }
    const totals = takeoffTotals(types.map((t) => ({ opening: t, spec: t.trimSpec, quantity: t.quantity })));
    for (const s of result.materials) {
      expect(s.pieces).toBe(totals.find((t) => t.material === s.material)?.pieces);
      expect(s.cost).toBeGreaterThanOrEqual(s.lowerBound);
      expect(s.gapPercent).toBeCloseTo(((s.cost - s.lowerBound) / s.lowerBound) * 100, 10);
      expect(s.boards!.reduce((t, b) => t + b.count, 0)).toBe(s.boardCount);
    }
  });

  it("refuses naming the width when no board is wide enough", async () => {
    const run = computeTakeoff(inputs(8), prices());
    await expect(run).rejects.toThrow(PriceGaps);
    await expect(computeTakeoff(inputs(8), prices())).rejects.toThrow(/A needs jamb extension 8" wide/);
  });

  it("refuses naming the material when the book has none of it", async () => {
    const noStool = prices().items.filter((i) => i.kind !== "stool");
    await expect(computeTakeoff(inputs(), prices(noStool))).rejects.toThrow(/A needs stool at least 2 3\/16" wide/);
  });

  it("names the material and its item when a piece is longer than its stock", async () => {
    const short = prices().items.map((i) => (i.kind === "casing" ? { ...i, stock: [{ length: 48, price: 5 }] } : i));
    await expect(computeTakeoff(inputs(), prices(short))).rejects.toThrow(/C's casing leg is 5'-5 1\/4" long, but the longest stock of “casing” is 4'-0"/);
  });
});
