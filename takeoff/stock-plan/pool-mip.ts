import { addUnique, capColumn, columnKey, type Column, type CountedColumn } from "./columns";
import type { Highs } from "./highs-solver";
import type { Instance } from "./instance";
import { patternMip, type MipResult } from "./master-mip";

/** Past this many pool patterns the MIP's own LP outgrows what the budget can buy; keep the plan we have. */
const POOL_LIMIT = 20_000;

/**
 * Price-and-branch: the integer program over every pattern column generation
 * produced (not over all patterns, so it proves nothing about the true
 * optimum by itself), solved by HiGHS within the time left. Its plan is proven
 * optimal only when it meets the column-generation bound, which HiGHS is told
 * as its objective target so it stops there. The best plan so far joins the
 * pool and is HiGHS's first incumbent, so the answer is never worse. The
 * method is the "restricted master heuristic" surveyed by Sadykov,
 * Vanderbeck, Pessoa, Tahiri & Uchoa (2019, "Primal heuristics for
 * branch-and-price: the assets of diving methods", INFORMS J. Computing 31).
 */
export function poolMip(
  highs: Highs,
  inst: Instance,
  pool: readonly Column[],
  best: readonly CountedColumn[],
  demand: readonly number[],
  costs: readonly number[],
  target: number | undefined,
  seconds: number,
): MipResult | undefined {
  const patterns: Column[] = [];
  const keys = new Set<string>();
  addUnique(patterns, keys, best);
  addUnique(patterns, keys, pool.map((c) => capColumn(c, demand)));
  if (patterns.length > POOL_LIMIT) return undefined;
  const index = new Map(patterns.map((p, j) => [columnKey(p), j]));
  const start = new Map<number, number>();
  for (const c of best) {
    const j = index.get(columnKey(c));
    if (j !== undefined) start.set(j, (start.get(j) ?? 0) + c.count);
  }
  return patternMip(highs, inst, patterns, demand, costs, { nodes: 1_000_000, seconds, target, start });
}
