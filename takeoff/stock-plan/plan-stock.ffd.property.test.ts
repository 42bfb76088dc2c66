import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkPlan } from "../testing/plan-check";
import type { Demand } from "../types";
import { planStock } from "./plan-stock";

/** Independent first-fit decreasing on one board length, in eighths of an inch (all test lengths are). */
function ffdBoards(pieces: readonly number[], board: number, kerf: number): number {
  const free: number[] = [];
  for (const p of [...pieces].sort((a, b) => b - a)) {
    const w = (p + kerf) * 8;
    const i = free.findIndex((f) => f >= w);
    if (i >= 0) free[i] = (free[i] ?? 0) - w;
    else free.push(board * 8 - w);
  }
  return free.length;
}

interface Family {
  pieces: number[];
  board: number;
  kerf: number;
}

/**
 * Falkenauer's "u" class scaled down (derived from its shape: items uniform
 * in 20–100 on 150 boards), here 20–100 in on 150 in boards, up to 160 pieces.
 */
const uniform: fc.Arbitrary<Family> = fc.record({
  pieces: fc.array(fc.integer({ min: 20 * 8, max: 100 * 8 }).map((n) => n / 8), { minLength: 1, maxLength: 160 }),
  board: fc.constant(150),
  kerf: fc.constantFrom(0, 0.125),
});

/** Triplet-like: each triple of pieces fills a 100 in board exactly (kerf 0), so k triples need exactly k boards. */
const triplets: fc.Arbitrary<Family> = fc
  .array(
    fc.integer({ min: 38 * 8, max: 49 * 8 }).chain((a) =>
      fc.integer({ min: 25 * 8, max: Math.floor((800 - a) / 2) }).map((b) => [a / 8, b / 8, (800 - a - b) / 8]),
    ),
    { minLength: 1, maxLength: 40 },
  )
  .map((ts) => ({ pieces: ts.flat(), board: 100, kerf: 0 }));

function demandOf(pieces: readonly number[]): Demand[] {
  const m = new Map<number, number>();
  for (const p of pieces) m.set(p, (m.get(p) ?? 0) + 1);
  return [...m].map(([length, quantity]) => ({ length, quantity }));
}

async function check(f: Family): Promise<void> {
  const demand = demandOf(f.pieces);
  const stock = [{ length: f.board, price: 1 }];
  const plan = await planStock(demand, stock, { kerf: f.kerf });
  checkPlan(plan, demand, stock, f.kerf);
  const eighths = f.pieces.reduce((t, p) => t + (p + f.kerf) * 8, 0);
  const trivial = Math.ceil(eighths / (f.board * 8));
  expect(plan.boardCount).toBeLessThanOrEqual(ffdBoards(f.pieces, f.board, f.kerf));
  expect(plan.lowerBound.cost).toBeGreaterThanOrEqual(trivial);
  expect(plan.lowerBound.cost).toBeLessThanOrEqual(plan.cost);
  expect(plan.lowerBound.length).toBeGreaterThanOrEqual(trivial * f.board);
  expect(plan.lowerBound.length).toBeLessThanOrEqual(plan.purchasedLength);
}

describe("planStock is never worse than first-fit decreasing; its bounds lie between the trivial bound and the plan (fast-check)", () => {
  it("uniform sizes (Falkenauer u-like, scaled down)", async () => {
    await fc.assert(fc.asyncProperty(uniform, check), { numRuns: 25 });
  }, 10_000);

  it("triplets that fill a board exactly", async () => {
    await fc.assert(fc.asyncProperty(triplets, check), { numRuns: 25 });
  }, 10_000);
});
