/**
 * Benchmark of the stock planner (npm run bench:stock) on instance families generated from published
 * generators' descriptions (scripts/bench-stock/families.ts). Per family it prints how many plans reach the
 * optimum (known by construction) or the proven bound, the mean and worst boards over it, the plan's boards
 * against first-fit-decreasing, and the time. Prints figures; asserts nothing.
 * Targets (issue "board orders a lumber yard would fill"): ≥ 90 % at the optimum, none worse than FFD, worst
 * one board over, no instance over 10 s.
 */
import { planStock } from "../takeoff/index";
import { loadHighs } from "../takeoff/stock-plan/highs-solver";
import { cutgen, manySizes, manySizesWide, triplet, uniform, type Instance } from "./bench-stock/families";
import { firstFitDecreasingBoards } from "./bench-stock/ffd";

const instances: Instance[] = [
  ...[1, 2, 3, 4, 5].map((s) => uniform(120, s)),
  ...[1, 2, 3].map((s) => uniform(250, s)),
  ...[1, 2, 3, 4, 5].map((s) => triplet(20, s)),
  ...[1, 2, 3].map((s) => triplet(83, s)),
  ...[1, 2, 3].map((s) => cutgen(20, 0.01, 0.7, 50, s)),
  ...[1, 2, 3].map((s) => cutgen(40, 0.1, 0.8, 100, s)),
  ...[1, 2].map((s) => manySizes(300, s)),
  ...[1, 2].map((s) => manySizesWide(500, s)),
];

await loadHighs(); // once per process, as in production
const rows = new Map<string, { n: number; atRef: number; over: number[]; vsFfd: number[]; worseThanFfd: number; ms: number[]; boundBelowTrivial: number; proven: number; spent: number }>();
for (const inst of instances) {
  const stock = [{ length: inst.stockLength, price: inst.stockLength }];
  const t0 = performance.now();
  const plan = await planStock(inst.demand, stock, { kerf: 0 }); // default budget, DEFAULT_PLAN_BUDGET_MS
  const ms = performance.now() - t0;
  const total = inst.demand.reduce((t, d) => t + d.length * d.quantity, 0);
  const trivial = Math.ceil(total / inst.stockLength);
  const proven = Math.ceil(plan.lowerBound.length / inst.stockLength - 1e-9);
  const reference = inst.optimum ?? Math.max(proven, trivial);
  const ffd = firstFitDecreasingBoards(inst.demand, inst.stockLength);
  const row = rows.get(inst.family) ?? { n: 0, atRef: 0, over: [], vsFfd: [], worseThanFfd: 0, ms: [], boundBelowTrivial: 0, proven: 0, spent: 0 };
  if (plan.proof === "optimal") row.proven++;
  if (plan.budgetSpent) row.spent++;
  row.n++;
  if (plan.boardCount <= reference) row.atRef++;
  row.over.push(plan.boardCount - reference);
  row.vsFfd.push(plan.boardCount / ffd);
  if (plan.boardCount > ffd) row.worseThanFfd++;
  if (proven < trivial) row.boundBelowTrivial++;
  row.ms.push(ms);
  rows.set(inst.family, row);
}

const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;
console.log("\nStock-plan benchmark: reference = the optimum where known by construction (triplets), else the larger of the proven and trivial bounds\n");
console.table(
  [...rows.entries()].map(([family, r]) => ({
    family,
    instances: r.n,
    "at reference": `${r.atRef}/${r.n}`,
    "mean over": mean(r.over).toFixed(2),
    "worst over": Math.max(...r.over),
    "boards ÷ FFD": mean(r.vsFfd).toFixed(3),
    "worse than FFD": r.worseThanFfd,
    "bound < trivial": r.boundBelowTrivial,
    "proof optimal": r.proven,
    "budget spent": r.spent,
    "mean ms": Math.round(mean(r.ms)),
    "max ms": Math.round(Math.max(...r.ms)),
  })),
);
const all = [...rows.values()];
const n = all.reduce((t, r) => t + r.n, 0);
console.log(
  `all: ${all.reduce((t, r) => t + r.atRef, 0)}/${n} at reference, ${all.reduce((t, r) => t + r.worseThanFfd, 0)} worse than FFD, worst ${Math.max(...all.flatMap((r) => r.over))} over, ${all.flatMap((r) => r.ms).filter((m) => m > 10_000).length} over 10 s`,
);
