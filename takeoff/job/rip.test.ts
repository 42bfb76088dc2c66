import { describe, expect, it } from "vitest";
import { exact } from "../exact";
import { orderBoards } from "./board-orders";
import { stripsPerBoard } from "./rip";
import type { CutPiece } from "../types";
import type { PriceItemSnapshot } from "./types";

const board = (stock: PriceItemSnapshot["stock"], kind: PriceItemSnapshot["kind"] = "extension"): PriceItemSnapshot => ({
  id: "1x4", name: "1x4", kind, faceWidth: 3.5, thickness: 0.75, species: null, supplierCode: null, stock,
});
const opts = { kerf: 0.125, wastePercent: 0, placeholders: new Set<string>() };
const piece = (length: number, quantity: number, width?: number): CutPiece => ({
  part: "extension-side", material: "extension", quantity, length, ...(width === undefined ? {} : { width }), ends: ["square", "square"],
});

describe("strips ripped from one board", () => {
  it("derived: a 3 1/2\" board at 1/8\" kerf gives four 3/4\" strips (4·0.75 + 3·0.125 = 3.375 ≤ 3.5)", () => {
    expect(stripsPerBoard(3.5, 0.75, 0.125)).toBe(4);
  });
  it("derived: and three 1\" strips (3·1 + 2·0.125 = 3.25; four would need 4.375)", () => {
    expect(stripsPerBoard(3.5, 1, 0.125)).toBe(3);
  });

  it("12 pieces of 30\" at 3/4\" from 3 1/2\" × 96\" boards: 4 strips, so 1 board", async () => {
    // By hand: a 96" strip takes three 30" cuts with kerf (3 × 30.125 = 90.375 ≤ 96), so 12 pieces need
    // 4 strips; four strips per board → ceil(4 / 4) = 1 board, where one strip per board bought 4.
    const [o] = await orderBoards([{ quantity: 1, pieces: [piece(30, 12, 0.75)], items: { extension: board([{ length: 96, price: 9.6 }]) } }], opts);
    expect(o!.rip).toEqual({
      stripsPerBoard: 4,
      strips: 4,
      offcutStrips: 0,
      boards: [{ stockLength: 96, strips: 4, boards: 1 }],
      // 3.5 − 4 × 0.75 − 3 × 0.125 = 0.125 of board left (derived).
      layouts: [{ stockLength: 96, count: 1, strips: [0.75, 0.75, 0.75, 0.75], offcutWidth: 0.125 }],
    });
    expect(o!.plan.boards).toEqual([{ stockLength: 96, count: 4, cuts: [30, 30, 30], offcut: 5.625, width: 0.75 }]);
    expect(o!.plan.boardCount).toBe(1);
    expect(o!.toBuy).toEqual([{ stockLength: 96, count: 1, price: 9.6 }]);
    expect(o!.plan.cost).toBe(9.6);
    expect(o!.plan.purchasedLength).toBe(4 * 96);
  });

  it("unused strips are offcut, boards round up per length, and the allowance is on boards", async () => {
    // 13 pieces → 5 strips (ceil(13/3)) → ceil(5/4) = 2 boards, 3 strips unused; 10 % of 2 boards → 1 more.
    const [o] = await orderBoards(
      [{ quantity: 1, pieces: [piece(30, 13, 0.75)], items: { extension: board([{ length: 96, price: 9.6 }]) } }],
      { ...opts, wastePercent: 10 },
    );
    expect(o!.rip).toMatchObject({ strips: 5, offcutStrips: 3, boards: [{ stockLength: 96, strips: 5, boards: 2 }] });
    // The second board is ripped to the one strip it needs; its 3.5 − 0.75 = 2.75 left would rip three
    // more (3 × 0.875 = 2.625 ≤ 2.75, derived): the 3 offcut strips.
    expect(o!.rip!.layouts).toEqual([
      { stockLength: 96, count: 1, strips: [0.75, 0.75, 0.75, 0.75], offcutWidth: 0.125 },
      { stockLength: 96, count: 1, strips: [0.75], offcutWidth: 2.75 },
    ]);
    expect(o!.plan.purchasedLength).toBe(8 * 96);
    expect(o!.toBuy).toEqual([{ stockLength: 96, count: 3, price: 9.6 }]);
  });

  it("money is exact: the bound is the strip plan's at board price / 3, never a drifted float", async () => {
    // 1" strips, 3 per board at $10.00: 7 pieces of 30" → 3 strips → 1 board, $10.00. The bound, the
    // strip bound at $10/3 a strip, is shown no higher than the cost.
    const [o] = await orderBoards([{ quantity: 1, pieces: [piece(30, 7, 1)], items: { extension: board([{ length: 96, price: 10 }]) } }], opts);
    expect(o!.rip!.stripsPerBoard).toBe(3);
    expect(o!.plan.cost).toBe(10);
    expect(exact(o!.plan.lowerBound.cost).lte(exact(o!.plan.cost))).toBe(true);
    expect(exact(o!.plan.lowerBound.cost).mul(100).d).toBe(1n);
  });

  it("a material that is not ripped is planned as before: one board per pattern, no rip", async () => {
    const casing: CutPiece = { ...piece(30, 12), part: "casing-head", material: "casing" };
    const [o] = await orderBoards([{ quantity: 1, pieces: [casing], items: { casing: board([{ length: 96, price: 9.6 }], "casing") } }], opts);
    expect(o!.rip).toBeUndefined();
    expect(o!.plan.boardCount).toBe(4);
    expect(o!.toBuy).toEqual([{ stockLength: 96, count: 4, price: 9.6 }]);
  });
});
