import { Fraction } from "../exact";
import { addUnique, type Column } from "./columns";
import type { Highs } from "./highs-solver";
import { OPTIMAL } from "./highs-solver";
import type { Instance } from "./instance";
import { boundedKnapsack } from "./knapsack";

/** Duals are truncated to multiples of 2^-24 so knapsack sums are exact in binary floating point. */
const DUAL_SCALE = 2 ** 24;

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
}

function roundUpTo(value: number, step: number): number {
  return step > 0 ? Math.ceil(value / step - 1e-9) * step : value;
}

/**
 * Farley's bound (Farley 1990, "A note on bounding a class of linear
 * programming problems, including cutting stock problems", Operations
 * Research 38(5)): for any duals y ≥ 0 with K_s the best knapsack value of
 * board s, y·min_s(c_s/K_s) is dual feasible, so Σ d_i y_i · min_s c_s/K_s
 * bounds the LP and every integer plan. Computed here in exact rationals
 * from exactly-representable duals and an exact knapsack on the bound grid.
 */
function provenBound(inst: Instance, demand: ArrayLike<number>, yq: Float64Array, objective: Objective): Fraction {
  const items = inst.items;
  const maxCap = Math.max(...inst.stocks.map((s) => s.capLb));
  const knap = boundedKnapsack(items.map((it) => it.wLb), yq, demand, maxCap);
  let dual = 0n;
  items.forEach((_, i) => {
    dual += BigInt(demand[i] ?? 0) * BigInt(Math.round((yq[i] ?? 0) * DUAL_SCALE));
  });
  if (dual === 0n) return new Fraction(0);
  let theta: Fraction | undefined;
  inst.stocks.forEach((s, k) => {
    const best = knap.value(s.capLb);
    if (best <= 0) return;
    const ratio = (objective.exactCost[k] ?? new Fraction(0)).div(new Fraction(BigInt(Math.round(best * DUAL_SCALE)), BigInt(DUAL_SCALE)));
    if (theta === undefined || ratio.lt(theta)) theta = ratio;
  });
  return theta === undefined ? new Fraction(0) : theta.mul(new Fraction(dual, BigInt(DUAL_SCALE)));
}

/**
 * Gilmore–Gomory column generation (Gilmore & Gomory 1961, "A linear
 * programming approach to the cutting-stock problem", Operations Research 9):
 * the HiGHS simplex solves the restricted master LP, an exact bounded knapsack
 * prices new patterns per board length from the row duals. Stops when no
 * pattern prices out or the rounded bound meets the LP value (no further
 * pattern could raise the bound a plan must respect). `columns` grows in place.
 */
export function columnGeneration(
  highs: Highs,
  inst: Instance,
  columns: Column[],
  keys: Set<string>,
  demand: ArrayLike<number>,
  objective: Objective,
  maxIterations = 400,
): CgResult {
  const items = inst.items;
  const model = highs.createModel();
  try {
    model.options.set({ output_flag: false });
    items.forEach((_, i) => model.addRow(demand[i] ?? 0, highs.infinity, { indices: [], values: [] }));
    const addColumn = (c: Column) => {
      const indices: number[] = [];
      const values: number[] = [];
      c.a.forEach((v, i) => {
        if (v > 0) {
          indices.push(i);
          values.push(v);
        }
      });
      model.addCol(objective.cost[c.stock] ?? 0, 0, highs.infinity, { indices, values });
    };
    columns.forEach(addColumn);
    const step = objective.step.valueOf();
    const weights = items.map((it) => it.w);
    const maxCap = Math.max(...inst.stocks.map((s) => s.cap));
    let bestY = new Float64Array(items.length);
    let bestEstimate = -Infinity;
    let lp = 0;
    for (let iteration = 0; ; iteration++) {
      const status = model.run().modelStatus;
      if (status !== OPTIMAL) throw new Error(`stock plan: HiGHS LP ended with status ${status}`);
      lp = model.getObjectiveValue();
      const y = model.getSolution().rowDual;
      const yq = Float64Array.from(y, (v) => (v > 0 ? Math.floor(v * DUAL_SCALE) / DUAL_SCALE : 0));
      const knap = boundedKnapsack(weights, yq, demand, maxCap);
      let theta = Infinity;
      const fresh: Column[] = [];
      inst.stocks.forEach((s, k) => {
        const best = knap.value(s.cap);
        const c = objective.cost[k] ?? 0;
        if (best > 0) theta = Math.min(theta, c / best);
        if (best > c * (1 + 1e-9) + 1e-12) fresh.push({ stock: k, a: knap.counts(s.cap) });
      });
      let dual = 0;
      yq.forEach((v, i) => (dual += v * (demand[i] ?? 0)));
      const estimate = theta === Infinity ? 0 : theta * dual;
      if (estimate > bestEstimate) {
        bestEstimate = estimate;
        bestY = yq;
      }
      const converged = lp - bestEstimate <= 1e-9 * Math.max(1, Math.abs(lp)) || roundUpTo(bestEstimate, step) >= lp - 1e-9 * Math.max(1, lp);
      if (converged || iteration >= maxIterations) break;
      const before = columns.length;
      if (addUnique(columns, keys, fresh) === 0) break;
      columns.slice(before).forEach(addColumn);
    }
    const x = Float64Array.from(model.getSolution().colValue);
    return { x, objective: lp, bound: provenBound(inst, demand, bestY, objective) };
  } finally {
    model.dispose();
  }
}
