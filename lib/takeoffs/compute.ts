import { bidTotal, cutList, labourCost, labourMinutes, planStock, takeoffTotals, type Material, type TakeoffLine } from "@/takeoff";
import { MissingItem, pickItems } from "./pick-items";
import { summarizeMaterials } from "./summarize";
import type { BoardOrder, OpeningTypeResult, PriceItemSnapshot, TakeoffInputs, TakeoffPrices, TakeoffResult } from "./types";

export { MissingItem };

interface Group {
  item: PriceItemSnapshot;
  material: Material;
  width?: number;
  demand: Map<number, number>;
}

const cents = (x: number) => Math.round(x * 100) / 100;

/**
 * A whole takeoff from its snapshots: cut lists per opening type, totals per unit type and for the job,
 * board orders per price-book item (extensions per rip width), waste allowance, labour and the bid.
 * Pure: everything it needs is in `inputs` and `prices`, which is what makes a saved takeoff reproducible.
 */
export async function computeTakeoff(inputs: TakeoffInputs, prices: TakeoffPrices): Promise<TakeoffResult> {
  const override = inputs.casingItemId ? (prices.items.find((i) => i.id === inputs.casingItemId) ?? null) : null;
  if (inputs.casingItemId && !override) throw new MissingItem("The alternate casing is not in the price book.");

  const openingTypes: OpeningTypeResult[] = [];
  const lines: (TakeoffLine & { id: string })[] = [];
  const groups = new Map<string, Group>();
  for (const ot of inputs.openingTypes) {
    const spec = override ? { ...ot.trimSpec, casingWidth: override.faceWidth, casingThickness: override.thickness } : ot.trimSpec;
    const opening = { width: ot.width, height: ot.height, setback: ot.setback };
    const pieces = cutList(opening, spec);
    const quantity = inputs.counts.job[ot.id] ?? 0;
    const widthOf = (m: Material) => pieces.find((p) => p.material === m && p.width !== undefined)?.width;
    const items = pickItems(prices.items, ot.mark, spec, { stool: widthOf("stool"), extension: widthOf("extension") }, override);
    openingTypes.push({
      openingTypeId: ot.id,
      mark: ot.mark,
      quantity,
      spec,
      opening,
      cutList: pieces,
      items: Object.fromEntries(Object.entries(items).map(([m, i]) => [m, i!.id])),
    });
    if (quantity === 0) continue;
    lines.push({ id: ot.id, opening, spec, quantity });
    for (const piece of pieces) {
      const item = items[piece.material]!;
      const width = piece.material === "extension" ? piece.width : undefined;
      const key = `${item.id}|${piece.material}|${width ?? ""}`;
      const group = groups.get(key) ?? { item, material: piece.material, width, demand: new Map<number, number>() };
      group.demand.set(piece.length, (group.demand.get(piece.length) ?? 0) + piece.quantity * quantity);
      groups.set(key, group);
    }
  }

  const orders: BoardOrder[] = [];
  for (const g of groups.values()) {
    const demand = [...g.demand.entries()].sort((a, b) => b[0] - a[0]).map(([length, quantity]) => ({ length, quantity }));
    const plan = await planStock(demand, g.item.stock, { kerf: inputs.settings.kerf });
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
    });
  }

  const totalsFor = (count: (otId: string) => number) =>
    takeoffTotals(lines.map((l) => ({ ...l, quantity: count(l.id) })).filter((l) => l.quantity > 0));
  const materials = summarizeMaterials(orders);
  const materialCost = cents(materials.reduce((t, m) => t + m.cost + m.allowanceCost, 0));
  const labour = lines.length ? labourCost(lines, prices.labour) : 0;
  return {
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
