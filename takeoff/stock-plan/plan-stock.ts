import { ceilToMultiple, gcdFractions, type Fraction } from "../exact";
import type { Demand, PlanOptions, StockItem, StockPlan } from "../types";
import { better, boardPatterns, finishPlan, planCost, planLength } from "./assemble";
import { columnGeneration, type Objective } from "./column-generation";
import { addUnique, homogeneousColumns, type Column } from "./columns";
import { loadHighs } from "./highs-solver";
import { fitDecreasing } from "./first-fit";
import { buildInstance, type Instance } from "./instance";
import { integerCosts, maximalPatterns, patternMip } from "./master-mip";
import { roundAndRepair } from "./round-repair";
import { trivialBounds } from "./trivial-bound";

/**
 * The whole-pattern MIP that proves an optimum is only tried on small
 * instances: at most 30 lengths, 600 pieces and 500 maximal patterns (HiGHS
 * then answers in well under a second; 2,000 patterns took up to 3 s when
 * measured). On job-sized demand one board over the bound is already far
 * inside the 0.5 % target. A 2 s limit guards the rare hard small case.
 */
const EXACT_PATTERN_LIMIT = 500;
const EXACT_ITEM_LIMIT = 30;
const EXACT_PIECE_LIMIT = 600;
const EXACT_MIP_LIMITS = { nodes: 20_000, seconds: 2 };
/** The length bound is a by-product; a looser LP keeps it cheap and still proven. */
const LENGTH_LIMITS = { iterations: 80, tolerance: 1e-4 };

const EMPTY: StockPlan = { boards: [], boardCount: 0, purchasedLength: 0, cost: 0, lowerBound: { length: 0, cost: 0 } };

function maxFraction(a: Fraction, b: Fraction): Fraction {
  return a.lt(b) ? b : a;
}

function objectives(inst: Instance): { cost: Objective; length: Objective } {
  return {
    cost: {
      cost: inst.stocks.map((s) => s.priceNum),
      exactCost: inst.stocks.map((s) => s.price),
      step: gcdFractions(inst.stocks.map((s) => s.price)),
    },
    length: {
      cost: inst.stocks.map((s) => s.lengthNum),
      exactCost: inst.stocks.map((s) => s.length),
      step: gcdFractions(inst.stocks.map((s) => s.length)),
    },
  };
}

/**
 * Column generation, rounding and repair; then, if the plan does not already
 * meet the bound and the instance is small, HiGHS solves the integer program
 * over every maximal pattern, which proves the optimum.
 */
async function solve(inst: Instance): Promise<StockPlan> {
  const demand = inst.items.map((it) => it.demand);
  if (demand.length === 0) return structuredClone(EMPTY);
  const objective = objectives(inst);
  const pool: Column[] = [];
  const keys = new Set<string>();
  addUnique(pool, keys, homogeneousColumns(inst, demand));

  const lp = columnGeneration(inst, pool, keys, demand, objective.cost);
  const trivial = trivialBounds(inst, demand, objective.cost.step, objective.length.step);
  let costBound = maxFraction(ceilToMultiple(lp.bound, objective.cost.step), trivial.cost);
  let best = finishPlan(inst, roundAndRepair(inst, pool, keys, lp.x, demand, objective.cost), demand);
  // The LP-rounded plan can lose to the simple rules when column generation stops early; never return worse.
  for (const rule of ["first", "best"] as const) {
    if (!planCost(inst, best).gt(costBound)) break;
    const packed = fitDecreasing(inst, demand, rule);
    const plan = packed && finishPlan(inst, packed, demand);
    if (plan && better(inst, plan, best)) best = plan;
  }

  const exactGrid = inst.items.every((it) => it.w === it.wLb) && inst.stocks.every((s) => s.cap === s.capLb);
  const pieces = demand.reduce((t, d) => t + d, 0);
  const small = exactGrid && inst.items.length <= EXACT_ITEM_LIMIT && pieces <= EXACT_PIECE_LIMIT;
  if (small && planCost(inst, best).gt(costBound)) {
    const patterns = maximalPatterns(inst, demand, EXACT_PATTERN_LIMIT);
    if (patterns) {
      const costs = integerCosts(inst, objective.cost.step, objective.length.step);
      const mip = patternMip(await loadHighs(), inst, patterns, demand, costs, EXACT_MIP_LIMITS);
      if (mip) {
        const plan = finishPlan(inst, mip.columns, demand);
        if (better(inst, plan, best)) best = plan;
        // Optimal over every maximal pattern on the exact grid: no plan costs less.
        const cost = planCost(inst, best);
        if (mip.optimal && objective.cost.step.n !== 0n && cost.gt(costBound)) costBound = cost;
      }
    }
  }

  const lengthLp = columnGeneration(inst, pool, keys, demand, objective.length, LENGTH_LIMITS);
  const lengthBound = maxFraction(ceilToMultiple(lengthLp.bound, objective.length.step), trivial.length);
  return {
    boards: boardPatterns(inst, best),
    boardCount: best.reduce((t, c) => t + c.count, 0),
    purchasedLength: planLength(inst, best).valueOf(),
    cost: planCost(inst, best).valueOf(),
    lowerBound: { length: lengthBound.valueOf(), cost: costBound.valueOf() },
  };
}

/**
 * Board order for one material: which stock lengths to buy and how to cut
 * each. Minimises cost, then purchased length; reports proven lower bounds on
 * both. Bad input throws at once (synchronously); the plan itself comes back
 * as a Promise because the HiGHS WebAssembly, needed to prove small instances
 * optimal, loads asynchronously.
 */
export function planStock(demand: readonly Demand[], stock: readonly StockItem[], opts: PlanOptions): Promise<StockPlan> {
  return solve(buildInstance(demand, stock, opts));
}
