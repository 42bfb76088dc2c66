import { Fraction } from "../exact";
import { addUnique, type Column } from "./columns";
import { NO_DEADLINE, type Deadline } from "./budget";
import type { Instance } from "./instance";
import { boundedKnapsack } from "./knapsack";
import { HighsMaster } from "./highs-master";
import type { Highs } from "./highs-solver";
import { MasterLp } from "./simplex";

/** Duals are truncated to multiples of 2^-24 so knapsack sums are exact in binary floating point. */
const DUAL_SCALE = 2 ** 24;
/** Relative LP gap at which column generation stops: far below the 0.5 % plan target. */
export const LP_TOLERANCE = 2e-5;
/**
 * Weight on the best-bound duals when smoothing (Wentges 1997). An adaptive
 * weight in a simplified form of Pessoa, Sadykov, Uchoa & Vanderbeck (2018,
 * "Automation and combination of linear-programming based stabilization
 * techniques in column generation", INFORMS J. Computing 30) — up 0.1 when
 * the smoothed duals raise the bound, down 0.1 on a mispricing — was measured
 * here on 210 and 397 sizes and took 1.5–2× the time of this fixed weight, so
 * the fixed weight stays; the many columns a round (EXTRA_COLUMNS) are what
 * made the long runs converge.
 */
const SMOOTHING = 0.6;
/**
 * Extra patterns offered per round besides each board's best one: one per
 * demanded item, "this piece plus the best fill of the rest of the board",
 * read from the same knapsack table. With hundreds of sizes one column a round
 * tails off for hundreds of rounds; a few dozen good columns a round cut the
 * rounds several-fold (multiple pricing, common practice in column generation).
 */
const EXTRA_COLUMNS = 24;
/**
 * From this many demanded sizes the master goes to HiGHS: our dense-inverse
 * simplex costs O(m²) a pivot, and measured on 400 sizes it took ten times as
 * long as HiGHS; on job-sized masters it is as fast and needs no WebAssembly.
 */
const HIGHS_MASTER_ROWS = 100;
/** Only a guard against a defect: the time budget is what ends a long run. */
const SAFETY_ITERATIONS = 20_000;

export interface CgLimits {
  iterations: number;
  tolerance: number;
  deadline?: Deadline;
  /** Solve the master with HiGHS (large instances) rather than the built-in simplex. */
  highs?: Highs;
}

export interface Objective {
  /** Objective coefficient per stock item as the LP sees it. */
  cost: readonly number[];
  /** The same, exactly, for the proof of the bound. */
  exactCost: readonly Fraction[];
  /** Every integer plan's objective is a multiple of this (0 when unknown). */
  step: Fraction;
}

export interface CgResult {
  /** Restricted-master LP value of each column, in `columns` order. */
  x: Float64Array;
  objective: number;
  /** A proven lower bound on every integer plan's objective (before rounding to `step`). */
  bound: Fraction;
  /** The LP was solved to the tolerance (not stopped by the deadline or the iteration cap). */
  converged: boolean;
}

function roundUpTo(value: number, step: number): number {
  return step > 0 ? Math.ceil(value / step - 1e-9) * step : value;
}

function quantize(y: ArrayLike<number>): Float64Array {
  return Float64Array.from(y, (v) => (v > 0 ? Math.floor(v * DUAL_SCALE) / DUAL_SCALE : 0));
}

/**
 * Farley's bound (Farley 1990, "A note on bounding a class of linear
 * programming problems, including cutting stock problems", Operations
 * Research 38(5)): for any duals y ≥ 0 with K_s the best knapsack value of
 * board s, y·min_s(c_s/K_s) is dual feasible, so Σ d_i y_i · min_s c_s/K_s
 * bounds the LP and every integer plan. Computed here in exact rationals
 * from exactly-representable duals and an exact knapsack on the bound grid.
 */
export function provenBound(inst: Instance, demand: ArrayLike<number>, yq: Float64Array, objective: Objective): Fraction {
  const maxCap = Math.max(...inst.stocks.map((s) => s.capLb));
  const knap = boundedKnapsack(inst.items.map((it) => it.wLb), yq, demand, maxCap);
  let dual = 0n;
  for (let i = 0; i < inst.items.length; i++) dual += BigInt(demand[i] ?? 0) * BigInt(Math.round((yq[i] ?? 0) * DUAL_SCALE));
  if (dual === 0n) return new Fraction(0);
  let theta: Fraction | undefined;
  inst.stocks.forEach((s, k) => {
    const best = knap.value(s.capLb);
    if (best <= 0) return;
    const value = new Fraction(BigInt(Math.round(best * DUAL_SCALE)), BigInt(DUAL_SCALE));
    const ratio = (objective.exactCost[k] ?? new Fraction(0)).div(value);
    if (theta === undefined || ratio.lt(theta)) theta = ratio;
  });
  return theta === undefined ? new Fraction(0) : theta.mul(new Fraction(dual, BigInt(DUAL_SCALE)));
}

interface Pricing {
  /** Farley bound estimate at these duals (floating point; the proof is provenBound). */
  estimate: number;
  /** Best pattern per board whose value beats the board's cost at these duals. */
  patterns: Column[];
}

function patternValue(a: ArrayLike<number>, y: ArrayLike<number>): number {
  let value = 0;
  for (let i = 0; i < a.length; i++) if (a[i]) value += (a[i] ?? 0) * (y[i] ?? 0);
  return value;
}

function price(inst: Instance, demand: ArrayLike<number>, y: Float64Array, objective: Objective): Pricing {
  const maxCap = Math.max(...inst.stocks.map((s) => s.cap));
  const knap = boundedKnapsack(inst.items.map((it) => it.w), y, demand, maxCap);
  let theta = Infinity;
  const patterns: Column[] = [];
  const extras: { column: Column; gain: number }[] = [];
  inst.stocks.forEach((s, k) => {
    const best = knap.value(s.cap);
    const c = objective.cost[k] ?? 0;
    if (best > 0) theta = Math.min(theta, c / best);
    if (!(best > c * (1 + 1e-9) + 1e-12)) return;
    patterns.push({ stock: k, a: knap.counts(s.cap) });
    inst.items.forEach((it, i) => {
      if (!((y[i] ?? 0) > 0) || it.w > s.cap || (demand[i] ?? 0) <= 0) return;
      const a = knap.counts(s.cap - it.w);
      a[i] = Math.min((a[i] ?? 0) + 1, demand[i] ?? 0);
      const gain = patternValue(a, y) / Math.max(c, 1e-12);
      if (gain > 1 + 1e-9) extras.push({ column: { stock: k, a }, gain });
    });
  });
  extras.sort((p, q) => q.gain - p.gain);
  for (const e of extras.slice(0, EXTRA_COLUMNS)) patterns.push(e.column);
  let dual = 0;
  y.forEach((v, i) => (dual += v * (demand[i] ?? 0)));
  return { estimate: theta === Infinity ? 0 : theta * dual, patterns };
}

/** Pattern value at duals y exceeds its board's cost: it can improve the restricted LP. */
function improves(c: Column, y: ArrayLike<number>, objective: Objective): boolean {
  return patternValue(c.a, y) > (objective.cost[c.stock] ?? 0) * (1 + 1e-9) + 1e-12;
}

/**
 * Gilmore–Gomory column generation (Gilmore & Gomory 1961, "A linear
 * programming approach to the cutting-stock problem", Operations Research 9):
 * a revised simplex solves the restricted master LP and an exact knapsack
 * prices new patterns per board length from its duals. Duals are smoothed
 * toward those of the best bound so far (Wentges 1997, "Weighted Dantzig–Wolfe
 * decomposition", Int. Trans. Oper. Res. 4), falling back to the raw duals when the smoothed ones price out
 * nothing. Stops when no pattern prices out, LP and bound agree within the
 * tolerance, the bound rounded up to `step` reaches the LP value, or the
 * deadline passes (then `converged` is false and the bound is the best proven
 * so far). `columns` must hold a single-item pattern for every
 * demanded item; it grows in place.
 */
export function columnGeneration(
  inst: Instance,
  columns: Column[],
  keys: Set<string>,
  demand: ArrayLike<number>,
  objective: Objective,
  limits: CgLimits = { iterations: SAFETY_ITERATIONS, tolerance: LP_TOLERANCE },
): CgResult {
  let rows = 0;
  for (let i = 0; i < demand.length; i++) if ((demand[i] ?? 0) > 0) rows++;
  const lp = limits.highs && rows >= HIGHS_MASTER_ROWS ? new HighsMaster(limits.highs, demand) : new MasterLp(demand);
  try {
    return run(inst, lp, columns, keys, demand, objective, limits);
  } finally {
    if (lp instanceof HighsMaster) lp.dispose();
  }
}

function run(
  inst: Instance,
  lp: MasterLp | HighsMaster,
  columns: Column[],
  keys: Set<string>,
  demand: ArrayLike<number>,
  objective: Objective,
  limits: CgLimits,
): CgResult {
  const deadline = limits.deadline ?? NO_DEADLINE;
  for (const c of columns) lp.addColumn(objective.cost[c.stock] ?? 0, c.a);
  lp.crashBasis();
  const step = objective.step.valueOf();
  let center: Float64Array | undefined;
  let bestEstimate = -Infinity;
  for (let iteration = 0; ; iteration++) {
    const solution = lp.solve();
    const y = quantize(solution.y);
    let fresh: Column[] = [];
    for (const alpha of center ? [SMOOTHING, 0] : [0]) {
      const ya = alpha === 0 || !center ? y : quantize(y.map((v, i) => alpha * (center?.[i] ?? 0) + (1 - alpha) * v));
      const priced = price(inst, demand, ya, objective);
      if (priced.estimate > bestEstimate) {
        bestEstimate = priced.estimate;
        center = ya;
      }
      fresh = priced.patterns.filter((c) => improves(c, y, objective));
      if (fresh.length > 0) break;
    }
    const value = solution.objective;
    const converged =
      value - bestEstimate <= limits.tolerance * Math.max(1, Math.abs(value)) ||
      roundUpTo(bestEstimate, step) >= value - 1e-9 * Math.max(1, value);
    const before = columns.length;
    const stop = converged || iteration >= limits.iterations || deadline.expired();
    const nAdded = stop ? -1 : addUnique(columns, keys, fresh);
    if (stop || nAdded === 0) {
      const bound = center ? provenBound(inst, demand, center, objective) : new Fraction(0);
      return { x: solution.x, objective: value, bound, converged: !stop || converged };
    }
    for (const c of columns.slice(before)) lp.addColumn(objective.cost[c.stock] ?? 0, c.a);
  }
}
