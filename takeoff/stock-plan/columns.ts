import { floorDiv, numer } from "../exact";
import type { Instance } from "./instance";

/** A cutting pattern: how many of each item one board of stock `stock` yields. */
export interface Column {
  stock: number;
  a: Int32Array;
}

export interface CountedColumn extends Column {
  count: number;
}

export function columnKey(c: Column): string {
  return `${c.stock}:${c.a.join(",")}`;
}

/** Pattern with every count capped at the demand still open: extra pieces are never needed. */
export function capColumn(c: Column, demand: ArrayLike<number>): Column {
  return { stock: c.stock, a: c.a.map((v, i) => Math.min(v, demand[i] ?? 0)) };
}

export function isEmpty(c: Column): boolean {
  return c.a.every((v) => v === 0);
}

/**
 * One single-size pattern per item and board length, counted exactly (not on
 * the grid), so every piece that fits a board has a column from the start.
 */
export function homogeneousColumns(inst: Instance, demand: ArrayLike<number>): Column[] {
  const out: Column[] = [];
  inst.items.forEach((item, i) => {
    const d = demand[i] ?? 0;
    if (d === 0) return;
    const per = item.length.add(inst.kerf);
    inst.stocks.forEach((s, stock) => {
      const q = s.length.div(per);
      const fit = Math.min(d, Number(floorDiv(numer(q), q.d)));
      if (fit <= 0) return;
      const a = new Int32Array(inst.items.length);
      a[i] = fit;
      out.push({ stock, a });
    });
  });
  return out;
}

/** Adds columns not already present; returns how many were new. */
export function addUnique(target: Column[], keys: Set<string>, candidates: Iterable<Column>): number {
  let added = 0;
  for (const c of candidates) {
    if (isEmpty(c)) continue;
    const k = columnKey(c);
    if (keys.has(k)) continue;
    keys.add(k);
    target.push(c);
    added++;
  }
  return added;
}
