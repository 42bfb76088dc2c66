import highsLoader from "highs";
import { Q } from "./rational";

/**
 * Independent reference for board plans: every feasible pattern enumerated
 * with BigInt rationals, and the integer program (or its LP relaxation)
 * written in CPLEX LP format and solved by HiGHS through the `highs` package.
 */
export interface RefInstance {
  demand: { length: number; quantity: number }[];
  stock: { length: number; price: number }[];
  kerf: number;
}

let loading: ReturnType<typeof highsLoader> | undefined;
const highs = () => (loading ??= highsLoader());

export function allPatterns(inst: RefInstance): { stock: number; a: number[] }[] {
  const items = inst.demand.filter((d) => d.quantity > 0);
  const out: { stock: number; a: number[] }[] = [];
  inst.stock.forEach((s, stock) => {
    const a = items.map(() => 0);
    const walk = (i: number, used: Q) => {
      if (i === items.length) {
        if (a.some((v) => v > 0)) out.push({ stock, a: [...a] });
        return;
      }
      const item = items[i]!;
      const per = Q.of(item.length).add(inst.kerf);
      for (let k = 0, u = used; k <= item.quantity && u.cmp(s.length) <= 0; k++, u = u.add(per)) {
        a[i] = k;
        walk(i + 1, u);
      }
      a[i] = 0;
    };
    walk(0, new Q(0n));
  });
  return out;
}

/** Minimum cost (MIP) or its LP relaxation over every pattern, as HiGHS reports it. */
export async function referenceOptimum(inst: RefInstance, relax = false): Promise<number> {
  const items = inst.demand.filter((d) => d.quantity > 0);
  const patterns = allPatterns(inst);
  const terms = (coef: (p: { stock: number; a: number[] }) => number) =>
    patterns.map((p, j) => [coef(p), `x${j}`] as const).filter(([c]) => c !== 0).map(([c, x]) => `${c} ${x}`).join(" + ");
  const lines = ["Minimize", ` cost: ${terms((p) => inst.stock[p.stock]!.price) || "0 x0"}`, "Subject To"];
  items.forEach((item, i) => lines.push(` d${i}: ${terms((p) => p.a[i]!)} >= ${item.quantity}`));
  if (!relax) lines.push("General", ` ${patterns.map((_, j) => `x${j}`).join(" ")}`);
  lines.push("End");
  const result = (await highs()).solve(lines.join("\n"), { output_flag: false, mip_rel_gap: 0 });
  if (result.Status !== "Optimal") throw new Error(`reference solve ended ${result.Status}`);
  return result.ObjectiveValue;
}
