import { MATERIALS } from "@/takeoff";
import type { BoardOrder, MaterialSummary } from "./types";

const cents = (x: number) => Math.round(x * 100) / 100;

/** Orders rolled up per material: boards, purchased and used length, offcut, yield, gap to the bound, allowance. */
export function summarizeMaterials(orders: BoardOrder[]): MaterialSummary[] {
  return MATERIALS.flatMap((material) => {
    const mine = orders.filter((o) => o.material === material);
    if (mine.length === 0) return [];
    const purchased = mine.reduce((t, o) => t + o.plan.purchasedLength, 0);
    const used = mine.reduce((t, o) => t + o.linearInches, 0);
    const cost = cents(mine.reduce((t, o) => t + o.plan.cost, 0));
    const lowerBound = cents(mine.reduce((t, o) => t + o.plan.lowerBound.cost, 0));
    const boardCount = mine.reduce((t, o) => t + o.plan.boardCount, 0);
    const toBuy = mine.flatMap((o) => o.toBuy);
    const buyCost = cents(toBuy.reduce((t, b) => t + b.count * b.price, 0));
    return [
      {
        material,
        linearFeet: used / 12,
        boardCount,
        purchasedFeet: purchased / 12,
        offcutFeet: (purchased - used) / 12,
        yield: purchased > 0 ? used / purchased : 0,
        cost,
        lowerBound,
        gapPercent: lowerBound > 0 ? ((cost - lowerBound) / lowerBound) * 100 : 0,
        allowanceBoards: toBuy.reduce((t, b) => t + b.count, 0) - boardCount,
        allowanceCost: cents(buyCost - cost),
      },
    ];
  });
}
