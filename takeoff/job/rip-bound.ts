import { exact, Fraction, sumFractions } from "../exact";

/** Grid cells across the board face the searches below may span; past it no bound is offered here. */
const GRID_LIMIT = 20_000;
/** Rounds of the cutting-plane search; each adds the fullest board the weights so far allow. */
const MAX_ROUNDS = 60;
/** Weights are made exact on this grid: the bound is proven from the exact weights, not the LP's floats. */
const SCALE = 1_000_000;

export interface WidthBound {
  width: number;
  /** A proven lower bound on what this width's strips cost at board price. */
  bound: Fraction;
}

/**
 * A lower bound on the boards' cost from weights f_w ≥ 0 on the strip widths such that no board's strips
 * weigh more than 1 together (a dual-feasible weighting): every board then costs at least its price ×
 * the weight of its strips, so the order costs at least Σ f_w × bound_w (derived; the classic
 * dual-feasible-function bound of cutting stock, Fekete & Schepers 2001, from memory). The best weights
 * are the LP max Σ f_w bound_w subject to Σ a_w f_w ≤ 1 for every board layout a; it is found by a small
 * cutting-plane search (a dense simplex over the layouts met so far, then the fullest layout under the
 * weights, by knapsack over the face, added while it weighs over 1). The floats only steer: the weights
 * are then rounded to 1/10⁶, the heaviest layout under them found exactly (integer knapsack) and the
 * weights divided by it, so the bound is proven whatever the LP's accuracy. Widths wider than the board
 * are left out (the caller charges them a board each). Undefined when the face is too fine a grid.
 */
export function layoutBound(widths: readonly WidthBound[], board: number, kerf: number): Fraction | undefined {
  const k = exact(kerf);
  const cap = exact(board).add(k);
  const fits = widths.filter((w) => !exact(w.width).gt(exact(board)));
  if (fits.length === 0) return new Fraction(0);
  const steps = fits.map((w) => exact(w.width).add(k));
  let denom = cap.d;
  for (const s of steps) denom = lcm(denom, s.d);
  const capCells = Number((cap.n * denom) / cap.d);
  if (capCells > GRID_LIMIT) return undefined;
  const cells = steps.map((s) => Number((s.n * denom) / s.d));
  const c = fits.map((w) => w.bound.valueOf());

  const rows: number[][] = cells.map((cell, i) => cells.map((_, j) => (i === j ? Math.floor(capCells / cell) : 0)));
  let f = new Array<number>(fits.length).fill(0);
  for (let round = 0; round < MAX_ROUNDS; round++) {
    f = maximise(c, rows);
    const { value, pattern } = heaviest(cells, capCells, f);
    if (value <= 1 + 1e-9) break;
    rows.push(pattern);
  }
  const weights = f.map((x) => Math.max(0, Math.floor(x * SCALE)));
  const heaviestExact = heaviest(cells, capCells, weights).value;
  if (heaviestExact <= 0) return new Fraction(0);
  return sumFractions(fits.map((w, i) => w.bound.mul(weights[i]!))).div(heaviestExact);
}

function lcm(a: bigint, b: bigint): bigint {
  let [x, y] = [a, b];
  while (y !== 0n) [x, y] = [y, x % y];
  return (a / x) * b;
}

/**
 * The heaviest board layout under `weight`: an unbounded knapsack over the face, `cells[i]` grid cells
 * per strip of width i (its width plus one rip kerf) in `cap` cells (the face plus one kerf). Exact when
 * the weights are integers (sums stay far below 2^53).
 */
function heaviest(cells: readonly number[], cap: number, weight: readonly number[]): { value: number; pattern: number[] } {
  const best = new Float64Array(cap + 1);
  const pick = new Int32Array(cap + 1).fill(-1);
  for (let t = 1; t <= cap; t++) {
    best[t] = best[t - 1]!;
    for (let i = 0; i < cells.length; i++) {
      const cell = cells[i]!;
      if (cell <= t && best[t - cell]! + weight[i]! > best[t]!) {
        best[t] = best[t - cell]! + weight[i]!;
        pick[t] = i;
      }
    }
  }
  const pattern = new Array<number>(cells.length).fill(0);
  for (let t = cap; t > 0; ) {
    const i = pick[t]!;
    if (i < 0) t -= 1;
    else {
      pattern[i] = (pattern[i] ?? 0) + 1;
      t -= cells[i]!;
    }
  }
  return { value: best[cap]!, pattern };
}

/**
 * max c·f subject to rows·f ≤ 1, f ≥ 0, by the tableau simplex from the slack basis (feasible, since the
 * right-hand side is 1), Bland's rule so it cannot cycle. A few widths and tens of rows: dense is fine.
 */
function maximise(c: readonly number[], rows: readonly number[][]): number[] {
  const m = c.length;
  const r = rows.length;
  const width = m + r + 1;
  const t = rows.map((row, i) => {
    const line = new Float64Array(width);
    row.forEach((v, j) => (line[j] = v));
    line[m + i] = 1;
    line[width - 1] = 1;
    return line;
  });
  const z = new Float64Array(width);
  c.forEach((v, j) => (z[j] = -v));
  const basis = rows.map((_, i) => m + i);
  for (let iter = 0; iter < 10_000; iter++) {
    let enter = -1;
    for (let j = 0; j < width - 1 && enter < 0; j++) if (z[j]! < -1e-12) enter = j;
    if (enter < 0) break;
    let leave = -1;
    let ratio = Infinity;
    for (let i = 0; i < r; i++) {
      const a = t[i]![enter]!;
      if (a <= 1e-12) continue;
      const q = t[i]![width - 1]! / a;
      if (q < ratio - 1e-12 || (Math.abs(q - ratio) <= 1e-12 && basis[i]! < basis[leave]!)) [ratio, leave] = [q, i];
    }
    if (leave < 0) break; // unbounded cannot happen: every width has its row n·f ≤ 1
    const pivot = t[leave]!;
    const p = pivot[enter]!;
    for (let j = 0; j < width; j++) pivot[j] = pivot[j]! / p;
    for (const line of [...t.filter((_, i) => i !== leave), z]) {
      const factor = line[enter]!;
      if (factor !== 0) for (let j = 0; j < width; j++) line[j] = line[j]! - factor * pivot[j]!;
    }
    basis[leave] = enter;
  }
  const f = new Array<number>(m).fill(0);
  basis.forEach((b, i) => {
    if (b < m) f[b] = t[i]![width - 1]!;
  });
  return f;
}
