import type { Highs } from "./highs-solver";
import { OPTIMAL } from "./highs-solver";
import type { LpSolution } from "./simplex";

/**
 * The restricted master LP solved by HiGHS's dual/primal simplex (LU
 * factorisation with sparse updates) instead of our dense-inverse simplex:
 * with hundreds of rows the dense inverse costs O(m²) a pivot and HiGHS is
 * far faster. Columns are appended in place and HiGHS keeps its basis between
 * solves, so each round of column generation resumes from the last optimum.
 * Same interface as MasterLp; must be disposed.
 */
export class HighsMaster {
  private readonly model: ReturnType<Highs["createModel"]>;
  private readonly m: number;
  private n = 0;

  constructor(highs: Highs, demand: ArrayLike<number>) {
    this.m = demand.length;
    this.model = highs.createModel({
      numCols: 0,
      numRows: this.m,
      colCost: [],
      colLower: [],
      colUpper: [],
      rowLower: Array.from(demand),
      rowUpper: Array.from({ length: this.m }, () => highs.infinity),
      matrix: { format: "csc", numRows: this.m, numCols: 0, starts: [0], indices: [], values: [] },
    });
    this.model.options.set({ output_flag: false });
    this.infinity = highs.infinity;
  }

  private readonly infinity: number;

  addColumn(cost: number, a: ArrayLike<number>): void {
    const indices: number[] = [];
    const values: number[] = [];
    for (let i = 0; i < a.length; i++) {
      if (a[i] !== 0) {
        indices.push(i);
        values.push(a[i]!);
      }
    }
    this.model.addCol(cost, 0, this.infinity, { indices, values });
    this.n++;
  }

  crashBasis(): void {}

  solve(): LpSolution {
    const status = this.model.run().modelStatus;
    if (status !== OPTIMAL) throw new Error(`master LP: HiGHS stopped with status ${status}`);
    const sol = this.model.getSolution();
    return { objective: this.model.getObjectiveValue(), x: Float64Array.from(sol.colValue), y: Float64Array.from(sol.rowDual, (v) => Math.max(0, v)) };
  }

  dispose(): void {
    this.model.dispose();
  }
}
