import { exact, Fraction, sixteenthsHalfUp } from "./exact";

export type LengthStyle = "inches" | "feet-inches";

/** "7/8", "1/2", "" for whole inches: the sixteenths reduced to lowest terms. */
function fractionPart(sixteenths: bigint): string {
  if (sixteenths === 0n) return "";
  const f = new Fraction(sixteenths, 16n);
  return `${f.n}/${f.d}`;
}

function inchesText(sixteenths: bigint, showZeroWhole: boolean): string {
  const whole = sixteenths / 16n;
  const frac = fractionPart(sixteenths % 16n);
  if (frac === "") return `${whole}"`;
  if (whole === 0n && !showZeroWhole) return `${frac}"`;
  return `${whole} ${frac}"`;
}

/**
 * Writes inches as a carpenter reads them: 25 7/8", 1/2", 12", or with
 * "feet-inches" 2'-1 7/8", 3'-0", 0'-7 1/2". The value is rounded to the
 * nearest 1/16 (half up) first, so 35 31/32 carries to 3'-0".
 */
export function formatLength(inches: number, opts: { style?: LengthStyle } = {}): string {
  const total = sixteenthsHalfUp(exact(inches));
  const sign = total < 0n ? "-" : "";
  const abs = total < 0n ? -total : total;
  if ((opts.style ?? "inches") === "inches") return sign + inchesText(abs, false);
  const feet = abs / 192n;
  return `${sign}${feet}'-${inchesText(abs % 192n, true)}`;
}

/** Finest fraction a setting is written in: kerfs and reveals come in 1/32 and 1/64 steps (3/32" blades). */
const FINE_DENOMINATOR = 64n;

/**
 * A length as a form shows it for editing, exact so that saving an untouched form stores the same
 * number: 3/32", 2 11/16", 15/64" when the value lies on a 1/64, else decimal inches (a value typed
 * in millimetres). formatLength rounds to the 1/16 for reading; here rounding would silently turn a
 * 3/32" kerf into 1/8" on the next save.
 */
export function formatLengthExact(inches: number): string {
  const f = exact(inches);
  const sign = f.s < 0n ? "-" : "";
  if (FINE_DENOMINATOR % f.d !== 0n) return `${sign}${decimalText(Math.abs(inches))}"`;
  const whole = f.n / f.d;
  const rest = f.n % f.d;
  if (rest === 0n) return `${sign}${whole}"`;
  return `${sign}${whole === 0n ? "" : `${whole} `}${rest}/${f.d}"`;
}

// String(x) is the shortest text that reads back as the same double; below 1e-6 it is written with an
// exponent, which no length is, so the same digits are moved behind the point instead.
function decimalText(x: number): string {
  const [mantissa = "", exponent] = String(x).split("e");
  if (exponent === undefined) return mantissa;
  const point = (mantissa.includes(".") ? mantissa.indexOf(".") : mantissa.length) + Number(exponent);
  const digits = mantissa.replace(".", "");
  return point <= 0 ? `0.${"0".repeat(-point)}${digits}` : `${digits.slice(0, point).padEnd(point, "0")}.${digits.slice(point) || "0"}`;
}
