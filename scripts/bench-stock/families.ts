import { prng } from "@/lib/prng";
import type { Demand } from "@/takeoff";

/**
 * Instance families for the stock-planning benchmark, generated here from the published generators'
 * descriptions (no instance files are copied). One stock length per instance, priced by its length, no
 * kerf: the classic one-dimensional bin-packing / cutting-stock setting. Sizes are whole units; `optimum`
 * is known by construction where the family allows it.
 */
export interface Instance {
  family: string;
  name: string;
  stockLength: number;
  demand: Demand[];
  /** Boards an optimal plan needs, when the construction proves it; else undefined. */
  optimum?: number;
}

const tally = (sizes: number[]): Demand[] => {
  const by = new Map<number, number>();
  for (const s of sizes) by.set(s, (by.get(s) ?? 0) + 1);
  return [...by.entries()].sort((a, b) => b[0] - a[0]).map(([length, quantity]) => ({ length, quantity }));
};

/**
 * Uniform class after Falkenauer (1996, "A hybrid grouping genetic algorithm for bin packing", J. Heuristics
 * 2:5–30): bin capacity 150, item sizes uniform on [20, 100] (from memory of the paper's description).
 */
export function uniform(n: number, seed: number): Instance {
  const rand = prng(seed);
  const sizes = Array.from({ length: n }, () => 20 + Math.floor(rand() * 81));
  return { family: `uniform u${n}`, name: `u${n}-${seed}`, stockLength: 150, demand: tally(sizes) };
}

/**
 * Triplet class after Falkenauer (1996): capacity 1000, every bin of the optimum holds exactly three items
 * summing to 1000, so the optimum is n/3 by construction. Generation as described there (from memory):
 * the first item uniform on [380, 490], the second on [250, 1000 − first − 250], the third the rest.
 */
export function triplet(triples: number, seed: number): Instance {
  const rand = prng(seed);
  const sizes: number[] = [];
  for (let i = 0; i < triples; i++) {
    const a = 380 + Math.floor(rand() * 111);
    const b = 250 + Math.floor(rand() * (1000 - a - 500 + 1));
    sizes.push(a, b, 1000 - a - b);
  }
  return { family: `triplet t${triples * 3}`, name: `t${triples * 3}-${seed}`, stockLength: 1000, demand: tally(sizes), optimum: triples };
}

/**
 * Cutting stock with demands after Gau & Wäscher's CUTGEN1 description (1995, "CUTGEN1: a problem generator for
 * the standard one-dimensional cutting stock problem", EJOR 84:572–579): stock 1000, `m` sizes uniform on
 * [v1·L, v2·L], demands uniform on [1, 2·d̄ − 1] (from memory of the generator's parameters).
 */
export function cutgen(m: number, v1: number, v2: number, meanDemand: number, seed: number): Instance {
  const rand = prng(seed);
  const L = 1000;
  const by = new Map<number, number>();
  for (let i = 0; i < m; i++) {
    const size = Math.max(1, Math.round((v1 + rand() * (v2 - v1)) * L));
    by.set(size, (by.get(size) ?? 0) + 1 + Math.floor(rand() * (2 * meanDemand - 1)));
  }
  const demand = [...by.entries()].sort((a, b) => b[0] - a[0]).map(([length, quantity]) => ({ length, quantity }));
  return { family: `cutgen m${m} [${v1},${v2}] d${meanDemand}`, name: `cg${m}-${seed}`, stockLength: L, demand };
}

/** Many distinct sizes, one piece each, in the spirit of Scholl, Klein & Jürgens' (1997) harder classes. */
export function manySizes(n: number, seed: number): Instance {
  const rand = prng(seed);
  const sizes = Array.from({ length: n }, () => 100 + Math.floor(rand() * 400));
  return { family: `many sizes n${n}`, name: `ms${n}-${seed}`, stockLength: 1000, demand: tally(sizes) };
}

/** About 500 distinct sizes: sizes uniform on [1000, 4999] against 10,000, one piece each (same spirit as manySizes, wider range). */
export function manySizesWide(n: number, seed: number): Instance {
  const rand = prng(seed);
  const sizes = Array.from({ length: n }, () => 1000 + Math.floor(rand() * 4000));
  const demand = tally(sizes);
  return { family: `many sizes n${n} (${demand.length} distinct)`, name: `msw${n}-${seed}`, stockLength: 10_000, demand };
}
