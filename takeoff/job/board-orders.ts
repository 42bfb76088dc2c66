import { ceilDiv, exact, numer } from "../exact";
import { formatLength } from "../length-format";
import { planStock } from "../stock-plan/plan-stock";
import type { CutPiece, Material, StockPlan } from "../types";
import { boardsFromStrips, stripsPerBoard } from "./rip";
import type { BoardOrder, PriceItemSnapshot, RipPlan } from "./types";

/** The job's pieces of one opening type, with the price-book item each material is cut from. */
export interface PricedLine {
  quantity: number;
  pieces: readonly CutPiece[];
  items: Partial<Record<Material, PriceItemSnapshot>>;
}

interface Group {
  item: PriceItemSnapshot;
  material: Material;
  width?: number;
  demand: Map<number, number>;
}

/**
 * Board orders for a whole job, one per price-book item, material and — for extensions — rip width:
 * a board is ripped to one width and then crosscut (common practice), so extension pieces of one width
 * share boards and pieces of two widths do not. Each group is planned by planStock with the kerf on
 * every cut, then the waste allowance is added. `placeholders` names the stand-in items.
 * A ripped group (extensions) is planned along strips: each
 * board yields n strips (see stripsPerBoard), and boards bought per length are ceil(strips / n). The rip
 * kerf is the takeoff's saw kerf (inputs.settings.kerf): the engine keeps no separate rip-blade setting.
 */
export async function orderBoards(
  lines: readonly PricedLine[],
  opts: { kerf: number; wastePercent: number; placeholders: ReadonlySet<string> },
): Promise<BoardOrder[]> {
  const groups = new Map<string, Group>();
  for (const line of lines) {
    if (line.quantity === 0) continue;
    for (const piece of line.pieces) {
      const item = line.items[piece.material];
      if (!item) throw new Error(`${piece.material}: no price-book item picked for this piece`);
      // Only extensions are ripped to several strips: a stool narrower than its stock keeps one nosed
      // edge per board, so its offcut strip is no stool (common practice).
      const width = piece.material === "extension" ? piece.width : undefined;
      const key = `${item.id}|${piece.material}|${width ?? ""}`;
      const group = groups.get(key) ?? { item, material: piece.material, width, demand: new Map<number, number>() };
      group.demand.set(piece.length, (group.demand.get(piece.length) ?? 0) + piece.quantity * line.quantity);
      groups.set(key, group);
    }
  }

  const orders: BoardOrder[] = [];
  for (const g of groups.values()) {
    const demand = [...g.demand.entries()].sort((a, b) => b[0] - a[0]).map(([length, quantity]) => ({ length, quantity }));
    let plan: StockPlan;
    let rip: RipPlan | undefined;
    try {
      plan = await planStock(demand, g.item.stock, { kerf: opts.kerf });
    } catch (e) {
      const width = g.width === undefined ? "" : ` ${formatLength(g.width)} wide`;
      throw new Error(`${g.material}${width} from “${g.item.name}”: ${(e as Error).message}`);
    }
    const n = g.width === undefined ? 1 : stripsPerBoard(g.item.faceWidth, g.width, opts.kerf);
    if (n > 1) ({ plan, rip } = boardsFromStrips(plan, n, g.item));
    const perLength = new Map<number, number>();
    if (rip) for (const b of rip.boards) perLength.set(b.stockLength, b.boards);
    else for (const b of plan.boards) perLength.set(b.stockLength, (perLength.get(b.stockLength) ?? 0) + b.count);
    orders.push({
      itemId: g.item.id,
      itemName: g.item.name,
      material: g.material,
      supplierCode: g.item.supplierCode,
      ...(g.width === undefined ? {} : { width: g.width, stockWidth: g.item.faceWidth }),
      pieces: demand.reduce((t, d) => t + d.quantity, 0),
      linearInches: demand.reduce((t, d) => t + d.length * d.quantity, 0),
      plan,
      ...(rip ? { rip } : {}),
      toBuy: withAllowance(perLength, opts.wastePercent, g.item),
      ...(opts.placeholders.has(g.item.id) ? { placeholder: true as const } : {}),
    });
  }
  return orders;
}

/**
 * Boards to buy: the optimised counts plus the waste allowance, taken on the item's whole count and
 * rounded up to whole boards, all added at the longest length planned — a long board can stand in for a
 * short one, not the other way round (common practice). Worked exactly: in binary floating point 2.2 %
 * of 1,500 boards comes to 33.00000000000001, which would round up to 34.
 */
function withAllowance(perLength: Map<number, number>, wastePercent: number, item: PriceItemSnapshot) {
  const lengths = [...perLength.entries()].sort((a, b) => b[0] - a[0]);
  const total = lengths.reduce((t, [, n]) => t + n, 0);
  const share = exact(wastePercent).mul(total).div(100);
  const extra = Number(ceilDiv(numer(share), share.d));
  return lengths.map(([stockLength, count], i) => ({
    stockLength,
    count: count + (i === 0 ? extra : 0),
    price: item.stock.find((s) => s.length === stockLength)!.price,
  }));
}
