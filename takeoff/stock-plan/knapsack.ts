/**
 * Exact bounded knapsack over integer weights: the pricing step of column
 * generation (which pattern of pieces is worth most at the current duals) and
 * the heart of the lower-bound proof. One table over the longest board answers
 * every shorter board too, because dp[c] is "best value using at most c".
 *
 * Bounded items are split into binary chunks (1, 2, 4, …, rest copies), the
 * standard reduction of a bounded knapsack to 0/1 items; a take-table per
 * chunk lets any capacity's optimum be read back.
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
  const width = maxCap + 1;
  const free = new Int32Array(n);
  let freeValue = 0;
  const chunkItem: number[] = [];
  const chunkCopies: number[] = [];
  for (let i = 0; i < n; i++) {
    const w = weights[i] ?? 0;
    const v = values[i] ?? 0;
    if (!(v > 0)) continue;
    const bound = w === 0 ? (bounds[i] ?? 0) : Math.min(bounds[i] ?? 0, Math.floor(maxCap / w));
    if (w === 0) {
      free[i] = bound;
      freeValue += bound * v;
      continue;
    }
    for (let k = 1, left = bound; left > 0; k *= 2) {
      const take = Math.min(k, left);
      chunkItem.push(i);
      chunkCopies.push(take);
      left -= take;
    }
  }
  const dp = new Float64Array(width);
  const taken = new Uint8Array(chunkItem.length * width);
  for (let j = 0; j < chunkItem.length; j++) {
    const i = chunkItem[j] ?? 0;
    const k = chunkCopies[j] ?? 0;
    const cw = k * (weights[i] ?? 0);
    const cv = k * (values[i] ?? 0);
    const row = j * width;
    for (let c = maxCap; c >= cw; c--) {
      const candidate = (dp[c - cw] ?? 0) + cv;
      if (candidate > (dp[c] ?? 0)) {
        dp[c] = candidate;
        taken[row + c] = 1;
      }
    }
  }
  return {
    value: (cap) => (dp[Math.min(cap, maxCap)] ?? 0) + freeValue,
    counts(cap) {
      const out = Int32Array.from(free);
      let c = Math.min(cap, maxCap);
      for (let j = chunkItem.length - 1; j >= 0; j--) {
        if (taken[j * width + c]) {
          const i = chunkItem[j] ?? 0;
          const k = chunkCopies[j] ?? 0;
          out[i] = (out[i] ?? 0) + k;
          c -= k * (weights[i] ?? 0);
        }
      }
      return out;
    },
  };
}
