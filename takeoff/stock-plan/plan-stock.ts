import { ceilToMultiple, gcdFractions } from "../exact";
import type { Demand, PlanOptions, StockItem, StockPlan } from "../types";
import { better, boardPatterns, finishPlan, planCost, planLength } from "./assemble";
import { columnGeneration, type Objective } from "./column-generation";
import { addUnique, capColumn, homogeneousColumns, type Column, type CountedColumn } from "./columns";
import { firstFitDecreasing } from "./greedy";
import { loadHighs, type Highs } from "./highs-solver";
import { buildInstance, type Instance } from "./instance";
import { lexicographicCosts, maximalPatterns, patternMip } from "./master-mip";

/** Past this many maximal patterns an instance is job-sized: no whole-pattern MIP. */
const EXACT_PATTERN_LIMIT = 4000;

/**
 * Rounds the LP plan down to whole boards and covers what is left (at most a
 * few boards per fractional pattern) by a small column generation and an
 * integer program over its patterns; first-fit decreasing if that fails.
 */
function roundAndRepair(
  highs: Highs,
  inst: Instance,
  columns: readonly Column[],
  x: Float64Array,
  demand: readonly number[],
  objective: Objective,
  lex: readonly number[],
): CountedColumn[] {
  const base: CountedColumn[] = [];
  const residual = [...demand];
  columns.forEach((c, j) => {
    const count = Math.floor((x[j] ?? 0) + 1e-6);
    if (count <= 0) return;
    base.push({ ...c, count });
    c.a.forEach((v, i) => (residual[i] = (residual[i] ?? 0) - v * count));
  });
  for (let i = 0; i < residual.length; i++) residual[i] = Math.max(0, residual[i] ?? 0);
  if (residual.every((r) => r === 0)) return finishPlan(inst, base, demand);
  const resColumns: Column[] = [];
  const resKeys = new Set<string>();
  addUnique(resColumns, resKeys, homogeneousColumns(inst, residual));
  addUnique(resColumns, resKeys, columns.map((c) => capColumn(c, residual)));
  columnGeneration(highs, inst, resColumns, resKeys, residual, objective);
  const mip = patternMip(highs, inst, resColumns, residual, lex, { nodes: 400, seconds: 0.5 });
  const rest = mip?.columns ?? firstFitDecreasing(inst, residual);
  return finishPlan(inst, [...base, ...rest], demand);
}

function solve(highs: Highs, inst: Instance): StockPlan {
  const demand = inst.items.map((it) => it.demand);
  if (demand.length === 0) {
    return { boards: [], boardCount: 0, purchasedLength: 0, cost: 0, lowerBound: { length: 0, cost: 0 } };
  }
  const costObjective: Objective = {
    cost: inst.stocks.map((s) => s.priceNum),
    exactCost: inst.stocks.map((s) => s.price),
    step: gcdFractions(inst.stocks.map((s) => s.price)),
  };
  const lengthObjective: Objective = {
    cost: inst.stocks.map((s) => s.lengthNum),
    exactCost: inst.stocks.map((s) => s.length),
    step: gcdFractions(inst.stocks.map((s) => s.length)),
  };
  const lex = lexicographicCosts(inst, demand, costObjective.step.valueOf());
  const columns: Column[] = [];
  const keys = new Set<string>();
  addUnique(columns, keys, homogeneousColumns(inst, demand));

  const lp = columnGeneration(highs, inst, columns, keys, demand, costObjective);
  let costBound = ceilToMultiple(lp.bound, costObjective.step);
  let best = roundAndRepair(highs, inst, columns, lp.x, demand, costObjective, lex);

  if (planCost(inst, best).gt(costBound)) {
    const exactGrid = inst.items.every((it) => it.w === it.wLb) && inst.stocks.every((s) => s.cap === s.capLb);
    const patterns = exactGrid ? maximalPatterns(inst, demand, EXACT_PATTERN_LIMIT) : undefined;
    // Small instance: a MIP over every maximal pattern is the true optimum when HiGHS proves it.
    const mip = patterns
      ? patternMip(highs, inst, patterns, demand, lex, { nodes: 20_000, seconds: 5 })
      : patternMip(highs, inst, columns, demand, lex, { nodes: 300, seconds: 0.5 });
    if (mip) {
      const plan = finishPlan(inst, mip.columns, demand);
      if (better(inst, plan, best)) best = plan;
      const cost = planCost(inst, best);
      if (patterns && mip.optimal && cost.gt(costBound)) costBound = cost;
    }
  }

  const lengthLp = columnGeneration(highs, inst, columns, keys, demand, lengthObjective);
  const lengthBound = ceilToMultiple(lengthLp.bound, lengthObjective.step);
  const boards = boardPatterns(inst, best);
  return {
    boards,
    boardCount: best.reduce((t, c) => t + c.count, 0),
    purchasedLength: planLength(inst, best).valueOf(),
    cost: planCost(inst, best).valueOf(),
    lowerBound: { length: lengthBound.valueOf(), cost: costBound.valueOf() },
  };
}

/**
 * Board order for one material: which stock lengths to buy and how to cut
 * each. Minimises cost, then purchased length; reports a proven lower bound on
 * both. Bad input throws at once; the solve itself is asynchronous because the
 * HiGHS WebAssembly loads asynchronously the first time.
 */
export function planStock(demand: readonly Demand[], stock: readonly StockItem[], opts: PlanOptions): Promise<StockPlan> {
  const inst = buildInstance(demand, stock, opts);
  return loadHighs().then((highs) => solve(highs, inst));
}
