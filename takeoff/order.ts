import { MATERIALS, pieceDemand, type PieceDemand } from "./demand";
import { exact, sumFractions } from "./exact";
import { formatLength } from "./length-format";
import { planStock } from "./stock-plan/plan-stock";
import type { Demand, Material, PlanOptions, StockItem, StockPlan, TakeoffLine } from "./types";

/** Stock on offer per material: lengths, prices and (for ripped parts) board widths. */
export type StockCatalog = Partial<Record<Material, readonly StockItem[]>>;

export interface MaterialOrder {
  material: Material;
  /** Width the group's pieces are ripped to (extension, or any material whose stock lists widths). */
  width?: number;
  /** Width of the board they are ripped from: the narrowest stock item wide enough. */
  stockWidth?: number;
  demand: Demand[];
  plan: StockPlan;
}

interface Group {
  material: Material;
  width?: number;
  stockWidth?: number;
  stock: StockItem[];
  pieces: PieceDemand[];
}

/**
 * The stock a group of pieces is cut from. Extensions are ripped from board
 * stock: a board is ripped to one width and then crosscut, so pieces group by
 * width and each group takes the narrowest board that is wide enough (less
 * waste in the rip). Materials whose stock lists no widths use every length.
 */
function groupsFor(material: Material, pieces: PieceDemand[], stock: readonly StockItem[]): Group[] {
  const withWidth = stock.filter((s) => s.width !== undefined);
  if (material !== "extension" && withWidth.length === 0) return [{ material, stock: [...stock], pieces }];
  const byWidth = new Map<number | undefined, PieceDemand[]>();
  for (const p of pieces) byWidth.set(p.width, [...(byWidth.get(p.width) ?? []), p]);
  return [...byWidth.entries()].map(([width, group]) => {
    if (width === undefined || withWidth.length === 0) {
      return { material, ...(width === undefined ? {} : { width }), stock: [...stock], pieces: group };
    }
    const wide = withWidth.filter((s) => (s.width ?? 0) >= width);
    if (wide.length === 0) {
      const widest = Math.max(...withWidth.map((s) => s.width ?? 0));
      throw new Error(
        `${material} pieces ${formatLength(width)} wide: no stock item is wide enough (widest is ${formatLength(widest)})`,
      );
    }
    const stockWidth = Math.min(...wide.map((s) => s.width ?? 0));
    return { material, width, stockWidth, stock: wide.filter((s) => s.width === stockWidth), pieces: group };
  });
}

/**
 * Board orders for a whole job: totals per material (per rip width where the
 * material is ripped), each planned by planStock. Kerf applies to every cut.
 */
export async function orderMaterials(
  lines: readonly TakeoffLine[],
  catalog: StockCatalog,
  opts: PlanOptions,
): Promise<MaterialOrder[]> {
  const all = pieceDemand(lines);
  const groups: Group[] = [];
  for (const material of MATERIALS) {
    const pieces = all.filter((p) => p.material === material);
    if (pieces.length === 0) continue;
    const stock = catalog[material];
    if (!stock || stock.length === 0) throw new Error(`catalog.${material}: no stock listed for ${material}`);
    groups.push(...groupsFor(material, pieces, stock));
  }
  const orders: MaterialOrder[] = [];
  for (const g of groups) {
    const demand = g.pieces.map((p) => ({ length: p.length, quantity: p.quantity }));
    let plan: StockPlan;
    try {
      plan = await planStock(demand, g.stock.map((s) => ({ length: s.length, price: s.price })), opts);
    } catch (e) {
      throw new Error(`${g.material}${g.width === undefined ? "" : ` ${formatLength(g.width)} wide`}: ${(e as Error).message}`);
    }
    const order: MaterialOrder = { material: g.material, demand, plan };
    if (g.width !== undefined) order.width = g.width;
    if (g.stockWidth !== undefined) order.stockWidth = g.stockWidth;
    orders.push(order);
  }
  return orders;
}

export interface MaterialOrderSummary {
  material: Material;
  pieces: number;
  boardCount: number;
  /** Boards bought per stock length. */
  boards: { stockLength: number; count: number }[];
  cost: number;
  lowerBound: number;
  /** (cost − lower bound) / lower bound; 0 when both are 0. */
  gap: number;
}

/** Orders rolled up per material (rip-width groups added together). */
export function summarizeOrders(orders: readonly MaterialOrder[]): MaterialOrderSummary[] {
  return MATERIALS.flatMap((material) => {
    const mine = orders.filter((o) => o.material === material);
    if (mine.length === 0) return [];
    const perLength = new Map<number, number>();
    for (const b of mine.flatMap((o) => o.plan.boards)) {
      perLength.set(b.stockLength, (perLength.get(b.stockLength) ?? 0) + b.count);
    }
    const cost = sumFractions(mine.map((o) => exact(o.plan.cost)));
    const bound = sumFractions(mine.map((o) => exact(o.plan.lowerBound.cost)));
    return [{
      material,
      pieces: mine.reduce((t, o) => t + o.demand.reduce((u, d) => u + d.quantity, 0), 0),
      boardCount: mine.reduce((t, o) => t + o.plan.boardCount, 0),
      boards: [...perLength.entries()].sort((a, b) => b[0] - a[0]).map(([stockLength, count]) => ({ stockLength, count })),
      cost: cost.valueOf(),
      lowerBound: bound.valueOf(),
      gap: bound.n === 0n ? 0 : cost.sub(bound).div(bound).valueOf(),
    }];
  });
}
