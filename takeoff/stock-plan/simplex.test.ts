import fc from "fast-check";
import highsLoader from "highs";
import { describe, expect, it } from "vitest";
import { MasterLp } from "./simplex";

/** Random covering LPs shaped like cutting-stock masters: single-item columns first, then mixed patterns. */
const master = fc
  .integer({ min: 1, max: 8 })
  .chain((m) =>
    fc.record({
      demand: fc.array(fc.integer({ min: 0, max: 500 }), { minLength: m, maxLength: m }),
      single: fc.array(fc.record({ a: fc.integer({ min: 1, max: 9 }), c: fc.integer({ min: 1, max: 5000 }) }), { minLength: m, maxLength: m }),
      mixed: fc.array(
        fc.record({ a: fc.array(fc.integer({ min: 0, max: 4 }), { minLength: m, maxLength: m }), c: fc.integer({ min: 1, max: 5000 }) }),
        { maxLength: 40 },
      ),
    }),
  );

describe("restricted master LP (own revised simplex) against HiGHS LP (highs package)", () => {
  it("finds the same optimum, a feasible primal, and duals whose objective matches (strong duality)", async () => {
    const highs = await highsLoader();
    fc.assert(
      fc.property(master, ({ demand, single, mixed }) => {
        const m = demand.length;
        const cols = [
          ...single.map((s, i) => ({ a: Array.from({ length: m }, (_, k) => (k === i ? s.a : 0)), c: s.c / 100 })),
          ...mixed.filter((x) => x.a.some((v) => v > 0)).map((x) => ({ a: x.a, c: x.c / 100 })),
        ];
        const lp = new MasterLp(demand);
        for (const col of cols) lp.addColumn(col.c, col.a);
        lp.crashBasis();
        const sol = lp.solve();
        const text = [
          "Minimize",
          ` cost: ${cols.map((col, j) => `${col.c} x${j}`).join(" + ")}`,
          "Subject To",
          ...demand.map((d, i) => ` r${i}: ${cols.map((col, j) => `${col.a[i]} x${j}`).join(" + ")} >= ${d}`),
          "End",
        ].join("\n");
        const ref = highs.solve(text, { output_flag: false });
        expect(ref.Status).toBe("Optimal");
        expect(sol.objective).toBeCloseTo(ref.ObjectiveValue, 6);
        demand.forEach((d, i) => {
          const covered = cols.reduce((t, col, j) => t + (col.a[i] ?? 0) * (sol.x[j] ?? 0), 0);
          expect(covered).toBeGreaterThanOrEqual(d - 1e-7);
        });
        const dualObjective = demand.reduce((t, d, i) => t + d * (sol.y[i] ?? 0), 0);
        expect(dualObjective).toBeCloseTo(ref.ObjectiveValue, 6);
        for (const y of sol.y) expect(y).toBeGreaterThanOrEqual(-1e-9);
      }),
      { numRuns: 100 },
    );
  });
});
