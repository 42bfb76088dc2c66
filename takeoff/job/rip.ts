import { exact, floorDiv, Fraction, numer, sumFractions, toNumber } from "../exact";
import { planStock } from "../stock-plan/plan-stock";
import type { RipLayout } from "./types";

/**
 * Strips of width `strip` one board of width `board` rips into: n strips take n·w + (n−1)·k ≤ W, so
 * n = floor((W + k) / (w + k)) (derived). Worked exactly: a 3 1/2" board at 1/8" kerf gives four 3/4"
 * strips (3.375 ≤ 3.5) and three 1" strips (four would need 4.375).
 */
export function stripsPerBoard(board: number, strip: number, kerf: number): number {
  const k = exact(kerf);
  const q = exact(board).add(k).div(exact(strip).add(k));
  return Number(floorDiv(numer(q), q.d));
}

/** Board width left after `strips` and the rip kerfs between them: W − Σw − (m−1)·k (derived), never below 0. */
export function offcutWidth(board: number, strips: readonly number[], kerf: number): number {
  if (strips.length === 0) return board;
  const left = exact(board).sub(sumFractions(strips.map(exact))).sub(exact(kerf).mul(strips.length - 1));
  return left.s < 0n ? 0 : toNumber(left);
}

/** Strips of width `strip` that still rip from an offcut `left` wide: each more takes w + k of it (derived). */
export function spareStrips(left: number, strip: number, kerf: number): number {
  const q = exact(left).div(exact(strip).add(exact(kerf)));
  return Number(floorDiv(numer(q), q.d));
}

/** Grid cells the exact width search may span; past it the looser share below is used (still a bound). */
const SHARE_GRID_LIMIT = 20_000;

/**
 * The most of a board's width, counted as Σ(w + k) over its strips, that any mix of these strip widths
 * can fill: at most W + k, since m strips take Σw + (m−1)k ≤ W. A strip of width w so takes at least
 * (w + k) / C of a board, whatever shares the board with it — the share the order's cost bound charges
 * it (see rippedBound). For one width C = n(w + k), so the share is 1/n. Worked out exactly on the grid
 * of the widths' common denominator by an unbounded knapsack over reachable sums (derived).
 */
export function fullestRip(widths: readonly number[], board: number, kerf: number): Fraction {
  const k = exact(kerf);
  const cap = exact(board).add(k);
  const steps = widths.map((w) => exact(w).add(k)).filter((s) => !s.gt(cap));
  if (steps.length === 0) return cap;
  let denom = cap.d;
  for (const s of steps) denom = (denom * s.d) / gcd(denom, s.d);
  const capCells = Number(floorDiv(numer(cap) * denom, cap.d));
  if (capCells > SHARE_GRID_LIMIT) return cap;
  const cells = steps.map((s) => Number((numer(s) * denom) / s.d));
  const reach = new Uint8Array(capCells + 1);
  reach[0] = 1;
  for (let t = 1; t <= capCells; t++) reach[t] = cells.some((c) => c <= t && reach[t - c] === 1) ? 1 : 0;
  let best = capCells;
  while (best > 0 && reach[best] !== 1) best--;
  return new Fraction(BigInt(best), denom);
}

function gcd(a: bigint, b: bigint): bigint {
  let [x, y] = [a, b];
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
}

export interface PackedBoards {
  layouts: Omit<RipLayout, "stockLength">[];
  proof: "optimal" | "best-found";
  budgetSpent: boolean;
}

/**
 * Boards of one length ripped to the strips wanted: a one-dimensional cutting-stock problem across the
 * board's face, strip widths as the "pieces", the rip kerf between them. One strip width is packed n to
 * a board (ceil(count / n) boards, the fewest, since no board holds more than n). Several widths go to
 * planStock with the board as a stock piece W + k long at price 1 and the rip kerf as its kerf: m strips
 * then fit when Σ(w + k) ≤ W + k, i.e. Σw + (m−1)k ≤ W, the rip rule exactly (derived), and planStock
 * proves a lower bound on the board count and says whether it met it. An exact search would need no
 * solver but grows with the strip count (thousands on a job); planStock's column generation does not.
 * A strip wider than the board (the price book's "wide enough" allows 1/64") takes a board of its own.
 */
export async function packStrips(
  wanted: readonly { width: number; count: number }[],
  board: number,
  kerf: number,
  budgetMs: number,
): Promise<PackedBoards> {
  const layouts: PackedBoards["layouts"] = [];
  const fits = wanted.filter((s) => s.count > 0 && !exact(s.width).gt(exact(board)));
  for (const s of wanted) if (s.count > 0 && exact(s.width).gt(exact(board))) layouts.push({ count: s.count, strips: [s.width], offcutWidth: 0 });
  const add = (count: number, strips: number[]) => {
    if (count > 0) layouts.push({ count, strips, offcutWidth: offcutWidth(board, strips, kerf) });
  };
  if (fits.length === 1) {
    const { width, count } = fits[0]!;
    const n = stripsPerBoard(board, width, kerf);
    add(Math.floor(count / n), Array<number>(n).fill(width));
    add(count % n === 0 ? 0 : 1, Array<number>(count % n).fill(width));
    return { layouts, proof: "optimal", budgetSpent: false };
  }
  if (fits.length === 0) return { layouts, proof: "optimal", budgetSpent: false };
  const face = toNumber(exact(board).add(exact(kerf)));
  const plan = await planStock(
    fits.map((s) => ({ length: s.width, quantity: s.count })),
    [{ length: face, price: 1 }],
    { kerf, budgetMs },
  );
  for (const p of plan.boards) add(p.count, [...p.cuts].sort((a, b) => b - a));
  const proof = plan.proof ?? (plan.cost <= plan.lowerBound.cost ? "optimal" : "best-found");
  return { layouts, proof, budgetSpent: plan.budgetSpent ?? false };
}
