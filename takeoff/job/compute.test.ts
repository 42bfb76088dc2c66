import { describe, expect, it } from "vitest";
import { cutList } from "../cut-list";
import { testInputs, testPrices } from "../testing/job-fixtures";
import { openingOf } from "./opening-of";
import { computeTakeoff } from "./compute";
import { MissingItem } from "./errors";
import { DEFAULT_RUN_PLAN_SECONDS } from "./plan-budget";
import { checkRipped } from "./ripped-check";
import type { Demand } from "../types";

describe("computeTakeoff", () => {
  it("worked example, JLC 'Production Jamb Extensions': 3 1/2 in casing with 1/4 in reveals at jamb and stool → stool 8 in longer than the jamb opening", async () => {
    // The article's rule: twice the casing + twice the jamb reveal + twice the reveal at the stool's ends.
    const inputs = testInputs({
      openingTypes: [
        { id: "w", mark: "W9", width: 30, height: 48, setback: 0, trimSpec: { style: "stool-and-apron", casingWidth: 3.5, casingThickness: 0.75, reveal: 0.25, stoolHorn: 0.25 } },
      ],
      counts: { perUnit: {}, commonAreas: { w: 1 }, job: { w: 1 } },
    });
    const result = await computeTakeoff(inputs, testPrices());
    const pieces = result.openingTypes[0]!.cutList;
    expect(pieces.find((p) => p.part === "stool")!.length).toBe(30 + 8);
    // The apron's ends line up with the casing's outer edges (the same article; also Gary Katz, "Installing Traditional Stool and Apron": "the O.D. of the casing is also the O.D. of the apron").
    expect(pieces.find((p) => p.part === "apron")!.length).toBe(30 + 2 * 0.25 + 2 * 3.5);
  });

  it("orders cover every piece of every opening, per price-book item, and extensions come from the narrowest board wide enough", async () => {
    const inputs = testInputs();
    const result = await computeTakeoff(inputs, testPrices());
    for (const ot of inputs.openingTypes) {
      const q = inputs.counts.job[ot.id]!;
      for (const piece of cutList(openingOf(ot), ot.trimSpec)) {
        const item = result.openingTypes.find((o) => o.openingTypeId === ot.id)!.items[piece.material]!;
        // Extensions of every width from one item share one order; their crosscuts are per strip width.
        const order = result.orders.find((o) => o.itemId === item && o.material === piece.material);
        const along = order!.plan.boards.filter((b) => piece.material !== "extension" || b.width === piece.width);
        const cut = along.flatMap((b) => Array<number[]>(b.count).fill(b.cuts)).flat().filter((c) => c === piece.length).length;
        expect(cut).toBeGreaterThanOrEqual(piece.quantity * q);
      }
    }
    const extensions = result.orders.filter((o) => o.material === "extension");
    expect(extensions.map((o) => [o.widths, o.stockWidth])).toEqual([[[1.4375, 0.5], 3.5]]);
    // Aprons come from the casing when the book lists no apron of that profile (common practice).
    expect(result.orders.find((o) => o.material === "apron")!.itemId).toBe("casing-25");
  });

  it("extensions of both widths share the 1x4 boards they are cut from; rips take settings.ripKerf, crosscuts settings.kerf", async () => {
    for (const ripKerf of [undefined, 0.1875]) {
      const inputs = testInputs();
      if (ripKerf !== undefined) inputs.settings.ripKerf = ripKerf;
      const result = await computeTakeoff(inputs, testPrices());
      const demand = new Map<number, Demand[]>();
      for (const ot of inputs.openingTypes) {
        for (const p of cutList(openingOf(ot), ot.trimSpec).filter((c) => c.material === "extension")) {
          demand.set(p.width!, [...(demand.get(p.width!) ?? []), { length: p.length, quantity: p.quantity * inputs.counts.job[ot.id]! }]);
        }
      }
      const order = result.orders.find((o) => o.material === "extension")!;
      checkRipped(order, demand, testPrices().items.find((i) => i.id === "ext-35")!.stock, 0.125, ripKerf ?? 0.125);
      // Narrowest width 1/2": floor((3.5 + k) / (0.5 + k)) strips a board — 5 at 1/8", 5 at 3/16" (derived).
      expect(order.rip!.stripsPerBoard).toBe(5);
      expect(result.planning).toEqual({ budgetSeconds: DEFAULT_RUN_PLAN_SECONDS, allOptimal: result.orders.every((o) => o.plan.proof === "optimal"), bestFound: result.orders.filter((o) => o.plan.proof === "best-found").length, budgetSpent: 0 });
    }
    const slow = await computeTakeoff(testInputs({ settings: { kerf: 0.125, wastePercent: 10, planSeconds: 30 } }), testPrices());
    expect(slow.planning!.budgetSeconds).toBe(30);
  }, 30_000);

  it("adds the waste allowance on each item's board count, rounded up, at its longest length; prices the bid from what is bought", async () => {
    const result = await computeTakeoff(testInputs(), testPrices());
    for (const order of result.orders) {
      const planned = order.plan.boardCount;
      const bought = order.toBuy.reduce((t, b) => t + b.count, 0);
      expect(bought).toBe(planned + Math.ceil(planned * 0.1 - 1e-9));
      const longest = Math.max(...order.plan.boards.map((b) => b.stockLength));
      for (const buy of order.toBuy.filter((b) => b.stockLength !== longest)) {
        // A ripped order's plan counts strips; its boards per length are rip.boards (ceil(strips / n)).
        const planned = order.rip
          ? order.rip.boards.find((b) => b.stockLength === buy.stockLength)!.boards
          : order.plan.boards.filter((b) => b.stockLength === buy.stockLength).reduce((t, b) => t + b.count, 0);
        expect(buy.count).toBe(planned);
      }
    }
    const bought = result.orders.flatMap((o) => o.toBuy).reduce((t, b) => t + b.count * b.price, 0);
    expect(result.bid.material).toBeCloseTo(bought, 2);
    // Labour: 23 × 45 + 10 × 30 minutes plus 2 min per foot of extension.
    const extensionFeet = result.orders.filter((o) => o.material === "extension").reduce((t, o) => t + o.linearInches, 0) / 12;
    expect(result.labourMinutes).toBeCloseTo(23 * 45 + 10 * 30 + 2 * extensionFeet, 6);
    expect(result.bid.total).toBeCloseTo(result.bid.material + result.bid.labour + result.bid.markup + result.bid.tax, 2);
  });

  it("totals per unit type: one unit, all units, and the job", async () => {
    const result = await computeTakeoff(testInputs(), testPrices());
    const a = result.unitTypes[0]!;
    for (const t of a.perUnit) {
      const all = a.allUnits.find((x) => x.material === t.material)!;
      expect(all.linearInches).toBeCloseTo(t.linearInches * 10, 6);
    }
    const casing = (list: typeof a.perUnit) => list.find((x) => x.material === "casing")?.linearInches ?? 0;
    expect(casing(result.job)).toBeCloseTo(casing(a.allUnits) + casing(result.commonAreas), 6);
  });

  it("an alternate casing reprices every window with that profile", async () => {
    const base = await computeTakeoff(testInputs(), testPrices());
    const alt = await computeTakeoff(testInputs({ casingItemId: "casing-35" }), testPrices());
    expect(alt.orders.filter((o) => o.material === "casing").map((o) => o.itemId)).toEqual(["casing-35"]);
    const leg = (r: typeof base) => r.openingTypes[0]!.cutList.find((p) => p.part === "casing-leg")!.length;
    expect(leg(alt) - leg(base)).toBe(1); // 3 1/2 − 2 1/2 in wider casing, measured to the long point
  });

  it("names the window and the size when the price book lacks it", async () => {
    const prices = testPrices();
    prices.items = prices.items.filter((i) => i.kind !== "stool");
    await expect(computeTakeoff(testInputs(), prices)).rejects.toThrow(MissingItem);
    await expect(computeTakeoff(testInputs(), prices)).rejects.toThrow(/W1 needs stool at least 2 7\/16" wide/);
  });
});
