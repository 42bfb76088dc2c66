import type { Fraction } from "../exact";
import type { Column, CountedColumn } from "./columns";
import type { Highs } from "./highs-solver";
import { OPTIMAL } from "./highs-solver";
import type { Instance } from "./instance";

export interface MipResult {
  columns: CountedColumn[];
  /** HiGHS proved this the best integer choice over the given patterns. */
  optimal: boolean;
}

export interface MipLimits {
  nodes: number;
  seconds: number;
  /** Stop as soon as a plan of at most this objective is found (it meets the proven bound). */
  target?: number;
  /** A known plan over these patterns (pattern index → boards), handed to HiGHS as its first incumbent. */
  start?: ReadonlyMap<number, number>;
}

/**
 * Integer objective per board for the whole-pattern MIP: price in units of
 * the prices' gcd (cents or coarser), exact, so HiGHS can use the integrality
 * of the objective to close its gap; purchased length when every board is free.
 * Length as a tie-break stays with the re-stocking in finishPlan: folding it
 * into the objective makes it fractional and the proof far slower.
 */
export function integerCosts(inst: Instance, costStep: Fraction, lengthStep: Fraction): number[] {
  const free = costStep.n === 0n;
  const step = free ? lengthStep : costStep;
  return inst.stocks.map((s) => {
    const v = free ? s.length : s.price;
    const q = v.div(step);
    if (q.d !== 1n) throw new Error("stock plan: objective is not a whole multiple of its step");
    return Number(q.n);
  });
}

/**
 * Integer program over a fixed set of patterns (each a column, integer board
 * counts, demand rows ≥ d), solved by HiGHS branch-and-cut. Returns undefined
 * when no integer plan was found within the limits.
 */
export function patternMip(
  highs: Highs,
  inst: Instance,
  patterns: readonly Column[],
  demand: ArrayLike<number>,
  costs: readonly number[],
  limits: MipLimits,
): MipResult | undefined {
  const n = inst.items.length;
  const starts = [0];
  const indices: number[] = [];
  const values: number[] = [];
  const upper: number[] = [];
  for (const p of patterns) {
    let most = 0;
    p.a.forEach((v, i) => {
      if (v <= 0) return;
      indices.push(i);
      values.push(v);
      most = Math.max(most, Math.ceil((demand[i] ?? 0) / v));
    });
    starts.push(indices.length);
    upper.push(most);
  }
  const model = highs.createModel({
    numCols: patterns.length,
    numRows: n,
    colCost: patterns.map((p) => costs[p.stock] ?? 0),
    colLower: patterns.map(() => 0),
    colUpper: upper,
    rowLower: Array.from({ length: n }, (_, i) => demand[i] ?? 0),
    rowUpper: Array.from({ length: n }, () => highs.infinity),
    matrix: { format: "csc", numRows: n, numCols: patterns.length, starts, indices, values },
    integrality: patterns.map(() => highs.constants.variableType.integer),
  });
  try {
    model.options.set({
      output_flag: false,
      mip_rel_gap: 0,
      mip_max_nodes: limits.nodes,
      time_limit: limits.seconds,
      ...(limits.target === undefined ? {} : { objective_target: limits.target }),
    });
    if (limits.start) {
      const start = limits.start;
      model.setSolution({ colValue: patterns.map((_, j) => start.get(j) ?? 0) });
    }
    const status = model.run().modelStatus;
    const x = model.getSolution().colValue;
    const columns: CountedColumn[] = [];
    patterns.forEach((p, j) => {
      const count = Math.round(x[j] ?? 0);
      if (count > 0) columns.push({ ...p, count });
    });
    // Accept only a complete plan: on a limit HiGHS may stop without one.
    const covered = inst.items.every(
      (_, i) => columns.reduce((t, c) => t + (c.a[i] ?? 0) * c.count, 0) >= (demand[i] ?? 0),
    );
    return covered ? { columns, optimal: status === OPTIMAL } : undefined;
  } finally {
    model.dispose();
  }
}

/**
 * Every maximal pattern (no further demanded piece fits) of every board, or
 * undefined past `limit` patterns. A plan never needs a non-maximal pattern:
 * filling it costs nothing and surplus pieces are dropped afterwards, so a MIP
 * over these patterns finds the true optimum.
 */
export function maximalPatterns(inst: Instance, demand: ArrayLike<number>, limit: number): Column[] | undefined {
  const n = inst.items.length;
  const w = inst.items.map((it) => it.w);
  const out: Column[] = [];
  const a = new Int32Array(n);
  let overflow = false;
  let steps = 0;
  const visit = (stock: number, i: number, room: number) => {
    if (overflow) return;
    if (++steps > limit * 50) overflow = true;
    if (i === n) {
      for (let j = 0; j < n; j++) if ((a[j] ?? 0) < (demand[j] ?? 0) && (w[j] ?? Infinity) <= room) return;
      if (a.some((v) => v > 0)) out.push({ stock, a: Int32Array.from(a) });
      if (out.length > limit) overflow = true;
      return;
    }
    const wi = w[i] ?? 1;
    const most = Math.min(demand[i] ?? 0, wi > 0 ? Math.floor(room / wi) : (demand[i] ?? 0));
    for (let k = most; k >= 0; k--) {
      a[i] = k;
      visit(stock, i + 1, room - k * wi);
      if (overflow) break;
    }
    a[i] = 0;
  };
  inst.stocks.forEach((s, stock) => visit(stock, 0, s.cap));
  return overflow ? undefined : out;
}
