import { columnGeneration, type Objective } from "./column-generation";
import { addUnique, capColumn, homogeneousColumns, type Column, type CountedColumn } from "./columns";
import type { Instance } from "./instance";

/** Cheaper than a full solve: the residual needs only a good LP, not the last digit. */
const RESIDUAL_LIMITS = { iterations: 60, tolerance: 1e-4 };

function subtract(residual: number[], c: Column, count: number): void {
  c.a.forEach((v, i) => (residual[i] = Math.max(0, (residual[i] ?? 0) - v * count)));
}

/**
 * Covers a residual demand by diving: solve its LP by column generation, keep
 * every whole board it uses, then commit one board of the pattern the LP uses
 * most and repeat on what is left. Each dive commits at least one board and
 * the residual after the first rounding is only a few boards, so this is
 * short. It belongs to the LP-based residual heuristics compared by Wäscher
 * & Gau (1996, "Heuristics for the integer one-dimensional cutting stock
 * problem: a computational study", OR Spektrum 18).
 */
export function diveResidual(
  inst: Instance,
  pool: Column[],
  poolKeys: Set<string>,
  demand: readonly number[],
  objective: Objective,
): CountedColumn[] {
  const out: CountedColumn[] = [];
  const residual = [...demand];
  while (residual.some((r) => r > 0)) {
    const cols: Column[] = [];
    const keys = new Set<string>();
    addUnique(cols, keys, homogeneousColumns(inst, residual));
    const touching = pool.filter((c) => c.a.some((v, i) => v > 0 && (residual[i] ?? 0) > 0));
    addUnique(cols, keys, touching.map((c) => capColumn(c, residual)));
    const lp = columnGeneration(inst, cols, keys, residual, objective, RESIDUAL_LIMITS);
    addUnique(pool, poolKeys, cols);
    let committed = false;
    let top = -1;
    cols.forEach((c, j) => {
      const x = lp.x[j] ?? 0;
      const whole = Math.floor(x + 1e-6);
      if (whole > 0) {
        out.push({ ...c, count: whole });
        subtract(residual, c, whole);
        committed = true;
      } else if (x > 1e-9 && (top < 0 || x > (lp.x[top] ?? 0))) top = j;
    });
    const pick = cols[top];
    if (!committed && pick) {
      out.push({ ...pick, count: 1 });
      subtract(residual, pick, 1);
    } else if (!committed) {
      throw new Error("stock plan: residual LP used no pattern");
    }
  }
  return out;
}

/**
 * Rounds an LP plan down to whole boards and dives on what is left (at most a
 * few boards per fractional pattern).
 */
export function roundAndRepair(
  inst: Instance,
  pool: Column[],
  poolKeys: Set<string>,
  x: Float64Array,
  demand: readonly number[],
  objective: Objective,
): CountedColumn[] {
  const base: CountedColumn[] = [];
  const residual = [...demand];
  pool.forEach((c, j) => {
    const count = Math.floor((x[j] ?? 0) + 1e-6);
    if (count <= 0) return;
    base.push({ ...c, count });
    subtract(residual, c, count);
  });
  return [...base, ...diveResidual(inst, pool, poolKeys, residual, objective)];
}
