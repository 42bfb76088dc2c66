import { decimalToFraction, Fraction, toNumber } from "./exact";

/**
 * Inches per metric unit. 1 in = 25.4 mm exactly (International Yard and Pound
 * Agreement, 1959; NIST Handbook 44 Appendix C), so 1 mm = 5/127 in.
 */
const INCHES_PER: Record<string, Fraction> = {
  mm: new Fraction(5, 127),
  cm: new Fraction(50, 127),
  m: new Fraction(5000, 127),
};

const DEC = String.raw`\d+(?:\.\d+)?|\.\d+`;
/** A whole number, decimal, fraction, or whole and fraction joined by spaces or a hyphen. */
const QTY = String.raw`(?:(\d+)(?:\s+|\s*-\s*))?(\d+)\s*\/\s*(\d+)|(${DEC})`;
const FEET = new RegExp(String.raw`^(?:${QTY})\s*(?:'|feet|foot|ft\.?)`);
const INCHES = new RegExp(String.raw`^(?:${QTY})\s*(?:"|inches|inch|in\.?)?$`);
const METRIC = new RegExp(String.raw`^(${DEC})\s*(mm|cm|m)$`);

function quantity(m: RegExpExecArray, text: string): Fraction {
  const [, whole, num, den, dec] = m;
  if (dec !== undefined) return decimalToFraction(dec);
  const d = BigInt(den ?? "0");
  if (d === 0n) throw new Error(`zero denominator in length "${text}"`);
  const n = BigInt(num ?? "0");
  if (whole === undefined) return new Fraction(n, d);
  if (n >= d) throw new Error(`malformed length "${text}": fraction after a whole number must be below 1`);
  return new Fraction(BigInt(whole) * d + n, d);
}

/** The exact inches a length written by a person stands for. */
export function parseLengthExact(text: string): Fraction {
  if (typeof text !== "string") throw new Error("length must be text");
  const s = text
    .trim()
    .toLowerCase()
    .replace(/[\u2032\u2019]/g, "'")
    .replace(/[\u2033\u201d]|''/g, '"');
  if (s === "") throw new Error("length is empty");

  const metric = METRIC.exec(s);
  if (metric) return decimalToFraction(metric[1] ?? "").mul(INCHES_PER[metric[2] ?? ""] ?? 0);

  let rest = s;
  let total = new Fraction(0);
  const feet = FEET.exec(rest);
  if (feet) {
    total = quantity(feet, text).mul(12);
    rest = rest.slice(feet[0].length).trim();
    if (rest === "") return total;
    // The dash between feet and inches (2'-1 7/8") only separates.
    rest = rest.replace(/^-\s*/, "");
  }
  const inches = INCHES.exec(rest);
  if (!inches) throw new Error(`cannot read length "${text}"`);
  return total.add(quantity(inches, text));
}

/**
 * Parses 25, 25.875, 25 7/8, 25-7/8, 7/8, 25 7/8", 2', 2'-1 7/8", 2' 1 7/8",
 * 2'1-7/8", 2 ft 1 7/8 in, 635 mm, 63.5 cm, 0.635 m. Returns inches as typed,
 * not rounded: rounding to the saw's 1/16 happens when lengths are output.
 */
export function parseLength(text: string): number {
  return toNumber(parseLengthExact(text));
}
