import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  ceilToMultiple,
  decimalToFraction,
  toNumber,
  exact,
  Fraction,
  gcdFractions,
  roundToCents,
  roundToSixteenth,
  sixteenthsHalfUp,
} from "./exact";
import { Q } from "./testing/rational";

const toQ = (f: Fraction) => new Q(f.s * f.n, f.d);
const bigRational = fc.record({
  n: fc.bigInt({ min: -(10n ** 15n), max: 10n ** 15n }),
  d: fc.bigInt({ min: 1n, max: 10n ** 9n }),
});

describe("exact conversion of numbers (checked against BigInt rationals in testing/rational.ts)", () => {
  it("reads a number as the decimal it prints as, including where fraction.js's float conversion misses", () => {
    expect(toQ(exact(123456.789)).eq(new Q(123456789n, 1000n))).toBe(true);
    expect(toQ(exact(0.1)).eq(new Q(1n, 10n))).toBe(true);
    expect(toQ(exact(1e-7)).eq(new Q(1n, 10_000_000n))).toBe(true);
    expect(toQ(exact(-25.875)).eq(new Q(-207n, 8n))).toBe(true);
    expect(() => exact(Number.NaN)).toThrow(/finite/);
  });

  it("agrees with the BigInt decimal parser on any finite double", () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e12, max: 1e12 }), (x) => {
        expect(toQ(exact(x)).eq(Q.decimal(String(x)))).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  it("parses decimal text exactly", () => {
    expect(toQ(decimalToFraction("25.875")).eq(new Q(207n, 8n))).toBe(true);
    expect(() => decimalToFraction("1.2.3")).toThrow();
    expect(() => decimalToFraction("")).toThrow();
  });
});

describe("fraction.js arithmetic against a second rational implementation (BigInt)", () => {
  it("add, sub, mul, div and compare agree", () => {
    fc.assert(
      fc.property(bigRational, bigRational, (a, b) => {
        const fa = new Fraction(a.n, a.d);
        const fb = new Fraction(b.n, b.d);
        const qa = new Q(a.n, a.d);
        const qb = new Q(b.n, b.d);
        expect(toQ(fa.add(fb)).eq(qa.add(qb))).toBe(true);
        expect(toQ(fa.sub(fb)).eq(qa.sub(qb))).toBe(true);
        expect(toQ(fa.mul(fb)).eq(qa.mul(qb))).toBe(true);
        if (b.n !== 0n) expect(toQ(fa.div(fb)).eq(qa.div(qb))).toBe(true);
        expect(Math.sign(fa.compare(fb))).toBe(qa.cmp(qb));
      }),
      { numRuns: 300 },
    );
  });

  it("rounds to the nearest 1/16 with halves going up, like the BigInt nearest-candidate search", () => {
    fc.assert(
      fc.property(bigRational, ({ n, d }) => {
        const f = new Fraction(n, d);
        const expected = new Q(n, d).nearestSixteenth();
        expect(toQ(roundToSixteenth(f)).eq(expected)).toBe(true);
        expect(new Q(sixteenthsHalfUp(f), 16n).eq(expected)).toBe(true);
      }),
      { numRuns: 500 },
    );
  });

  it("puts exact halves of a sixteenth up, toward +∞ (the contract's rounding rule)", () => {
    expect(roundToSixteenth(new Fraction(1, 32)).toFraction()).toBe("1/16");
    expect(roundToSixteenth(new Fraction(-1, 32)).toFraction()).toBe("0");
    expect(roundToSixteenth(new Fraction(3, 32)).toFraction()).toBe("1/8");
    expect(roundToSixteenth(new Fraction(2049, 64)).toFraction()).toBe("32");
  });

  it("rounds money to cents half up", () => {
    expect(roundToCents(new Fraction(1, 8)).toFraction()).toBe("13/100");
    expect(roundToCents(new Fraction(124999, 1000000)).toFraction()).toBe("3/25");
    expect(roundToCents(new Fraction(-1, 8)).toFraction()).toBe("-3/25");
  });

  it("gcd of rationals divides each of them, and ceilToMultiple lands on the least multiple above", () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ n: fc.bigInt({ min: 1n, max: 10n ** 6n }), d: fc.bigInt({ min: 1n, max: 1000n }) }), { minLength: 1, maxLength: 5 }),
        bigRational,
        (values, v) => {
          const fs = values.map((x) => new Fraction(x.n, x.d));
          const g = gcdFractions(fs);
          for (const f of fs) {
            const q = toQ(f).div(toQ(g));
            expect(q.d).toBe(1n);
          }
          const c = toQ(ceilToMultiple(new Fraction(v.n, v.d), g));
          const k = c.div(toQ(g));
          expect(k.d).toBe(1n);
          expect(c.cmp(new Q(v.n, v.d))).toBeGreaterThanOrEqual(0);
          expect(c.sub(toQ(g)).cmp(new Q(v.n, v.d))).toBe(-1);
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe("toNumber", () => {
  it("gives back the double a decimal was written from, even with 17 significant digits", () => {
    expect(toNumber(decimalToFraction("0.043129050170020077"))).toBe(0.043129050170020077);
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (x) => {
        expect(toNumber(decimalToFraction(String(x)))).toBe(x === 0 ? 0 : x);
      }),
    );
  });
  it("rounds a non-terminating fraction to the nearest double", () => {
    expect(toNumber(new Fraction(1n, 3n))).toBe(1 / 3);
    expect(toNumber(new Fraction(2n ** 60n + 1n, 3n * 2n ** 60n))).toBe(1 / 3);
    expect(toNumber(new Fraction(-5n, 127n))).toBe(-5 / 127);
  });
});
