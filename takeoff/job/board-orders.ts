import { ceilDiv, exact, numer } from "../exact";
import { formatLength } from "../length-format";
import { planStock } from "../stock-plan/plan-stock";
import type { CutPiece, Demand, Material, StockPlan } from "../types";
import { DEFAULT_RUN_PLAN_SECONDS, PlanBudget } from "./plan-budget";
import { stripsPerBoard } from "./rip";
import { ripOrder, type WidthPlan } from "./ripped-order";
import type { BoardOrder, PriceItemSnapshot, RipPlan } from "./types";

/** The job's pieces of one opening type, with the price-book item each material is cut from. */
export interface PricedLine {
  quantity: number;
  pieces: readonly CutPiece[];
  items: Partial<Record<Material, PriceItemSnapshot>>;
}

export interface OrderOptions {
  /** Saw kerf of every crosscut. */
  kerf: number;
  /** Kerf of each rip between strips; absent = kerf. */
  ripKerf?: number;
  wastePercent: number;
  placeholders: ReadonlySet<string>;
  /** The run's planning time; absent = a budget of DEFAULT_RUN_PLAN_SECONDS of its own. */
  budget?: PlanBudget;
}

interface Group {
  item: PriceItemSnapshot;
  material: Material;
  /** Demand per strip width (undefined: the piece is not ripped), length → quantity. */
  byWidth: Map<number | undefined, Map<number, number>>;
}

const pieceCount = (demand: readonly Demand[]) => demand.reduce((t, d) => t + d.quantity, 0);

/**
 * Board orders for a whole job, one per price-book item and material. Extension pieces of every width cut
 * from one item form one order: each board is ripped to strips and the strips crosscut (common practice),
 * and strips of several widths may share a board. The crosscuts are planned per width along strips, each
 * by planStock with the saw kerf on every cut; then the strips of each stock length are packed across the
 * boards with the rip kerf between them (ripOrder). An order of one width whose board yields one strip is
 * not ripped: it is planned as boards. Other materials are planned as boards: a stool narrower than its
 * stock keeps one nosed edge per board, so its offcut strip is no stool (common practice). The waste
 * allowance is added last. `placeholders` names the stand-in items. Every planStock call is given its
 * share of the run's planning budget, weighted by the pieces it plans.
 */
export async function orderBoards(lines: readonly PricedLine[], opts: OrderOptions): Promise<BoardOrder[]> {
  const ripKerf = opts.ripKerf ?? opts.kerf;
  const budget = opts.budget ?? new PlanBudget(DEFAULT_RUN_PLAN_SECONDS);
  const groups = new Map<string, Group>();
  for (const line of lines) {
    if (line.quantity === 0) continue;
    for (const piece of line.pieces) {
      // Curved pieces are not cut from straight stock: they are ordered by radius and count
      // (TakeoffResult.job's curved totals), apart from the board orders.
      if (piece.radius !== undefined) continue;
      const item = line.items[piece.material];
      if (!item) throw new Error(`${piece.material}: no price-book item picked for this piece`);
      // Extensions and mullion casings are flat boards ripped to width.
      const width = piece.material === "extension" || piece.material === "mullion" ? piece.width : undefined;
      // A piece of no width is planned as boards, apart from the ripped ones.
      const key = `${item.id}|${piece.material}|${width === undefined ? "" : "ripped"}`;
      const group = groups.get(key) ?? { item, material: piece.material, byWidth: new Map() };
      const demand = group.byWidth.get(width) ?? new Map<number, number>();
      demand.set(piece.length, (demand.get(piece.length) ?? 0) + piece.quantity * line.quantity);
      group.byWidth.set(width, demand);
      groups.set(key, group);
    }
  }
  const demandOf = (m: Map<number, number>): Demand[] =>
    [...m.entries()].sort((a, b) => b[0] - a[0]).map(([length, quantity]) => ({ length, quantity }));
  const planned = [...groups.values()].map((g) => ({
    ...g,
    widths: [...g.byWidth.entries()].sort((a, b) => (b[0] ?? 0) - (a[0] ?? 0)).map(([width, m]) => ({ width, demand: demandOf(m) })),
  }));
  // Weights: the pieces each crosscut plan cuts, and for an order of several widths its rip step, which
  // packs its strips — announced as the order's pieces, since no strip carries fewer than one piece.
  const piecesOf = (g: (typeof planned)[number]) => g.widths.reduce((t, w) => t + pieceCount(w.demand), 0);
  const ripWeight = (g: (typeof planned)[number]) => (g.widths.length > 1 ? piecesOf(g) : 0);
  budget.expect(planned.reduce((t, g) => t + piecesOf(g) + ripWeight(g), 0));

  const orders: BoardOrder[] = [];
  for (const g of planned) {
    const perWidth: { width: number | undefined; plan: StockPlan }[] = [];
    for (const { width, demand } of g.widths) {
      try {
        perWidth.push({ width, plan: await planStock(demand, g.item.stock, { kerf: opts.kerf, budgetMs: budget.share(pieceCount(demand)) }) });
      } catch (e) {
        const wide = width === undefined ? "" : ` ${formatLength(width)} wide`;
        throw new Error(`${g.material}${wide} from “${g.item.name}”: ${(e as Error).message}`);
      }
    }
    const widths = g.widths.flatMap((w) => (w.width === undefined ? [] : [w.width]));
    const ripped = widths.length > 1 || (widths.length === 1 && stripsPerBoard(g.item.faceWidth, widths[0]!, ripKerf) > 1);
    let plan = withProof(perWidth[0]!.plan);
    let rip: RipPlan | undefined;
    if (ripped) ({ plan, rip } = await ripOrder(perWidth as WidthPlan[], g.item, ripKerf, { plan: budget, weight: ripWeight(g) }));
    const perLength = new Map<number, number>();
    if (rip) for (const b of rip.boards) perLength.set(b.stockLength, b.boards);
    else for (const b of plan.boards) perLength.set(b.stockLength, (perLength.get(b.stockLength) ?? 0) + b.count);
    const all = g.widths.flatMap((w) => w.demand);
    orders.push({
      itemId: g.item.id,
      itemName: g.item.name,
      material: g.material,
      supplierCode: g.item.supplierCode,
      ...(widths.length === 0 ? {} : widths.length === 1 ? { width: widths[0] } : { widths }),
      ...(widths.length === 0 ? {} : { stockWidth: g.item.faceWidth }),
      pieces: pieceCount(all),
      linearInches: all.reduce((t, d) => t + d.length * d.quantity, 0),
      plan,
      ...(rip ? { rip } : {}),
      toBuy: withAllowance(perLength, opts.wastePercent, g.item),
      ...(opts.placeholders.has(g.item.id) ? { placeholder: true as const } : {}),
    });
  }
  return orders;
}

/** A plan with its proof state: planStock's own, or — from a planner that does not give it — read off the bound. */
function withProof(plan: StockPlan): StockPlan {
  return {
    ...plan,
    proof: plan.proof ?? (exact(plan.cost).lte(exact(plan.lowerBound.cost)) ? "optimal" : "best-found"),
    budgetSpent: plan.budgetSpent ?? false,
  };
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
