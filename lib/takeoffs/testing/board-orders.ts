import type { BoardOrder } from "@/takeoff";

/**
 * Hand-made board orders for the formatting tests, invented figures: what a run saved with ripped
 * layouts and proof states looks like, independent of what the engine makes of any job.
 */

/** 16' and 12' 1x6 boards ripped to one 1 1/2" and two 3/4" strips (1/8" rip kerf) or two 1 1/2" and one 3/4". */
export function rippedOrder(overrides: Partial<BoardOrder> = {}): BoardOrder {
  return {
    itemId: "ext-55",
    itemName: "Extension 1x6 poplar",
    material: "extension",
    supplierCode: "E6",
    stockWidth: 5.5,
    widths: [1.5, 0.75],
    pieces: 60,
    linearInches: 2400,
    plan: {
      boards: [
        { stockLength: 192, count: 10, cuts: [60.75, 60.75, 36], offcut: 34.125, width: 1.5 },
        { stockLength: 192, count: 2, cuts: [60.75], offcut: 131.125, width: 1.5 },
        { stockLength: 192, count: 20, cuts: [36, 36, 36, 36, 36], offcut: 11.375, width: 0.75 },
        { stockLength: 144, count: 2, cuts: [60.75, 60.75], offcut: 22.25, width: 1.5 },
        { stockLength: 144, count: 1, cuts: [36, 36], offcut: 71.75, width: 0.75 },
      ],
      boardCount: 13,
      purchasedLength: 7344,
      cost: 354,
      lowerBound: { length: 6200, cost: 338.5 },
      proof: "best-found",
      budgetSpent: true,
    },
    rip: {
      stripsPerBoard: 3,
      strips: 35,
      offcutStrips: 4,
      boards: [
        { stockLength: 192, strips: 32, boards: 12 },
        { stockLength: 144, strips: 3, boards: 1 },
      ],
      layouts: [
        { stockLength: 192, count: 12, strips: [1.5, 0.75, 0.75], offcutWidth: 2.125 },
        { stockLength: 144, count: 1, strips: [1.5, 1.5, 0.75], offcutWidth: 1.375 },
      ],
    },
    toBuy: [
      { stockLength: 192, count: 14, price: 26 },
      { stockLength: 144, count: 2, price: 20 },
    ],
    ...overrides,
  };
}

/** Casing crosscut from whole boards, as a takeoff saved before proofs (no proof field) would hold it. */
export function crosscutOrder(overrides: Partial<BoardOrder> = {}): BoardOrder {
  return {
    itemId: "casing-25",
    itemName: "Casing 2 1/2 × 11/16 pine",
    material: "casing",
    supplierCode: "C25",
    pieces: 40,
    linearInches: 2200,
    plan: {
      boards: [{ stockLength: 144, count: 20, cuts: [62.625, 62.625], offcut: 18.5 }],
      boardCount: 20,
      purchasedLength: 2880,
      cost: 264,
      lowerBound: { length: 2260.5, cost: 251.3 },
    },
    toBuy: [{ stockLength: 144, count: 22, price: 13.2 }],
    ...overrides,
  };
}
