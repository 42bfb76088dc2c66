import Fraction from "fraction.js";

export { Fraction };

const DECIMAL = /^([+-]?)(\d*)(?:\.(\d*))?(?:e([+-]?\d+))?$/i;

/**
 * Exact rational value of a decimal numeral such as "25.875", "-0.1" or "1e-7".
 * Done with BigInt so that "0.1" is exactly 1/10; fraction.js's own float
 * conversion is a continued-fraction approximation and can miss (123456.789).
 */
export function decimalToFraction(text: string): Fraction {
  const m = DECIMAL.exec(text.trim());
  const intPart = m?.[2] ?? "";
  const fracPart = m?.[3] ?? "";
  if (!m || intPart.length + fracPart.length === 0) throw new Error(`not a decimal number: "${text}"`);
  let n = BigInt(intPart + fracPart || "0");
  let d = 10n ** BigInt(fracPart.length);
  const exp = Number(m[4] ?? 0);
  if (exp > 0) n *= 10n ** BigInt(exp);
  if (exp < 0) d *= 10n ** BigInt(-exp);
  if (m[1] === "-") n = -n;
  return new Fraction(n, d);
}

const exactCache = new Map<number, Fraction>();
const EXACT_CACHE_LIMIT = 4096;

/**
 * Exact rational for a JS number, read as the shortest decimal that prints it.
 * That is the value a person typed (25.875, 0.1), which is what the trade means.
 * Fractions are immutable, so recent conversions are shared from a small cache.
 */
export function exact(x: number): Fraction {
  const hit = exactCache.get(x);
  if (hit) return hit;
  if (!Number.isFinite(x)) throw new Error(`not a finite number: ${x}`);
  const f = decimalToFraction(String(x));
  if (exactCache.size >= EXACT_CACHE_LIMIT) exactCache.clear();
  exactCache.set(x, f);
  return f;
}

/** floor(n / d) for BigInt with d > 0 (BigInt division truncates toward zero). */
export function floorDiv(n: bigint, d: bigint): bigint {
  const q = n / d;
  return n % d !== 0n && n < 0n ? q - 1n : q;
}

/** ceil(n / d) for BigInt with d > 0. */
export function ceilDiv(n: bigint, d: bigint): bigint {
  return -floorDiv(-n, d);
}

/** Signed numerator of a fraction (fraction.js keeps the sign apart). */
export function numer(f: Fraction): bigint {
  return f.s * f.n;
}

/** Count of sixteenths nearest to f; a half sixteenth rounds up (toward +∞). */
export function sixteenthsHalfUp(f: Fraction): bigint {
  // floor(16 f + 1/2) = floor((32 n + d) / (2 d))
  return floorDiv(32n * numer(f) + f.d, 2n * f.d);
}

/** f rounded to the nearest 1/16 in, half up: the precision a tape and a saw work to. */
export function roundToSixteenth(f: Fraction): Fraction {
  return new Fraction(sixteenthsHalfUp(f), 16n);
}

/** Rounded to 1/16 and returned as a number (every multiple of 1/16 is exact in binary). */
export function inchesOut(f: Fraction): number {
  return roundToSixteenth(f).valueOf();
}

/** Rounds half up to whole cents; money is reported in cents. */
export function roundToCents(f: Fraction): Fraction {
  return new Fraction(floorDiv(200n * numer(f) + f.d, 2n * f.d), 100n);
}

/**
 * Dollars to the cent, half up, reading x as the decimal it prints as: 1.005 is $1.01, where
 * Math.round(1.005 * 100) gives 100 because 1.005 * 100 is 100.49999999999999 in binary floating point.
 */
export function dollarsToCents(x: number): number {
  return roundToCents(exact(x)).valueOf();
}

export function sumFractions(values: Iterable<Fraction>): Fraction {
  let total = new Fraction(0);
  for (const v of values) total = total.add(v);
  return total;
}

/** gcd of non-negative rationals: gcd of numerators over lcm of denominators. */
export function gcdFractions(values: readonly Fraction[]): Fraction {
  let g = new Fraction(0);
  for (const v of values) g = g.gcd(v);
  return g;
}

/** Smallest multiple of step that is ≥ value (step > 0); value itself when step is 0. */
export function ceilToMultiple(value: Fraction, step: Fraction): Fraction {
  if (step.n === 0n) return value;
  const q = value.div(step);
  return step.mul(ceilDiv(numer(q), q.d));
}

const EXACT_INTEGER = 2n ** 53n;
const GUARD_DIGITS = 40;

/**
 * The double nearest to f. fraction.js divides Number(n) by Number(d), which rounds twice once either
 * passes 2^53, so "0.043129050170020077" read back as a different double and a stored length
 * shown for editing and saved untouched came back changed. Small terms still divide directly (one
 * correctly rounded division); larger ones go through a decimal string, which Number() rounds once:
 * written out exactly when it terminates (every tie between two doubles does), else to 40 digits and
 * a sticky 1 so a non-terminating value never looks like a tie.
 */
export function toNumber(f: Fraction): number {
  if (f.n < EXACT_INTEGER && f.d < EXACT_INTEGER) return Number(numer(f)) / Number(f.d);
  let rest = f.d;
  let twos = 0;
  let fives = 0;
  while (rest % 2n === 0n) {
    rest /= 2n;
    twos++;
  }
  while (rest % 5n === 0n) {
    rest /= 5n;
    fives++;
  }
  const k = rest === 1n ? Math.max(twos, fives) : Math.max(0, GUARD_DIGITS + f.d.toString().length - f.n.toString().length);
  const scaled = f.n * 10n ** BigInt(k);
  const digits = `${scaled / f.d}${scaled % f.d === 0n ? "" : "1"}`;
  const exponent = k + (scaled % f.d === 0n ? 0 : 1);
  return Number(`${f.s < 0n ? "-" : ""}${digits}e-${exponent}`);
}
