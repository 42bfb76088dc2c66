import { better, finishPlan } from "./assemble";
import type { Deadline } from "./budget";
import { columnGeneration, type Objective } from "./column-generation";
import { addUnique, capColumn, homogeneousColumns, type Column, type CountedColumn } from "./columns";
import { fitDecreasing } from "./first-fit";
import type { Highs } from "./highs-solver";
import type { Instance } from "./instance";

/** Cheaper than a full solve: the residual needs only a good LP, not the last digit. */
const RESIDUAL_LIMITS = { iterations: 60, tolerance: 1e-4 };

export interface RepairOptions {
  deadline: Deadline;
  /** Solve residual masters with HiGHS (many sizes). */
  highs?: Highs;
}

/** First- or best-fit decreasing on what is left, whichever is better: the fallback once the deadline is near. */
export function packRest(inst: Instance, residual: readonly number[]): CountedColumn[] {
  let best: CountedColumn[] | undefined;
  for (const rule of ["first", "best"] as const) {
    const packed = fitDecreasing(inst, residual, rule);
    const plan = packed && finishPlan(inst, packed, residual);
    if (plan && better(inst, plan, best)) best = plan;
  }
  return best ?? [];
}

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
 * problem: a computational study", OR Spektrum 18). When the deadline ends
 * the dive, first- or best-fit decreasing packs what is left, so the plan is
 * always complete.
 */
export function diveResidual(
  inst: Instance,
  pool: Column[],
  poolKeys: Set<string>,
  demand: readonly number[],
  objective: Objective,
  opts: RepairOptions,
): CountedColumn[] {
  const out: CountedColumn[] = [];
  const residual = [...demand];
  while (residual.some((r) => r > 0)) {
    if (opts.deadline.expired()) return [...out, ...packRest(inst, residual)];
    const cols: Column[] = [];
    const keys = new Set<string>();
    addUnique(cols, keys, homogeneousColumns(inst, residual));
    const touching = pool.filter((c) => c.a.some((v, i) => v > 0 && (residual[i] ?? 0) > 0));
    addUnique(cols, keys, touching.map((c) => capColumn(c, residual)));
    const lp = columnGeneration(inst, cols, keys, residual, objective, { ...RESIDUAL_LIMITS, ...opts });
    addUnique(pool, poolKeys, cols);
    let committed = false;
    const fractional: number[] = [];
    cols.forEach((c, j) => {
      const x = lp.x[j] ?? 0;
      const whole = Math.floor(x + 1e-6);
      if (whole > 0) {
        out.push({ ...c, count: whole });
        subtract(residual, c, whole);
        committed = true;
      } else if (x > 1e-9) fractional.push(j);
    });
    if (!committed) {
      // Nothing whole: fix every pattern the LP uses at least half that still fits what is left,
      // most used first (at least the top one), so a dive over many one-off sizes takes few rounds.
      fractional.sort((p, q) => (lp.x[q] ?? 0) - (lp.x[p] ?? 0) || p - q);
      for (const j of fractional) {
        const pick = cols[j];
        if (!pick || (committed && (lp.x[j] ?? 0) < 0.5)) break;
        if (committed && pick.a.some((v, i) => v > (residual[i] ?? 0))) continue;
        out.push({ ...pick, count: 1 });
        subtract(residual, pick, 1);
        committed = true;
      }
    }
    if (!committed) throw new Error("stock plan: residual LP used no pattern");
  }
  return out;
}

/** An LP plan rounded down to whole boards, and the demand those boards leave uncut. */
export function roundDown(pool: readonly Column[], x: Float64Array, demand: readonly number[]): { base: CountedColumn[]; residual: number[] } {
  const base: CountedColumn[] = [];
  const residual = [...demand];
  pool.forEach((c, j) => {
    const count = Math.floor((x[j] ?? 0) + 1e-6);
    if (count <= 0) return;
    base.push({ ...c, count });
    subtract(residual, c, count);
  });
  return { base, residual };
}
