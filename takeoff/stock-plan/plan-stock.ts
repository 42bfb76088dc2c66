import { ceilToMultiple, gcdFractions, type Fraction } from "../exact";
import type { Demand, PlanOptions, StockItem, StockPlan } from "../types";
import { better, boardPatterns, finishPlan, planCost, planLength } from "./assemble";
import { Deadline } from "./budget";
import { columnGeneration, LP_TOLERANCE, type Objective } from "./column-generation";
import { addUnique, homogeneousColumns, type Column, type CountedColumn } from "./columns";
import { loadHighs, type Highs } from "./highs-solver";
import { fitDecreasing } from "./first-fit";
import { buildInstance, type Instance } from "./instance";
import { integerCosts, maximalPatterns, patternMip } from "./master-mip";
import { poolMip } from "./pool-mip";
import { diveResidual, packRest, roundDown } from "./round-repair";
import { trivialBounds } from "./trivial-bound";

/**
 * Wall-clock budget of one planStock call when the caller names none. A job
 * plans one call per material, and a job-sized call finishes in well under a
 * second; 5 s lets column generation converge on several hundred distinct
 * sizes and leaves time for the pool MIP, while a page that plans a few
 * materials still answers within tens of seconds at worst.
 */
export const DEFAULT_PLAN_BUDGET_MS = 5000;
/**
 * Shares of the budget (measured from the start of the call) after which each
 * step no longer starts new work: the cost LP, then rounding, then the MIPs;
 * the rest is kept for the length bound, which has the trivial bound to fall
 * back on.
 */
const SHARE = { lp: 0.45, rounding: 0.6, mip: 0.9 };

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
/** Below this the MIP over the pool is not started: HiGHS needs some time to be of use. */
const MIN_MIP_SECONDS = 0.05;
/** Time for the MIP over the residual after rounding down; it is usually done in tens of milliseconds. */
const RESIDUAL_MIP_SECONDS = 1;

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

/** Better of first- and best-fit decreasing: the floor every plan must at least match. */
function simpleRules(inst: Instance, demand: readonly number[]): CountedColumn[] {
  let best: CountedColumn[] | undefined;
  for (const rule of ["first", "best"] as const) {
    const packed = fitDecreasing(inst, demand, rule);
    const plan = packed && finishPlan(inst, packed, demand);
    if (plan && better(inst, plan, best)) best = plan;
  }
  if (!best) throw new Error("stock plan: first-fit decreasing found no plan");
  return best;
}

/**
 * First/best-fit decreasing, then column generation for the bound and LP,
 * rounding with residual re-solves, the exact whole-pattern MIP where it
 * fits, and the MIP over the generated pool — each step only while the plan
 * is above the bound and the budget lasts. Every step keeps the better plan,
 * so the answer is complete and never worse than first-fit decreasing.
 */
async function solve(inst: Instance, budgetMs: number): Promise<StockPlan> {
  const demand = inst.items.map((it) => it.demand);
  if (demand.length === 0) return { ...structuredClone(EMPTY), proof: "optimal", budgetSpent: false };
  const start = performance.now();
  const deadline = new Deadline(budgetMs);
  const until = (share: number) => new Deadline(Math.max(0, start + budgetMs * share - performance.now()));
  const highs = await loadHighs();
  const objective = objectives(inst);
  const trivial = trivialBounds(inst, demand, objective.cost.step, objective.length.step);
  let best = simpleRules(inst, demand);
  let costBound = trivial.cost;
  const open = () => planCost(inst, best).gt(costBound);
  const pool: Column[] = [];
  const keys = new Set<string>();
  addUnique(pool, keys, homogeneousColumns(inst, demand));

  let cut = false;

  if (open()) {
    const lpDeadline = until(SHARE.lp);
    const lp = columnGeneration(inst, pool, keys, demand, objective.cost, { iterations: 20_000, tolerance: LP_TOLERANCE, deadline: lpDeadline, highs });
    cut ||= lpDeadline.spent;
    costBound = maxFraction(ceilToMultiple(lp.bound, objective.cost.step), trivial.cost);
    if (open()) {
      const { base, residual } = roundDown(pool, lp.x, demand);
      const roundDeadline = until(SHARE.rounding);
      const dived = finishPlan(inst, [...base, ...diveResidual(inst, pool, keys, residual, objective.cost, { deadline: roundDeadline, highs })], demand);
      cut ||= roundDeadline.spent;
      if (better(inst, dived, best)) best = dived;
      const costs = integerCosts(inst, objective.cost.step, objective.length.step);
      // The residual is a few boards' worth: a MIP over the pool restricted to it is small and quick.
      const seconds = Math.min(RESIDUAL_MIP_SECONDS, (start + budgetMs * SHARE.rounding - performance.now()) / 1000);
      if (open() && seconds >= MIN_MIP_SECONDS && residual.some((r) => r > 0)) {
        const mip = poolMip(highs, inst, pool, packRest(inst, residual), residual, costs, undefined, seconds);
        const plan = mip && finishPlan(inst, [...base, ...mip.columns], demand);
        if (plan && better(inst, plan, best)) best = plan;
      }
    }
  }
  if (open()) ({ best, costBound, cut } = await exactMip(inst, demand, objective, best, costBound, cut, highs, start + budgetMs * SHARE.mip));
  if (open()) {
    const seconds = (start + budgetMs * SHARE.mip - performance.now()) / 1000;
    if (seconds >= MIN_MIP_SECONDS) {
      const costs = integerCosts(inst, objective.cost.step, objective.length.step);
      const target = costTarget(objective.cost.step, costBound);
      const mip = poolMip(highs, inst, pool, best, demand, costs, target, seconds);
      if (mip) {
        const plan = finishPlan(inst, mip.columns, demand);
        if (better(inst, plan, best)) best = plan;
      }
      // Stopped short of both the bound and a proof over the pool: the time limit ended it.
      if (open() && !mip?.optimal) cut = true;
    } else cut = true;
  }

  const lengthDeadline = deadline;
  const lengthLp = columnGeneration(inst, pool, keys, demand, objective.length, { ...LENGTH_LIMITS, deadline: lengthDeadline, highs });
  cut ||= lengthDeadline.spent;
  const lengthBound = maxFraction(ceilToMultiple(lengthLp.bound, objective.length.step), trivial.length);
  return {
    boards: boardPatterns(inst, best),
    boardCount: best.reduce((t, c) => t + c.count, 0),
    purchasedLength: planLength(inst, best).valueOf(),
    cost: planCost(inst, best).valueOf(),
    lowerBound: { length: lengthBound.valueOf(), cost: costBound.valueOf() },
    proof: open() ? "best-found" : "optimal",
    budgetSpent: cut,
  };
}

/** The bound in the MIP's integer objective units (see integerCosts); none when boards are free. */
function costTarget(costStep: Fraction, costBound: Fraction): number | undefined {
  return costStep.n === 0n ? undefined : Math.round(costBound.div(costStep).valueOf());
}

/**
 * On small instances on the exact grid, HiGHS over every maximal pattern:
 * optimal there means optimal outright, which raises the bound to the plan.
 */
async function exactMip(
  inst: Instance,
  demand: readonly number[],
  objective: { cost: Objective; length: Objective },
  best: CountedColumn[],
  costBound: Fraction,
  cut: boolean,
  highs: Highs,
  endMs: number,
): Promise<{ best: CountedColumn[]; costBound: Fraction; cut: boolean }> {
  const exactGrid = inst.items.every((it) => it.w === it.wLb) && inst.stocks.every((s) => s.cap === s.capLb);
  const pieces = demand.reduce((t, d) => t + d, 0);
  const small = exactGrid && inst.items.length <= EXACT_ITEM_LIMIT && pieces <= EXACT_PIECE_LIMIT;
  if (!small) return { best, costBound, cut };
  const patterns = maximalPatterns(inst, demand, EXACT_PATTERN_LIMIT);
  if (!patterns) return { best, costBound, cut };
  const seconds = Math.min(EXACT_MIP_LIMITS.seconds, (endMs - performance.now()) / 1000);
  if (seconds < MIN_MIP_SECONDS) return { best, costBound, cut: true };
  const costs = integerCosts(inst, objective.cost.step, objective.length.step);
  const mip = patternMip(highs, inst, patterns, demand, costs, { ...EXACT_MIP_LIMITS, seconds });
  if (!mip) return { best, costBound, cut };
  const plan = finishPlan(inst, mip.columns, demand);
  if (better(inst, plan, best)) best = plan;
  // Optimal over every maximal pattern on the exact grid: no plan costs less.
  const cost = planCost(inst, best);
  if (mip.optimal && objective.cost.step.n !== 0n && cost.gt(costBound)) costBound = cost;
  return { best, costBound, cut };
}

/**
 * Board order for one material: which stock lengths to buy and how to cut
 * each. Minimises cost, then purchased length; reports proven lower bounds on
 * both, whether the plan meets the cost bound (`proof`), and whether the time
 * budget (`opts.budgetMs`, default DEFAULT_PLAN_BUDGET_MS) cut the search
 * short (`budgetSpent`). Steps poll the clock between units of work, so a
 * call may overrun its budget by about one simplex solve or knapsack. Bad
 * input throws at once (synchronously); the plan itself comes back as a
 * Promise because the HiGHS WebAssembly loads asynchronously.
 */
export function planStock(demand: readonly Demand[], stock: readonly StockItem[], opts: PlanOptions): Promise<StockPlan> {
  const budgetMs = opts.budgetMs ?? DEFAULT_PLAN_BUDGET_MS;
  if (typeof budgetMs !== "number" || !(budgetMs > 0)) {
    throw new Error(`opts.budgetMs: must be a positive number of milliseconds, got ${String(opts.budgetMs)}`);
  }
  return solve(buildInstance(demand, stock, opts), budgetMs);
}
