import type { CountedColumn } from "./columns";
import type { Instance } from "./instance";

export type FitRule = "first" | "best";

interface OpenBoard {
  free: number;
  a: Int32Array;
}

/**
 * First-fit or best-fit decreasing (Johnson 1973, "Near-optimal bin packing
 * algorithms", MIT thesis; common practice for cutting lists): pieces longest
 * first, each onto the first open board (first fit) or the fullest open board
 * (best fit) that still holds it, else onto a new board of the longest stock
 * length. Capacity is counted on the instance grid — piece plus one kerf
 * rounded up, board rounded down — so every board it fills really fits.
 * finishPlan then moves each pattern to the cheapest board that holds it.
 * Items come sorted longest first from buildInstance.
 */
export function fitDecreasing(inst: Instance, demand: ArrayLike<number>, rule: FitRule): CountedColumn[] {
  const n = inst.items.length;
  let longest = 0;
  inst.stocks.forEach((s, k) => {
    const l = inst.stocks[longest];
    if (l && (s.length.gt(l.length) || (s.length.equals(l.length) && s.price.lt(l.price)))) longest = k;
  });
  const cap = inst.stocks[longest]?.cap ?? 0;
  const boards: OpenBoard[] = [];
  inst.items.forEach((it, i) => {
    for (let q = 0; q < (demand[i] ?? 0); q++) {
      let pick: OpenBoard | undefined;
      for (const b of boards) {
        if (b.free < it.w) continue;
        if (rule === "first") {
          pick = b;
          break;
        }
        if (!pick || b.free < pick.free) pick = b;
      }
      if (!pick) {
        // On a coarse grid a piece that fits exactly may not fit in grid units: it gets a board to itself.
        pick = { free: Math.max(cap, it.w), a: new Int32Array(n) };
        boards.push(pick);
      }
      pick.free -= it.w;
      pick.a[i] = (pick.a[i] ?? 0) + 1;
    }
  });
  return boards.map((b) => ({ stock: longest, a: b.a, count: 1 }));
}
