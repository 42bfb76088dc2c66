import { ceilDiv, exact, floorDiv, Fraction, numer, sumFractions, toNumber } from "../exact";
import type { StockPlan } from "../types";
import type { PriceItemSnapshot, RipPlan } from "./types";

/**
 * Strips of width `strip` one board of width `board` rips into: n strips take n·w + (n−1)·k ≤ W, so
 * n = floor((W + k) / (w + k)) (derived). Worked exactly: a 3 1/2" board at 1/8" kerf gives four 3/4"
 * strips (3.375 ≤ 3.5) and three 1" strips (four would need 4.375).
 */
export function stripsPerBoard(board: number, strip: number, kerf: number): number {
  const k = exact(kerf);
  const q = exact(board).add(k).div(exact(strip).add(k));
  return Number(floorDiv(numer(q), q.d));
}

/** Cents at or below f: a lower bound stays a bound when shown to the cent. */
const floorCents = (f: Fraction) => new Fraction(floorDiv(100n * numer(f), f.d), 100n);

/**
 * Turns a plan along strips into what the yard sells. `strips` is planStock's plan with every strip a
 * stock piece of its board's length at the board's price: minimising strips × price is the same as
 * minimising strips × price / n, so the plan is the one at the true strip price, and its money is
 * divided by n here, exactly. Boards per length are ceil(strips / n); the strips left unused on the last
 * board count as offcut, so purchasedLength is every strip bought (boards × n × length).
 */
export function boardsFromStrips(strips: StockPlan, n: number, item: PriceItemSnapshot): { plan: StockPlan; rip: RipPlan } {
  const perLength = new Map<number, number>();
  for (const b of strips.boards) perLength.set(b.stockLength, (perLength.get(b.stockLength) ?? 0) + b.count);
  const boards = [...perLength.entries()]
    .sort((a, b) => b[0] - a[0])
    .map(([stockLength, used]) => ({ stockLength, strips: used, boards: Number(ceilDiv(BigInt(used), BigInt(n))) }));
  const price = (length: number) => exact(item.stock.find((s) => s.length === length)!.price);
  const cost = sumFractions(boards.map((b) => price(b.stockLength).mul(b.boards)));
  const purchased = sumFractions(boards.map((b) => exact(b.stockLength).mul(b.boards * n)));
  const plan: StockPlan = {
    boards: strips.boards,
    boardCount: boards.reduce((t, b) => t + b.boards, 0),
    purchasedLength: toNumber(purchased),
    cost: toNumber(cost),
    lowerBound: { length: strips.lowerBound.length, cost: toNumber(floorCents(exact(strips.lowerBound.cost).div(n))) },
  };
  const stripCount = boards.reduce((t, b) => t + b.strips, 0);
  return { plan, rip: { stripsPerBoard: n, strips: stripCount, offcutStrips: plan.boardCount * n - stripCount, boards } };
}
