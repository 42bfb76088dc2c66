/**
 * Money, minutes and percentages as people type them. Decimal text is read digit by digit so "8.25" %
 * becomes exactly the double nearest 0.0825 — the same number the engine would get from a typed 0.0825.
 */
import { usd } from "@/lib/takeoffs/format";

export type NumberRead = { ok: true; value: number } | { ok: false; message: string };

const DECIMAL = /^(\d+)(?:\.(\d*))?$|^\.(\d+)$/;
// "1,234.50": commas only as thousands separators, so "1,5" is refused rather than read as 15.
const THOUSANDS = /^\d{1,3}(?:,\d{3})+(?:\.\d*)?$/;

interface DecimalRules {
  label: string;
  max: number;
  /** Most digits after the point: 2 for dollars and cents. */
  decimals: number;
  /** Accept a leading "$" (prices typed or pasted from a spreadsheet). */
  dollars?: boolean;
  unit?: string;
}

function tooMany(value: number, decimals: number) {
  const scaled = value * 10 ** decimals;
  return Math.abs(scaled - Math.round(scaled)) > 1e-6 * Math.max(1, Math.abs(scaled));
}

export function readDecimal(input: number | string, rules: DecimalRules): NumberRead {
  const { label, max, decimals } = rules;
  const example = rules.dollars ? "14.20" : "45";
  let value: number;
  if (typeof input === "number") {
    if (!Number.isFinite(input)) return { ok: false, message: `${label} must be a number.` };
    value = input;
  } else {
    let t = input.trim();
    if (t === "") return { ok: false, message: `${label} is required.` };
    if (rules.dollars) t = t.replace(/^\$\s*/, "");
    if (THOUSANDS.test(t)) t = t.replace(/,/g, "");
    if (/^-/.test(t)) return { ok: false, message: `${label} must be zero or more.` };
    const m = DECIMAL.exec(t);
    if (!m) return { ok: false, message: `${label}: write a number such as ${example}.` };
    const fraction = m[2] ?? m[3] ?? "";
    if (fraction.length > decimals) return { ok: false, message: decimalsMessage(label, decimals, rules.dollars) };
    value = Number(`${m[1] ?? "0"}.${fraction || "0"}`);
  }
  if (value < 0) return { ok: false, message: `${label} must be zero or more.` };
  if (value > max) return { ok: false, message: `${label} must be at most ${rules.dollars ? formatMoney(max) : max}${rules.unit ?? ""}.` };
  if (tooMany(value, decimals)) return { ok: false, message: decimalsMessage(label, decimals, rules.dollars) };
  return { ok: true, value };
}

const decimalsMessage = (label: string, decimals: number, dollars?: boolean) =>
  dollars && decimals === 2 ? `${label} must be in dollars and cents (at most 2 decimals).` : `${label} must have at most ${decimals} decimals.`;

/** $1,234.50: the one money formatter (lib/takeoffs/format.ts), under the name the price-book code calls it by. */
export const formatMoney = usd;

/** 14.2 → "14.20": how prices are written into CSV cells and edit boxes (no "$", no thousands commas). */
export const moneyText = (dollars: number) => dollars.toFixed(2);

/** 0.0825 → "8.25": a fraction as the percent people type, without float noise (8.250000000000002). */
export function percentText(fraction: number): string {
  return String(Number((fraction * 100).toFixed(6)));
}

/** "8.25", "8.25 %", "8.25%" → 0.0825. Up to 4 decimals of a percent (0.0001 %). */
export function readPercent(text: string, label: string, maxPercent: number): NumberRead {
  const read = readDecimal(text.replace(/\s*%\s*$/, ""), { label, max: maxPercent, decimals: 4, unit: " %" });
  if (!read.ok) return read;
  // Digits over a power of ten: the division of two exact integers is correctly rounded.
  const [whole = "0", frac = ""] = text.replace(/[%\s,]/g, "").split(".");
  return { ok: true, value: Number(`${whole}${frac}`) / 10 ** (frac.length + 2) };
}
