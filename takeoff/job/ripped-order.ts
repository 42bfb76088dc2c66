import { ceilToMultiple, exact, floorDiv, Fraction, gcdFractions, numer, sumFractions, toNumber } from "../exact";
import type { StockPlan } from "../types";
import type { PlanBudget } from "./plan-budget";
import { fullestRip, packStrips, spareStrips, stripsPerBoard } from "./rip";
import { layoutBound } from "./rip-bound";
import type { PriceItemSnapshot, RipLayout, RipPlan } from "./types";

/** planStock's plan of one strip width: every strip a stock piece of its board's length at the board's price. */
export interface WidthPlan {
  width: number;
  plan: StockPlan;
}

/** Cents at or below f: a lower bound stays a bound when shown to the cent. */
const floorCents = (f: Fraction) => new Fraction(floorDiv(100n * numer(f), f.d), 100n);

/**
 * Turns the strip plans of an order's widths into what the yard sells. The crosscuts are planned per
 * width along strips (a strip is as long as its board); then, per stock length, the strips of every width
 * are packed across the boards' face with the rip kerf between them (packStrips). Strips of two lengths
 * never share a board. Money is exact: cost is boards × price per length. `budget.weight` is what the
 * order announced to the run's budget for this step (see orderBoards).
 *
 * The widths' strips are planned apart and then packed, so the plan is not proven best over every way
 * of choosing lengths and rips together; its cost bound is (see rippedBound), and the plan is "optimal"
 * only when its cost meets that bound.
 *
 * purchasedLength is every strip bought: those cut from, plus the strips of the order's narrowest width
 * still to be had from each board's offcut width (offcutStrips). For one width that is boards × n ×
 * length, the count of strips a board yields (derived: the last board's r strips leave n − r).
 */
export async function ripOrder(
  perWidth: readonly WidthPlan[],
  item: PriceItemSnapshot,
  kerf: number,
  budget: { plan: PlanBudget; weight: number },
): Promise<{ plan: StockPlan; rip: RipPlan }> {
  const board = item.faceWidth;
  const atLength = new Map<number, Map<number, number>>();
  for (const { width, plan } of perWidth) {
    for (const b of plan.boards) {
      const counts = atLength.get(b.stockLength) ?? new Map<number, number>();
      counts.set(width, (counts.get(width) ?? 0) + b.count);
      atLength.set(b.stockLength, counts);
    }
  }
  const layouts: RipLayout[] = [];
  const boards: RipPlan["boards"] = [];
  let budgetSpent = perWidth.some((p) => p.plan.budgetSpent === true);
  const allStrips = perWidth.reduce((t, p) => t + p.plan.boards.reduce((u, b) => u + b.count, 0), 0);
  for (const [stockLength, counts] of [...atLength].sort((a, b) => b[0] - a[0])) {
    const wanted = [...counts].map(([width, count]) => ({ width, count })).sort((a, b) => b.width - a.width);
    const strips = wanted.reduce((t, s) => t + s.count, 0);
    // The weight announced for the rip step is shared over the stock lengths by their strips.
    const packed = await packStrips(wanted, board, kerf, budget.plan.share((budget.weight * strips) / allStrips));
    budgetSpent ||= packed.budgetSpent;
    const mine = packed.layouts
      .map((l) => ({ stockLength, ...l }))
      .sort((a, b) => b.count - a.count || b.strips.length - a.strips.length || b.strips[0]! - a.strips[0]!);
    layouts.push(...mine);
    boards.push({ stockLength, strips, boards: mine.reduce((t, l) => t + l.count, 0) });
  }

  const narrowest = Math.min(...perWidth.map((p) => p.width));
  const spare = (l: RipLayout) => spareStrips(l.offcutWidth, narrowest, kerf);
  const price = (length: number) => exact(item.stock.find((s) => s.length === length)!.price);
  const cost = sumFractions(boards.map((b) => price(b.stockLength).mul(b.boards)));
  const purchased = sumFractions(layouts.map((l) => exact(l.stockLength).mul(l.count * (l.strips.length + spare(l)))));
  const bound = rippedBound(perWidth, item, kerf);
  const plan: StockPlan = {
    boards: perWidth.flatMap(({ width, plan: p }) => p.boards.map((b) => ({ ...b, width }))),
    boardCount: boards.reduce((t, b) => t + b.boards, 0),
    purchasedLength: toNumber(purchased),
    cost: toNumber(cost),
    lowerBound: { length: toNumber(sumFractions(perWidth.map((p) => exact(p.plan.lowerBound.length)))), cost: toNumber(bound) },
    // Meeting a proven bound proves the plan, whatever the steps' own proof said.
    proof: cost.lte(bound) ? "optimal" : "best-found",
    budgetSpent,
  };
  const strips = boards.reduce((t, b) => t + b.strips, 0);
  const rip: RipPlan = {
    stripsPerBoard: stripsPerBoard(board, narrowest, kerf),
    strips,
    offcutStrips: layouts.reduce((t, l) => t + l.count * spare(l), 0),
    boards,
    layouts,
  };
  return { plan, rip };
}

/**
 * A proven lower bound on the order's cost, however its strips are chosen and ripped (derived):
 * - a board carries strips with Σ(w + k) ≤ C (fullestRip), so a strip of width w uses at least (w + k)/C
 *   of its board, and the strips of width w cost at least their own proven bound at board price
 *   (planStock's lowerBound): Σ over widths of bound × (w + k)/C;
 * - a board holds at most n_w strips of width w, so the boards carrying them cost at least bound / n_w;
 * - the best dual-feasible weighting of the widths (layoutBound), which is at least as strong as both
 *   above when the face's grid is small enough to search;
 * - every plan costs a whole number of board prices, so a multiple of their gcd: the larger bound is
 *   rounded up to one, then down to the cent (a bound stays a bound when shown to the cent).
 * One width: C = n(w + k), so both are the strip bound / n. A strip wider than the board takes all of it.
 */
export function rippedBound(perWidth: readonly WidthPlan[], item: PriceItemSnapshot, kerf: number): Fraction {
  const board = item.faceWidth;
  const fullest = fullestRip(
    perWidth.map((p) => p.width),
    board,
    kerf,
  );
  const k = exact(kerf);
  const wide = (w: number) => exact(w).gt(exact(board));
  const bound = (p: WidthPlan) => exact(p.plan.lowerBound.cost);
  const shared = sumFractions(perWidth.map((p) => bound(p).mul(wide(p.width) ? 1 : exact(p.width).add(k).div(fullest))));
  const alone = perWidth.map((p) => bound(p).div(wide(p.width) ? 1 : stripsPerBoard(board, p.width, kerf)));
  const layouts = layoutBound(
    perWidth.map((p) => ({ width: p.width, bound: bound(p) })),
    board,
    kerf,
  );
  const wholeBoards = sumFractions(perWidth.filter((p) => wide(p.width)).map(bound));
  const candidates = [...alone, ...(layouts ? [layouts.add(wholeBoards)] : [])];
  const best = candidates.reduce((m, b) => (b.gt(m) ? b : m), shared);
  return floorCents(ceilToMultiple(best, gcdFractions(item.stock.map((s) => exact(s.price)))));
}
