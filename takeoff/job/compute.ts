import { exact, roundToCents, toNumber } from "../exact";
import { bidTotal, labourCost, labourMinutes } from "../pricing";
import { takeoffTotals } from "../totals";
import type { CutPiece, Material, Opening, TakeoffLine, TrimSpec } from "../types";
import { openingOf } from "./opening-of";
import { orderBoards } from "./board-orders";
import { MissingItem, OpeningTypeProblem, PriceGaps } from "./errors";
import { materialCost, summarizeMaterials } from "./materials";
import { PlanBudget, planningSummary, runPlanSeconds } from "./plan-budget";
import { assessOpeningType, placeholderFor, placeholdersFor, type PriceGap } from "./price-gaps";
import type { OpeningTypeResult, PriceItemSnapshot, TakeoffInputs, TakeoffPrices, TakeoffResult } from "./types";

interface Planned {
  id: string;
  mark: string;
  quantity: number;
  spec: TrimSpec;
  opening: Opening;
  pieces: CutPiece[];
  items: Partial<Record<Material, PriceItemSnapshot>>;
  gaps: PriceGap[];
  width: number;
  height: number;
  setback: number;
}

/** How a run is watched; the engine needs none of it. */
export interface RunOptions {
  /** Millisecond clock for the planning budget; default performance.now. */
  now?: () => number;
  /** Told the wall-clock milliseconds spent planning board orders (benchmarks report it). */
  onPlanned?: (ms: number) => void;
}

/**
 * A whole takeoff from its snapshots: cut lists per opening type, totals per unit type and for the job,
 * board orders per price-book item (extensions of every rip width together), waste allowance, labour and
 * the bid. Everything it needs is in `inputs` and `prices`, which is what makes a saved takeoff
 * reproducible — except time: planning shares `settings.planSeconds` over the orders, and an order whose
 * share runs out keeps the best plan found (result.planning says whether any did). Crosscuts take
 * `settings.kerf`, rips `settings.ripKerf` (absent: the same kerf).
 * Refuses, naming the opening type, a window that cannot be cut; refuses a price-book gap unless
 * `inputs.allowPlaceholders`, in which case the gap is priced with a named placeholder.
 */
export async function computeTakeoff(inputs: TakeoffInputs, prices: TakeoffPrices, run: RunOptions = {}): Promise<TakeoffResult> {
  const override = inputs.casingItemId ? (prices.items.find((i) => i.id === inputs.casingItemId) ?? null) : null;
  if (inputs.casingItemId && !override) throw new MissingItem("The alternate casing is not in the price book.");
  const { kerf, wastePercent } = inputs.settings;

  const planned: Planned[] = inputs.openingTypes.map((ot) => {
    const a = assessOpeningType(ot, prices, kerf, override, inputs.settings.scarfOverlap);
    if (!a.ok) throw new OpeningTypeProblem(ot.mark, a.problem.field, `${ot.mark}: ${a.problem.message}`);
    const opening = openingOf(ot);
    const size = { width: ot.width, height: ot.height, setback: ot.setback };
    return { id: ot.id, mark: ot.mark, quantity: inputs.counts.job[ot.id] ?? 0, spec: a.spec, opening, ...size, pieces: a.pieces, items: a.picked, gaps: a.gaps };
  });
  // Only windows in the job need prices: an untagged type's gap does not stop the run.
  const gaps = planned.filter((p) => p.quantity > 0).flatMap((p) => p.gaps);
  if (gaps.length > 0 && !inputs.allowPlaceholders) throw new PriceGaps(gaps);
  const placeholders = placeholdersFor(gaps, prices, kerf);
  for (const p of planned) {
    if (p.quantity === 0) continue;
    for (const g of p.gaps) p.items[g.material] = placeholderFor(placeholders, g)!.item;
  }

  const openingTypes: OpeningTypeResult[] = planned.map((p) => ({
    openingTypeId: p.id,
    mark: p.mark,
    quantity: p.quantity,
    spec: p.spec,
    opening: { width: p.width, height: p.height, setback: p.setback },
    ...(p.opening.kind && p.opening.kind !== "window" ? { kindOpening: p.opening } : {}),
    cutList: p.pieces,
    items: Object.fromEntries(Object.entries(p.items).map(([m, i]) => [m, i!.id])),
  }));
  const inJob = planned.filter((p) => p.quantity > 0);
  const lines: (TakeoffLine & { id: string })[] = inJob.map((p) => ({ id: p.id, opening: p.opening, spec: p.spec, quantity: p.quantity }));
  const isPlaceholder = new Set([...placeholders.values()].map((ph) => ph.item.id));
  const now = run.now ?? (() => performance.now());
  const budget = new PlanBudget(runPlanSeconds(inputs.settings.planSeconds), now);
  const planStart = now();
  const ripKerf = inputs.settings.ripKerf ?? kerf;
  const orders = await orderBoards(inJob, { kerf, ripKerf, wastePercent, placeholders: isPlaceholder, budget });
  run.onPlanned?.(now() - planStart);

  const totalsFor = (count: (otId: string) => number) =>
    takeoffTotals(lines.map((l) => ({ ...l, quantity: count(l.id) })).filter((l) => l.quantity > 0));
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
    materials: summarizeMaterials(orders),
    labourMinutes: lines.length ? labourMinutes(lines, prices.labour) : 0,
    bid: bidTotal({ material: materialCost(orders), labour }, { markup: prices.markup, taxRate: prices.taxRate, taxLabour: prices.taxLabour }),
    planning: planningSummary(orders, budget.seconds),
  };
  if (placeholders.size > 0) {
    result.placeholders = [...placeholders.values()].map((ph) => {
      const stock = ph.item.stock[0]!;
      return {
        itemId: ph.item.id,
        itemName: ph.item.name,
        material: ph.material,
        marks: ph.marks,
        gaps: ph.gaps,
        basis: ph.basis,
        pricePerFoot: toNumber(roundToCents(exact(stock.price).div(exact(stock.length)).mul(12))),
      };
    });
  }
  return result;
}
