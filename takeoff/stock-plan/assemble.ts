import { Fraction, sumFractions } from "../exact";
import type { BoardPattern } from "../types";
import { columnKey, type Column, type CountedColumn } from "./columns";
import type { Instance } from "./instance";

/** Exact length a pattern uses: each piece plus one kerf (the factory end is squared too). */
export function usedLength(inst: Instance, a: ArrayLike<number>): Fraction {
  let used = new Fraction(0);
  inst.items.forEach((it, i) => {
    const k = a[i] ?? 0;
    if (k > 0) used = used.add(it.length.add(inst.kerf).mul(k));
  });
  return used;
}

/** Cheapest board that holds the pattern, shortest on a tie; undefined if none does. */
export function cheapestStock(inst: Instance, a: ArrayLike<number>): number | undefined {
  const used = usedLength(inst, a);
  let best: number | undefined;
  inst.stocks.forEach((s, k) => {
    if (s.length.lt(used)) return;
    const b = best === undefined ? undefined : inst.stocks[best];
    if (!b || s.price.lt(b.price) || (s.price.equals(b.price) && s.length.lt(b.length))) best = k;
  });
  return best;
}

/**
 * Turns integer pattern counts into a plan that cuts exactly the demand:
 * rounding leaves surplus pieces, which are taken off the emptiest boards
 * first (removing a piece never breaks a pattern), then every distinct pattern
 * moves to the cheapest board that holds it and equal patterns merge.
 */
export function finishPlan(inst: Instance, chosen: readonly CountedColumn[], demand: ArrayLike<number>): CountedColumn[] {
  const n = inst.items.length;
  const surplus = Array.from({ length: n }, (_, i) => -(demand[i] ?? 0));
  for (const c of chosen) c.a.forEach((v, i) => (surplus[i] = (surplus[i] ?? 0) + v * c.count));
  const groups: CountedColumn[] = chosen.map((c) => ({ stock: c.stock, a: Int32Array.from(c.a), count: c.count }));
  if (surplus.some((s) => s > 0)) {
    const fill = (c: Column) => usedLength(inst, c.a).div(inst.stocks[c.stock]?.length ?? 1).valueOf();
    groups.sort((x, y) => fill(x) - fill(y));
    for (let g = 0; g < groups.length; g++) {
      const group = groups[g];
      if (!group) continue;
      while (group.count > 0) {
        const trimmed = Int32Array.from(group.a);
        let changed = false;
        trimmed.forEach((v, i) => {
          const cut = Math.min(v, surplus[i] ?? 0);
          if (cut > 0) {
            trimmed[i] = v - cut;
            surplus[i] = (surplus[i] ?? 0) - cut;
            changed = true;
          }
        });
        if (!changed) break;
        group.count -= 1;
        groups.push({ stock: group.stock, a: trimmed, count: 1 });
      }
    }
  }
  const merged = new Map<string, CountedColumn>();
  for (const group of groups) {
    if (group.count === 0 || group.a.every((v) => v === 0)) continue;
    const stock = cheapestStock(inst, group.a) ?? group.stock;
    const col = { stock, a: group.a, count: group.count };
    const key = columnKey(col);
    const m = merged.get(key);
    if (m) m.count += col.count;
    else merged.set(key, col);
  }
  return [...merged.values()];
}

export function planCost(inst: Instance, plan: readonly CountedColumn[]): Fraction {
  return sumFractions(plan.map((c) => (inst.stocks[c.stock]?.price ?? new Fraction(0)).mul(c.count)));
}

export function planLength(inst: Instance, plan: readonly CountedColumn[]): Fraction {
  return sumFractions(plan.map((c) => (inst.stocks[c.stock]?.length ?? new Fraction(0)).mul(c.count)));
}

/** Is plan A better than B: cheaper, or as cheap and shorter? */
export function better(inst: Instance, a: readonly CountedColumn[], b: readonly CountedColumn[] | undefined): boolean {
  if (!b) return true;
  const c = planCost(inst, a).compare(planCost(inst, b));
  return c < 0 || (c === 0 && planLength(inst, a).lt(planLength(inst, b)));
}

/** The public board list: one row per pattern, longest boards and most-used patterns first. */
export function boardPatterns(inst: Instance, plan: readonly CountedColumn[]): BoardPattern[] {
  return plan
    .map((c) => {
      const s = inst.stocks[c.stock];
      if (!s) throw new Error("stock plan: pattern refers to a missing stock item");
      const cuts: number[] = [];
      inst.items.forEach((it, i) => {
        for (let k = 0; k < (c.a[i] ?? 0); k++) cuts.push(it.lengthNum);
      });
      return { stockLength: s.lengthNum, count: c.count, cuts, offcut: s.length.sub(usedLength(inst, c.a)).valueOf() };
    })
    .sort((x, y) => y.stockLength - x.stockLength || y.count - x.count || y.cuts.length - x.cuts.length);
}
