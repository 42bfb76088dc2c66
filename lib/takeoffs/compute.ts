import { bidTotal, labourCost, labourMinutes, planStock, takeoffTotals, type CutPiece, type Material, type TakeoffLine, type TrimSpec } from "@/takeoff";
import { MissingItem } from "./pick-items";
import { assessOpeningType, placeholderFor, placeholdersFor, type PriceGap } from "./price-gaps";
import { summarizeMaterials } from "./summarize";
import type { BoardOrder, OpeningTypeResult, PriceItemSnapshot, TakeoffInputs, TakeoffPrices, TakeoffResult } from "./types";

export { MissingItem };

/** An opening type whose sizes and trim cannot be cut; `field` is the opening type's field (`trimSpec.apronInset`). */
export class OpeningTypeProblem extends Error {
  constructor(
    readonly mark: string,
    readonly field: string,
    message: string,
  ) {
    super(message);
  }
}

/** The price book lacks what some windows need and placeholders were not asked for. */
export class PriceGaps extends MissingItem {
  constructor(readonly gaps: PriceGap[]) {
    const [first, ...rest] = gaps;
    super(
      `${first!.message} ${first!.fix}` +
        (rest.length ? ` Also: ${rest.map((g) => g.message).join(" ")}` : ""),
    );
  }
}

interface Group {
  item: PriceItemSnapshot;
  material: Material;
  width?: number;
  demand: Map<number, number>;
  placeholder: boolean;
}

interface Planned {
  id: string;
  mark: string;
  quantity: number;
  spec: TrimSpec;
  opening: { width: number; height: number; setback: number };
  pieces: CutPiece[];
  items: Partial<Record<Material, PriceItemSnapshot>>;
  gaps: PriceGap[];
}

const cents = (x: number) => Math.round(x * 100) / 100;

/**
 * A whole takeoff from its snapshots: cut lists per opening type, totals per unit type and for the job,
 * board orders per price-book item (extensions per rip width), waste allowance, labour and the bid.
 * Pure: everything it needs is in `inputs` and `prices`, which is what makes a saved takeoff reproducible.
 * Refuses, naming the opening type, a window that cannot be cut; refuses a price-book gap unless
 * `inputs.allowPlaceholders`, in which case the gap is priced with a named placeholder.
 */
export async function computeTakeoff(inputs: TakeoffInputs, prices: TakeoffPrices): Promise<TakeoffResult> {
  const override = inputs.casingItemId ? (prices.items.find((i) => i.id === inputs.casingItemId) ?? null) : null;
  if (inputs.casingItemId && !override) throw new MissingItem("The alternate casing is not in the price book.");
  const kerf = inputs.settings.kerf;

  const planned: Planned[] = inputs.openingTypes.map((ot) => {
    const a = assessOpeningType(ot, prices, kerf, override);
    if (!a.ok) throw new OpeningTypeProblem(ot.mark, a.problem.field, `${ot.mark}: ${a.problem.message}`);
    const opening = { width: ot.width, height: ot.height, setback: ot.setback };
    return { id: ot.id, mark: ot.mark, quantity: inputs.counts.job[ot.id] ?? 0, spec: a.spec, opening, pieces: a.pieces, items: a.picked, gaps: a.gaps };
  });
  // Only windows in the job need prices: an untagged type's gap does not stop the run.
  const gaps = planned.filter((p) => p.quantity > 0).flatMap((p) => p.gaps);
  if (gaps.length > 0 && !inputs.allowPlaceholders) throw new PriceGaps(gaps);
  const placeholders = placeholdersFor(gaps, prices, kerf);
  for (const p of planned) {
    if (p.quantity === 0) continue;
    for (const g of p.gaps) p.items[g.material] = placeholderFor(placeholders, g)!.item;
  }
  const isPlaceholder = new Set([...placeholders.values()].map((ph) => ph.item.id));

  const openingTypes: OpeningTypeResult[] = [];
  const lines: (TakeoffLine & { id: string })[] = [];
  const groups = new Map<string, Group>();
  for (const p of planned) {
    openingTypes.push({
      openingTypeId: p.id,
      mark: p.mark,
      quantity: p.quantity,
      spec: p.spec,
      opening: p.opening,
      cutList: p.pieces,
      items: Object.fromEntries(Object.entries(p.items).map(([m, i]) => [m, i!.id])),
    });
    if (p.quantity === 0) continue;
    lines.push({ id: p.id, opening: p.opening, spec: p.spec, quantity: p.quantity });
    for (const piece of p.pieces) {
      const item = p.items[piece.material]!;
      const width = piece.material === "extension" ? piece.width : undefined;
      const key = `${item.id}|${piece.material}|${width ?? ""}`;
      const group = groups.get(key) ?? { item, material: piece.material, width, demand: new Map<number, number>(), placeholder: isPlaceholder.has(item.id) };
      group.demand.set(piece.length, (group.demand.get(piece.length) ?? 0) + piece.quantity * p.quantity);
      groups.set(key, group);
    }
  }

  const orders: BoardOrder[] = [];
  for (const g of groups.values()) {
    const demand = [...g.demand.entries()].sort((a, b) => b[0] - a[0]).map(([length, quantity]) => ({ length, quantity }));
    const plan = await planStock(demand, g.item.stock, { kerf });
    const perLength = new Map<number, number>();
    for (const b of plan.boards) perLength.set(b.stockLength, (perLength.get(b.stockLength) ?? 0) + b.count);
    orders.push({
      itemId: g.item.id,
      itemName: g.item.name,
      material: g.material,
      supplierCode: g.item.supplierCode,
      ...(g.width === undefined ? {} : { width: g.width, stockWidth: g.item.faceWidth }),
      pieces: demand.reduce((t, d) => t + d.quantity, 0),
      linearInches: demand.reduce((t, d) => t + d.length * d.quantity, 0),
      plan,
      toBuy: withAllowance(perLength, inputs.settings.wastePercent, g.item),
      ...(g.placeholder ? { placeholder: true as const } : {}),
    });
  }

  const totalsFor = (count: (otId: string) => number) =>
    takeoffTotals(lines.map((l) => ({ ...l, quantity: count(l.id) })).filter((l) => l.quantity > 0));
  const materials = summarizeMaterials(orders);
  const materialCost = cents(materials.reduce((t, m) => t + m.cost + m.allowanceCost, 0));
  const labour = lines.length ? labourCost(lines, prices.labour) : 0;
  const result: TakeoffResult = {
    openingsTotal: lines.reduce((t, l) => t + l.quantity, 0),
    openingTypes,
    unitTypes: inputs.unitTypes.map((u) => {
      const per = inputs.counts.perUnit[u.id] ?? {};
      return {
        unitTypeId: u.id,
        name: u.name,
        unitCount: u.count,
        perUnit: totalsFor((id) => per[id] ?? 0),
        allUnits: totalsFor((id) => (per[id] ?? 0) * u.count),
      };
    }),
    commonAreas: totalsFor((id) => inputs.counts.commonAreas[id] ?? 0),
    job: lines.length ? takeoffTotals(lines) : [],
    orders,
    materials,
    labourMinutes: lines.length ? labourMinutes(lines, prices.labour) : 0,
    bid: bidTotal({ material: materialCost, labour }, { markup: prices.markup, taxRate: prices.taxRate, taxLabour: prices.taxLabour }),
  };
  if (placeholders.size > 0) {
    result.placeholders = [...placeholders.values()].map((ph) => ({
      itemId: ph.item.id,
      itemName: ph.item.name,
      material: ph.material,
      marks: ph.marks,
      gaps: ph.gaps,
      basis: ph.basis,
      pricePerFoot: cents((ph.item.stock[0]!.price / ph.item.stock[0]!.length) * 12),
    }));
  }
  return result;
}

/**
 * Boards to buy: the optimised counts plus the waste allowance, taken on the item's whole count and
 * rounded up to whole boards, all added at the longest length planned — a long board can stand in for a
 * short one, not the other way round (common practice).
 */
function withAllowance(perLength: Map<number, number>, wastePercent: number, item: PriceItemSnapshot) {
  const lengths = [...perLength.entries()].sort((a, b) => b[0] - a[0]);
  const total = lengths.reduce((t, [, n]) => t + n, 0);
  const extra = Math.ceil((total * wastePercent) / 100 - 1e-9);
  return lengths.map(([stockLength, count], i) => ({
    stockLength,
    count: count + (i === 0 ? extra : 0),
    price: item.stock.find((s) => s.length === stockLength)!.price,
  }));
}
