import { columnKey, type CountedColumn } from "./columns";
import type { Instance } from "./instance";

export type FitRule = "first" | "best";

/** Best fit scans every open board per piece; above this many pieces only first fit runs (it is O(n log n)). */
const BEST_FIT_PIECE_LIMIT = 3000;

/**
 * First-fit over boards 0..size-1 in O(log size) per piece: a max tree of the
 * free room, where boards not yet opened sit at full capacity, so the first
 * leaf with room is the earliest open board that holds the piece or else the
 * next new one.
 */
class FirstFitTree {
  private readonly size: number;
  private readonly tree: Float64Array;
  constructor(boards: number, cap: number) {
    let size = 1;
    while (size < boards) size *= 2;
    this.size = size;
    this.tree = new Float64Array(2 * size).fill(cap);
  }
  /** Index of the first board with at least w free, or -1. */
  find(w: number): number {
    if ((this.tree[1] ?? 0) < w) return -1;
    let node = 1;
    while (node < this.size) node = (this.tree[2 * node] ?? 0) >= w ? 2 * node : 2 * node + 1;
    return node - this.size;
  }
  take(board: number, w: number): void {
    let node = board + this.size;
    this.tree[node] = (this.tree[node] ?? 0) - w;
    for (node >>= 1; node >= 1; node >>= 1) this.tree[node] = Math.max(this.tree[2 * node] ?? 0, this.tree[2 * node + 1] ?? 0);
  }
}

/**
 * First-fit or best-fit decreasing (Johnson 1973, "Near-optimal bin packing
 * algorithms", MIT thesis; common practice for cutting lists): pieces longest
 * first, each onto the first open board (first fit) or the fullest open board
 * (best fit) that still holds it, else onto a new board of the longest stock
 * length. Capacity is counted on the instance grid — piece plus one kerf
 * rounded up, board rounded down — so every board it fills really fits.
 * finishPlan then moves each pattern to the cheapest board that holds it.
 * Items come sorted longest first from buildInstance. Returns undefined for
 * best fit on instances too large for its linear scan.
 */
export function fitDecreasing(inst: Instance, demand: ArrayLike<number>, rule: FitRule): CountedColumn[] | undefined {
  const n = inst.items.length;
  let pieces = 0;
  for (let i = 0; i < n; i++) pieces += demand[i] ?? 0;
  if (rule === "best" && pieces > BEST_FIT_PIECE_LIMIT) return undefined;
  let longest = 0;
  inst.stocks.forEach((s, k) => {
    const l = inst.stocks[longest];
    if (l && (s.length.gt(l.length) || (s.length.equals(l.length) && s.price.lt(l.price)))) longest = k;
  });
  const cap = inst.stocks[longest]?.cap ?? 0;
  const boards: Int32Array[] = [];
  const free: number[] = [];
  const tree = rule === "first" ? new FirstFitTree(pieces, cap) : undefined;
  inst.items.forEach((it, i) => {
    for (let q = 0; q < (demand[i] ?? 0); q++) {
      let pick = -1;
      if (it.w > cap) {
        // On a coarse grid a piece that fits exactly may not fit in grid units: it gets a board to itself.
        pick = boards.length;
        tree?.take(pick, cap);
      } else if (tree) {
        pick = tree.find(it.w);
        tree.take(pick, it.w);
      } else {
        free.forEach((f, b) => {
          if (f >= it.w && (pick < 0 || f < (free[pick] ?? 0))) pick = b;
        });
        if (pick < 0) pick = boards.length;
        free[pick] = (pick < free.length ? (free[pick] ?? 0) : Math.max(cap, it.w)) - it.w;
      }
      while (boards.length <= pick) boards.push(new Int32Array(n));
      const a = boards[pick];
      if (a) a[i] = (a[i] ?? 0) + 1;
    }
  });
  // Equal boards merge here, so finishPlan prices each distinct pattern once.
  const merged = new Map<string, CountedColumn>();
  for (const a of boards) {
    const col = { stock: longest, a, count: 1 };
    const key = columnKey(col);
    const m = merged.get(key);
    if (m) m.count += 1;
    else merged.set(key, col);
  }
  return [...merged.values()];
}
