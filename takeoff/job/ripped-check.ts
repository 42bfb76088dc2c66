/**
 * Test helper: checks a ripped order against demand worked out by the test, with the tests' own BigInt
 * rationals (testing/rational.ts), not the engine's arithmetic. Each width's crosscuts are a valid plan
 * along strips (checkPlan, every strip a stock piece at its board's length and price); every board
 * layout fits the board face with the rip kerf between strips and its offcut width adds up; the strips
 * the layouts rip are exactly the strips the crosscut plans use, per stock length and width; boards and
 * cost follow from the layouts; the cost is never below its bound.
 */
import { expect } from "vitest";
import { checkPlan } from "../testing/plan-check";
import { Q } from "../testing/rational";
import type { Demand, StockItem } from "../types";
import type { BoardOrder } from "./types";

export function checkRipped(o: BoardOrder, demand: ReadonlyMap<number, Demand[]>, stock: readonly StockItem[], kerf: number, ripKerf: number): void {
  const rip = o.rip!;
  const layouts = rip.layouts!;
  const widths = [...demand.keys()].sort((a, b) => b - a);
  expect(o.widths ?? [o.width]).toEqual(widths);
  const price = (length: number) => Q.of(stock.find((s) => s.length === length)!.price);
  for (const width of widths) {
    const mine = o.plan.boards.filter((b) => b.width === width);
    const stripView = {
      boards: mine,
      boardCount: mine.reduce((t, b) => t + b.count, 0),
      purchasedLength: mine.reduce((t, b) => t + b.count * b.stockLength, 0),
      cost: mine.reduce((t, b) => t.add(price(b.stockLength).mul(b.count)), new Q(0n)).toNumber(),
      lowerBound: { length: 0, cost: 0 },
    };
    checkPlan(stripView, demand.get(width)!, stock, kerf);
  }
  expect(o.plan.boards.every((b) => b.width !== undefined && widths.includes(b.width))).toBe(true);

  const key = (length: number, width: number) => `${length}|${width}`;
  const cutFrom = new Map<string, number>();
  for (const b of o.plan.boards) cutFrom.set(key(b.stockLength, b.width!), (cutFrom.get(key(b.stockLength, b.width!)) ?? 0) + b.count);
  const ripped = new Map<string, number>();
  let cost = new Q(0n);
  for (const l of layouts) {
    expect(l.count).toBeGreaterThan(0);
    expect([...l.strips]).toEqual([...l.strips].sort((a, b) => b - a));
    const taken = l.strips.reduce((t, w) => t.add(w), new Q(0n)).add(Q.of(ripKerf).mul(l.strips.length - 1));
    const face = Q.of(o.stockWidth!);
    if (l.strips.length === 1 && taken.cmp(face) > 0) expect(l.offcutWidth).toBe(0);
    else expect(taken.add(l.offcutWidth).eq(face), `layout ${JSON.stringify(l)}`).toBe(true);
    for (const w of l.strips) ripped.set(key(l.stockLength, w), (ripped.get(key(l.stockLength, w)) ?? 0) + l.count);
    cost = cost.add(price(l.stockLength).mul(l.count));
  }
  expect([...ripped].sort()).toEqual([...cutFrom].sort());
  for (const b of rip.boards) {
    const here = layouts.filter((l) => l.stockLength === b.stockLength);
    expect(b.boards).toBe(here.reduce((t, l) => t + l.count, 0));
    expect(b.strips).toBe(here.reduce((t, l) => t + l.count * l.strips.length, 0));
  }
  expect(rip.strips).toBe(rip.boards.reduce((t, b) => t + b.strips, 0));
  expect(o.plan.boardCount).toBe(rip.boards.reduce((t, b) => t + b.boards, 0));
  expect(Q.of(o.plan.cost).eq(cost), `cost ${o.plan.cost} vs ${cost.toNumber()}`).toBe(true);
  expect(Q.of(o.plan.lowerBound.cost).cmp(o.plan.cost)).toBeLessThanOrEqual(0);
  expect(o.plan.proof).toBe(Q.of(o.plan.lowerBound.cost).eq(o.plan.cost) ? "optimal" : "best-found");
}
