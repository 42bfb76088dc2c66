import { MATERIALS } from "../demand";
import { exact, Fraction, roundToCents, sumFractions, toNumber } from "../exact";
import type { BoardOrder, MaterialSummary } from "./types";

/**
 * Money is added as exact rationals and rounded to the cent once, half up, at the figure shown. Added as
 * binary floating point, cents drift (0.1 + 0.2 is 0.30000000000000004) and a total that lands on a half
 * cent can round the wrong way: 10.001 + 0.074 comes to 10.074999…, which shows as $10.07 where the
 * exact 10.075 is $10.08 (derived).
 */
const cents = (f: Fraction) => toNumber(roundToCents(f));

/** An order's money, exactly: the optimised plan, its proven bound, and what is bought with the allowance. */
function orderMoney(o: BoardOrder) {
  return {
    plan: exact(o.plan.cost),
    bound: exact(o.plan.lowerBound.cost),
    bought: sumFractions(o.toBuy.map((b) => exact(b.price).mul(b.count))),
  };
}

/** Material cost of the bid: everything bought, allowance included, over every order. */
export function materialCost(orders: readonly BoardOrder[]): number {
  return cents(sumFractions(orders.map((o) => orderMoney(o).bought)));
}

/** Orders rolled up per material: pieces, boards, purchased and used length, offcut, yield, gap to the bound, allowance. */
export function summarizeMaterials(orders: readonly BoardOrder[]): MaterialSummary[] {
  return MATERIALS.flatMap((material) => {
    const mine = orders.filter((o) => o.material === material);
    if (mine.length === 0) return [];
    const money = mine.map(orderMoney);
    const cost = sumFractions(money.map((m) => m.plan));
    const bound = sumFractions(money.map((m) => m.bound));
    const bought = sumFractions(money.map((m) => m.bought));
    const purchased = mine.reduce((t, o) => t + o.plan.purchasedLength, 0);
    const used = mine.reduce((t, o) => t + o.linearInches, 0);
    const boardCount = mine.reduce((t, o) => t + o.plan.boardCount, 0);
    const perLength = new Map<number, number>();
    // A ripped order's plan counts strips; its boards per length are in rip.
    const boardsOf = (o: BoardOrder) => o.rip?.boards.map((b) => ({ stockLength: b.stockLength, count: b.boards })) ?? o.plan.boards;
    for (const b of mine.flatMap(boardsOf)) perLength.set(b.stockLength, (perLength.get(b.stockLength) ?? 0) + b.count);
    return [
      {
        material,
        pieces: mine.reduce((t, o) => t + o.pieces, 0),
        linearFeet: used / 12,
        boardCount,
        boards: [...perLength.entries()].sort((a, b) => b[0] - a[0]).map(([stockLength, count]) => ({ stockLength, count })),
        purchasedFeet: purchased / 12,
        offcutFeet: (purchased - used) / 12,
        yield: purchased > 0 ? used / purchased : 0,
        cost: cents(cost),
        lowerBound: cents(bound),
        gapPercent: bound.n > 0n ? toNumber(cost.sub(bound).div(bound).mul(100)) : 0,
        allowanceBoards: mine.reduce((t, o) => t + o.toBuy.reduce((u, b) => u + b.count, 0), 0) - boardCount,
        allowanceCost: cents(bought.sub(cost)),
      },
    ];
  });
}
