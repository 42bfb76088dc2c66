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
