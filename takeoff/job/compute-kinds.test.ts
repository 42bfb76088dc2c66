import { describe, expect, it } from "vitest";
import { testInputs, testPrices } from "../testing/job-fixtures";
import { computeTakeoff } from "./compute";
import type { TakeoffInputs } from "./types";

const spec = { style: "stool-and-apron" as const, casingWidth: 3.5, casingThickness: 0.75 };
const kinds: TakeoffInputs["openingTypes"] = [
  { id: "m2", mark: "M2", width: 35.5 * 2 + 1.5, height: 48, setback: 1.5, trimSpec: spec, kind: "mulled", shape: { widths: [35.5, 35.5], mullGap: 1.5 } },
  { id: "d1", mark: "D1", width: 30, height: 81, setback: 0, trimSpec: spec, kind: "door", shape: { sides: 2 } },
  { id: "r1", mark: "R1", width: 48, height: 40 + 24, setback: 1.5, trimSpec: spec, kind: "round-top", shape: { springHeight: 40 } },
  // A triple whose head (3 × 40 + 2 × 1.5 + 2r + 2w = 130.25") is longer than the 12' stock less a kerf only when
  // the stock stops at 10': used below with a book of 8' and 10' casing to need a scarf joint.
  { id: "m3", mark: "M3", width: 40 * 3 + 3, height: 60, setback: 1.5, trimSpec: spec, kind: "mulled", shape: { widths: [40, 40, 40], mullGap: 1.5 } },
];
const inputs = (o: Partial<TakeoffInputs["settings"]> = {}): TakeoffInputs =>
  testInputs({ openingTypes: kinds, counts: { perUnit: {}, commonAreas: { m2: 2, d1: 3, r1: 1, m3: 1 }, job: { m2: 2, d1: 3, r1: 1, m3: 1 } }, settings: { kerf: 0.125, wastePercent: 0, ...o } });

describe("a takeoff with mulled units, doors and a round-top", () => {
  it("orders every straight piece, rips mullion casings from flat stock, keeps arches out of straight stock, and prices door labour per side", async () => {
    const prices = testPrices();
    prices.labour = { ...prices.labour, minutesPerDoorSide: 20, minutesPerMull: 10, minutesArchPremium: 60 };
    const r = await computeTakeoff(inputs(), prices);
    const cut = (mark: string) => r.openingTypes.find((o) => o.mark === mark)!;
    // The door: no stool or apron or extension; only casing (legs and heads × 2 sides).
    expect(new Set(cut("D1").cutList.map((p) => p.material))).toEqual(new Set(["casing"]));
    expect(cut("D1").items).toEqual({ casing: "casing-35" });
    expect(cut("M2").kindOpening).toMatchObject({ kind: "mulled", widths: [35.5, 35.5] });
    // Mullion casing (1 1/2 − 2 × 1/8 = 1 1/4 wide) from the narrowest flat stock wide enough, ripped.
    expect(cut("M2").items.mullion).toBe("ext-35");
    const mullionOrder = r.orders.find((o) => o.material === "mullion")!;
    expect(mullionOrder.pieces).toBe(2 * 1 + 1 * 2); // one mull per pair × 2, two per triple × 1
    // Every straight piece is on a board of its order; the arch casing and arch extension are not.
    for (const ot of r.openingTypes) {
      for (const p of ot.cutList) {
        const orders = r.orders.filter((o) => o.material === p.material);
        const onBoards = orders.flatMap((o) => o.plan.boards.flatMap((b) => Array<number[]>(b.count).fill(b.cuts)).flat()).filter((c) => c === p.length).length;
        if (p.radius !== undefined) expect(p.part).toMatch(/arch/);
        else expect(onBoards).toBeGreaterThanOrEqual(p.quantity * ot.quantity);
      }
    }
    // Labour by hand: M2 2 × (45 + 10), D1 3 × 2 × 20, R1 45 + 60, M3 45 + 2 × 10; plus extension feet.
    const perOpening = 2 * 55 + 3 * 40 + 105 + 65;
    const extFeet = r.openingTypes.reduce((t, ot) => t + ot.cutList.filter((p) => p.material === "extension").reduce((s, p) => s + p.length * p.quantity * ot.quantity, 0), 0) / 12;
    expect(r.labourMinutes).toBeCloseTo(perOpening + 2 * extFeet, 9);
  });

  it("splices a head longer than every stock length with a scarf joint instead of refusing the run", async () => {
    const prices = testPrices();
    for (const i of prices.items) i.stock = i.stock.filter((s) => s.length <= 120);
    await expect(computeTakeoff(inputs(), prices)).rejects.toThrow(/longest stock/);
    const r = await computeTakeoff(inputs({ scarfOverlap: 1 }), prices);
    const head = r.openingTypes.find((o) => o.mark === "M3")!.cutList.filter((p) => p.part === "casing-head");
    expect(head.length).toBe(2);
    expect(head.every((p) => p.scarf?.of === 2 && p.length <= 120 - 0.125)).toBe(true);
    // The two parts cover the head (130 1/4") plus the overlap (derived: 3 × 40 + 2 × 1.5 + 2 × 1/8 + 2 × 3.5).
    expect(head.reduce((t, p) => t + p.length, 0)).toBeGreaterThanOrEqual(130.25 + 1);
  });
});
