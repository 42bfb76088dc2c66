/**
 * Primal revised simplex for the restricted master LP of column generation:
 *   minimise c·x  subject to  A x ≥ d,  x ≥ 0,
 * with sparse columns and a dense explicit basis inverse (a job has tens of
 * rows, so an m×m inverse is a few thousand numbers; 500 sizes make 250,000,
 * still cheap). Each pivot updates the inverse in product form touching only
 * the nonzeros of the pivot row, and the duals in O(m) from the same row, so
 * a pivot is O(m · nonzeros) rather than O(m²) twice over; the inverse is
 * rebuilt from the basis columns every max(64, m) pivots, which keeps the
 * O(m³) rebuild below the cost of the pivots between. Adding a column keeps
 * the basis primal feasible, so each round of column generation resumes with
 * a few pivots. Bland's rule takes over after a run of degenerate pivots so
 * the method cannot cycle.
 *
 * It only has to be good, not trusted: the lower bound the engine reports is
 * proven separately from the duals (Farley's bound, column-generation.ts), and
 * the tests cross-check its optimum against the HiGHS solver.
 */
export interface LpSolution {
  objective: number;
  /** Value of each structural column, in the order added. */
  x: Float64Array;
  /** Row duals (c_B B⁻¹); ≥ 0 at an optimum. */
  y: Float64Array;
}

const REFACTOR_MIN = 64;
const PIVOT_TOL = 1e-9;
const DEGENERATE_SWITCH = 40;

interface SparseColumn {
  idx: Int32Array;
  val: Float64Array;
}

export class MasterLp {
  private readonly m: number;
  private readonly d: Float64Array;
  private readonly costs: number[] = [];
  private readonly cols: SparseColumn[] = [];
  /** basic[r] ≥ 0: structural column; < 0: surplus of row −basic[r]−1. */
  private readonly basic: Int32Array;
  private basicCol = new Uint8Array(64);
  private readonly basicSurplus: Uint8Array;
  private binv: Float64Array;
  private readonly xb: Float64Array;
  /** Scratch for a pivot: nonzero positions and values of the pivot row. */
  private readonly nz: Int32Array;
  private readonly pivotRow: Float64Array;
  /** Row duals c_B B⁻¹, kept current across pivots. */
  private y: Float64Array;
  private pivots = 0;
  private ready = false;

  constructor(demand: ArrayLike<number>) {
    this.m = demand.length;
    this.d = Float64Array.from(demand);
    this.basic = new Int32Array(this.m);
    this.basicSurplus = new Uint8Array(this.m).fill(1);
    this.binv = new Float64Array(this.m * this.m);
    this.xb = new Float64Array(this.m);
    this.y = new Float64Array(this.m);
    this.nz = new Int32Array(this.m);
    this.pivotRow = new Float64Array(this.m);
    for (let r = 0; r < this.m; r++) this.basic[r] = -r - 1;
  }

  addColumn(cost: number, a: ArrayLike<number>): void {
    const idx: number[] = [];
    const val: number[] = [];
    for (let i = 0; i < a.length; i++) {
      if (a[i] !== 0) {
        idx.push(i);
        val.push(a[i]!);
      }
    }
    this.cols.push({ idx: Int32Array.from(idx), val: Float64Array.from(val) });
    this.costs.push(cost);
    if (this.cols.length > this.basicCol.length) {
      const grown = new Uint8Array(this.basicCol.length * 2);
      grown.set(this.basicCol);
      this.basicCol = grown;
    }
  }

  /**
   * Must be called once before solve(). Starts from one single-item column
   * per demanded row (its cheapest per piece): a diagonal, primal feasible
   * basis, so no phase one is needed.
   */
  crashBasis(): void {
    const best = new Int32Array(this.m).fill(-1);
    const rate = new Float64Array(this.m).fill(Infinity);
    this.cols.forEach((col, j) => {
      if (col.idx.length !== 1 || !(col.val[0]! > 0)) return;
      const r = col.idx[0]!;
      const perPiece = this.costs[j]! / col.val[0]!;
      if (perPiece < rate[r]!) {
        rate[r] = perPiece;
        best[r] = j;
      }
    });
    this.basicCol.fill(0);
    this.basicSurplus.fill(0);
    for (let r = 0; r < this.m; r++) {
      if (this.d[r]! > 0 && best[r]! < 0) throw new Error(`master LP: row ${r} has no single-item column to start from`);
      const v = this.d[r]! > 0 ? best[r]! : -r - 1;
      this.basic[r] = v;
      if (v >= 0) this.basicCol[v] = 1;
      else this.basicSurplus[r] = 1;
    }
    this.refactor();
    this.ready = true;
  }

  private setBasic(r: number, v: number): void {
    const old = this.basic[r]!;
    if (old >= 0) this.basicCol[old] = 0;
    else this.basicSurplus[-old - 1] = 0;
    this.basic[r] = v;
    if (v >= 0) this.basicCol[v] = 1;
    else this.basicSurplus[-v - 1] = 1;
  }

  private cost(v: number): number {
    return v >= 0 ? this.costs[v]! : 0;
  }

  /** Fixed order of all variables (structurals, then surpluses) for Bland's rule. */
  private order(v: number): number {
    return v >= 0 ? v : this.cols.length - v;
  }

  /** Gauss–Jordan inverse of the basis with partial pivoting, then x_B = B⁻¹ d. */
  private refactor(): void {
    const m = this.m;
    const a = new Float64Array(m * m);
    for (let r = 0; r < m; r++) {
      const v = this.basic[r]!;
      if (v < 0) a[(-v - 1) * m + r] = -1;
      else {
        const col = this.cols[v]!;
        for (let t = 0; t < col.idx.length; t++) a[col.idx[t]! * m + r] = col.val[t]!;
      }
    }
    const inv = new Float64Array(m * m);
    for (let k = 0; k < m; k++) inv[k * m + k] = 1;
    const nz = new Int32Array(m);
    for (let c = 0; c < m; c++) {
      let p = c;
      for (let k = c + 1; k < m; k++) if (Math.abs(a[k * m + c]!) > Math.abs(a[p * m + c]!)) p = k;
      const piv = a[p * m + c]!;
      // Rounding drift made the basis numerically singular: restart from the diagonal one.
      if (Math.abs(piv) < 1e-12) return this.crashBasis();
      if (p !== c) {
        for (let j = 0; j < m; j++) {
          [a[p * m + j], a[c * m + j]] = [a[c * m + j]!, a[p * m + j]!];
          [inv[p * m + j], inv[c * m + j]] = [inv[c * m + j]!, inv[p * m + j]!];
        }
      }
      // Basis columns are sparse: eliminate along the nonzeros of the pivot row only.
      let count = 0;
      for (let j = 0; j < m; j++) {
        a[c * m + j]! /= piv;
        inv[c * m + j]! /= piv;
      }
      for (let j = c + 1; j < m; j++) if (a[c * m + j] !== 0) nz[count++] = j;
      const aCount = count;
      for (let j = 0; j < m; j++) if (inv[c * m + j] !== 0) nz[count++] = j;
      for (let k = 0; k < m; k++) {
        const f = a[k * m + c]!;
        if (k === c || f === 0) continue;
        const row = k * m;
        const src = c * m;
        a[row + c] = 0;
        for (let t = 0; t < aCount; t++) a[row + nz[t]!]! -= f * a[src + nz[t]!]!;
        for (let t = aCount; t < count; t++) inv[row + nz[t]!]! -= f * inv[src + nz[t]!]!;
      }
    }
    this.binv = inv;
    for (let r = 0; r < m; r++) {
      let s = 0;
      for (let k = 0; k < m; k++) s += inv[r * m + k]! * this.d[k]!;
      this.xb[r] = Math.max(0, s);
    }
    this.pivots = 0;
    this.y = this.duals();
  }

  private duals(): Float64Array {
    const m = this.m;
    const y = new Float64Array(m);
    for (let r = 0; r < m; r++) {
      const c = this.cost(this.basic[r]!);
      if (c === 0) continue;
      for (let k = 0; k < m; k++) y[k]! += c * this.binv[r * m + k]!;
    }
    return y;
  }

  /** Entering variable: most negative reduced cost, or the first one under Bland's rule. */
  private entering(y: Float64Array, bland: boolean, tol: number): number | undefined {
    let enter: number | undefined;
    let best = -tol;
    for (let j = 0; j < this.cols.length; j++) {
      if (this.basicCol[j]) continue;
      const col = this.cols[j]!;
      let rc = this.costs[j]!;
      for (let t = 0; t < col.idx.length; t++) rc -= y[col.idx[t]!]! * col.val[t]!;
      if (rc < best) {
        if (bland) return j;
        best = rc;
        enter = j;
      }
    }
    for (let r = 0; r < this.m; r++) {
      // Surplus column −e_r has reduced cost y_r.
      if (this.basicSurplus[r] || !(y[r]! < best)) continue;
      if (bland) return -r - 1;
      best = y[r]!;
      enter = -r - 1;
    }
    return enter;
  }

  /** Runs primal simplex pivots until no column or surplus prices out. */
  solve(): LpSolution {
    if (!this.ready) throw new Error("master LP: crashBasis() must run first");
    const m = this.m;
    const tol = 1e-9 * Math.max(1, ...this.costs);
    let degenerate = 0;
    for (let guard = 0; guard < 1_000_000; guard++) {
      const y = this.y;
      const enter = this.entering(y, degenerate >= DEGENERATE_SWITCH, tol);
      if (enter === undefined) return this.solution(y);
      const u = new Float64Array(m);
      if (enter < 0) {
        const k = -enter - 1;
        for (let r = 0; r < m; r++) u[r] = -this.binv[r * m + k]!;
      } else {
        const col = this.cols[enter]!;
        for (let r = 0; r < m; r++) {
          let s = 0;
          for (let t = 0; t < col.idx.length; t++) s += this.binv[r * m + col.idx[t]!]! * col.val[t]!;
          u[r] = s;
        }
      }
      const bland = degenerate >= DEGENERATE_SWITCH;
      let leave = -1;
      let ratio = Infinity;
      for (let r = 0; r < m; r++) {
        if (u[r]! <= PIVOT_TOL) continue;
        const t = this.xb[r]! / u[r]!;
        const tie = leave >= 0 && t <= ratio + 1e-12;
        const preferred = tie && (bland ? this.order(this.basic[r]!) < this.order(this.basic[leave]!) : u[r]! > u[leave]!);
        if (t < ratio - 1e-12 || preferred) {
          ratio = t;
          leave = r;
        }
      }
      if (leave < 0) throw new Error("master LP: unbounded (a board with negative cost?)");
      degenerate = ratio <= 1e-12 ? degenerate + 1 : 0;
      this.pivot(leave, enter, u, ratio, this.reducedCost(enter, y));
    }
    throw new Error("master LP: iteration limit");
  }

  private reducedCost(v: number, y: Float64Array): number {
    if (v < 0) return y[-v - 1]!;
    const col = this.cols[v]!;
    let rc = this.costs[v]!;
    for (let t = 0; t < col.idx.length; t++) rc -= y[col.idx[t]!]! * col.val[t]!;
    return rc;
  }

  private pivot(leave: number, enter: number, u: Float64Array, ratio: number, rc: number): void {
    const m = this.m;
    const inv = this.binv;
    const pr = u[leave]!;
    const row = leave * m;
    const nz = this.nz;
    const pivotRow = this.pivotRow;
    let count = 0;
    for (let k = 0; k < m; k++) {
      const v = inv[row + k]!;
      if (v === 0) continue;
      nz[count] = k;
      pivotRow[count++] = v / pr;
    }
    const y = this.y;
    for (let t = 0; t < count; t++) {
      const k = nz[t]!;
      inv[row + k] = pivotRow[t]!;
      // New duals: y + d_q · (row `leave` of the new inverse), d_q the entering reduced cost.
      y[k]! += rc * pivotRow[t]!;
    }
    for (let r = 0; r < m; r++) {
      const f = u[r]!;
      if (r === leave || f === 0) continue;
      const base = r * m;
      for (let t = 0; t < count; t++) inv[base + nz[t]!]! -= f * pivotRow[t]!;
      this.xb[r] = Math.max(0, this.xb[r]! - f * ratio);
    }
    this.xb[leave] = ratio;
    this.setBasic(leave, enter);
    if (++this.pivots >= Math.max(REFACTOR_MIN, m)) this.refactor();
  }

  private solution(y: Float64Array): LpSolution {
    const x = new Float64Array(this.cols.length);
    let objective = 0;
    for (let r = 0; r < this.m; r++) {
      const v = this.basic[r]!;
      if (v < 0) continue;
      x[v] = this.xb[r]!;
      objective += this.costs[v]! * this.xb[r]!;
    }
    return { objective, x, y: Float64Array.from(y) };
  }
}
