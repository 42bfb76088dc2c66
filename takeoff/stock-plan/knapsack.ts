/**
 * Exact integer knapsack over integer weights: the pricing step of column
 * generation (which pattern of pieces is worth most at the current duals) and
 * the heart of the lower-bound proof. One table over the longest board answers
 * every shorter board too, because dp[c] is "best value using at most c".
 *
 * When no demand bound can bind (each item's demand ≥ what fits the longest
 * board) the unbounded recurrence is used; otherwise bounded items are split
 * into binary chunks (1, 2, 4, …, rest copies), the standard reduction of a
 * bounded knapsack to 0/1 items, with a take-table per chunk for read-back.
 * Hot loops use non-null assertions: every index is inside its typed array.
 */
export interface KnapsackSolution {
  /** Best value with total weight ≤ cap. */
  value(cap: number): number;
  /** Copies of each item in one optimal choice for cap. */
  counts(cap: number): Int32Array;
}

export function boundedKnapsack(
  weights: ArrayLike<number>,
  values: ArrayLike<number>,
  bounds: ArrayLike<number>,
  maxCap: number,
): KnapsackSolution {
  const n = weights.length;
  const free = new Int32Array(n);
  let freeValue = 0;
  const active: number[] = [];
  let binding = false;
  for (let i = 0; i < n; i++) {
    const w = weights[i]!;
    const v = values[i]!;
    if (!(v > 0) || bounds[i]! <= 0) continue;
    if (w === 0) {
      free[i] = bounds[i]!;
      freeValue += bounds[i]! * v;
      continue;
    }
    if (w > maxCap) continue;
    active.push(i);
    if (bounds[i]! < Math.floor(maxCap / w)) binding = true;
  }
  const solve = binding ? chunked : unbounded;
  const { dp, readBack } = solve(active, weights, values, bounds, maxCap);
  return {
    value: (cap) => dp[Math.min(cap, maxCap)]! + freeValue,
    counts(cap) {
      const out = Int32Array.from(free);
      readBack(Math.min(cap, maxCap), out);
      return out;
    },
  };
}

interface Table {
  dp: Float64Array;
  readBack(cap: number, out: Int32Array): void;
}

type Solver = (
  active: number[],
  weights: ArrayLike<number>,
  values: ArrayLike<number>,
  bounds: ArrayLike<number>,
  maxCap: number,
) => Table;

const unbounded: Solver = (active, weights, values, _bounds, maxCap) => {
  const dp = new Float64Array(maxCap + 1);
  const last = new Int32Array(maxCap + 1).fill(-1);
  // Item by item: an optimal multiset can be taken in item order, and last[c]
  // always leads back along an optimal choice because dp only grows.
  for (const i of active) {
    const w = weights[i]!;
    const v = values[i]!;
    for (let c = w; c <= maxCap; c++) {
      const cand = dp[c - w]! + v;
      if (cand > dp[c]!) {
        dp[c] = cand;
        last[c] = i;
      }
    }
  }
  return {
    dp,
    readBack(cap, out) {
      for (let c = cap; last[c]! >= 0; ) {
        const i = last[c]!;
        out[i]! += 1;
        c -= weights[i]!;
      }
    },
  };
};

const chunked: Solver = (active, weights, values, bounds, maxCap) => {
  const width = maxCap + 1;
  const chunkItem: number[] = [];
  const chunkCopies: number[] = [];
  for (const i of active) {
    for (let k = 1, left = Math.min(bounds[i]!, Math.floor(maxCap / weights[i]!)); left > 0; k *= 2) {
      const take = Math.min(k, left);
      chunkItem.push(i);
      chunkCopies.push(take);
      left -= take;
    }
  }
  const dp = new Float64Array(width);
  const taken = new Uint8Array(chunkItem.length * width);
  for (let j = 0; j < chunkItem.length; j++) {
    const i = chunkItem[j]!;
    const cw = chunkCopies[j]! * weights[i]!;
    const cv = chunkCopies[j]! * values[i]!;
    const row = j * width;
    for (let c = maxCap; c >= cw; c--) {
      const cand = dp[c - cw]! + cv;
      if (cand > dp[c]!) {
        dp[c] = cand;
        taken[row + c] = 1;
      }
    }
  }
  return {
    dp,
    readBack(cap, out) {
      let c = cap;
      for (let j = chunkItem.length - 1; j >= 0; j--) {
        if (taken[j * width + c]) {
          const i = chunkItem[j]!;
          out[i]! += chunkCopies[j]!;
          c -= chunkCopies[j]! * weights[i]!;
        }
      }
    },
  };
};
