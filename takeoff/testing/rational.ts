/**
 * A second, independent rational arithmetic on BigInt for tests: the engine
 * uses fraction.js, and its results are checked against this.
 */
function gcd(a: bigint, b: bigint): bigint {
  let x = a < 0n ? -a : a;
  let y = b < 0n ? -b : b;
  while (y) [x, y] = [y, x % y];
  return x;
}

export class Q {
  readonly n: bigint;
  readonly d: bigint;

  constructor(n: bigint, d: bigint = 1n) {
    if (d === 0n) throw new Error("zero denominator");
    const sign = d < 0n ? -1n : 1n;
    const g = gcd(n, d) || 1n;
    this.n = (sign * n) / g;
    this.d = (sign * d) / g;
  }

  /** Exact value of a decimal numeral such as "25.875" or "1e-7". */
  static decimal(text: string): Q {
    const m = /^(-?)(\d*)\.?(\d*)(?:e([+-]?\d+))?$/i.exec(text);
    if (!m) throw new Error(`bad decimal ${text}`);
    const digits = BigInt(`${m[2] ?? ""}${m[3] ?? ""}` || "0");
    let q = new Q(m[1] === "-" ? -digits : digits, 10n ** BigInt((m[3] ?? "").length));
    const e = Number(m[4] ?? 0);
    q = e >= 0 ? q.mul(new Q(10n ** BigInt(e))) : q.div(new Q(10n ** BigInt(-e)));
    return q;
  }

  static of(x: number | bigint | Q): Q {
    if (x instanceof Q) return x;
    if (typeof x === "bigint") return new Q(x);
    return Q.decimal(String(x));
  }

  add(o: number | Q): Q {
    const b = Q.of(o);
    return new Q(this.n * b.d + b.n * this.d, this.d * b.d);
  }
  sub(o: number | Q): Q {
    const b = Q.of(o);
    return new Q(this.n * b.d - b.n * this.d, this.d * b.d);
  }
  mul(o: number | Q): Q {
    const b = Q.of(o);
    return new Q(this.n * b.n, this.d * b.d);
  }
  div(o: number | Q): Q {
    const b = Q.of(o);
    return new Q(this.n * b.d, this.d * b.n);
  }
  cmp(o: number | Q): number {
    const b = Q.of(o);
    const l = this.n * b.d;
    const r = b.n * this.d;
    return l < r ? -1 : l > r ? 1 : 0;
  }
  eq(o: number | Q): boolean {
    return this.cmp(o) === 0;
  }
  toString(): string {
    return `${this.n}/${this.d}`;
  }
  toNumber(): number {
    return Number(this.n) / Number(this.d);
  }
  /** Nearest multiple of 1/16, ties toward +∞, found by comparing the two candidates' distances. */
  nearestSixteenth(): Q {
    const scaled = this.mul(16);
    let lo = scaled.n / scaled.d;
    if (scaled.n < 0n && scaled.n % scaled.d !== 0n) lo -= 1n;
    const below = scaled.sub(new Q(lo));
    const above = new Q(lo + 1n).sub(scaled);
    return new Q(below.cmp(above) >= 0 ? lo + 1n : lo, 16n);
  }
}
