import { dollarsToCents, formatLength } from "@/takeoff";

const dollars = new Intl.NumberFormat("en-US", { style: "currency", currency: "USD", minimumFractionDigits: 2, maximumFractionDigits: 2 });
const oneDecimal = new Intl.NumberFormat("en-US", { minimumFractionDigits: 1, maximumFractionDigits: 1 });
const whole = new Intl.NumberFormat("en-US", { maximumFractionDigits: 0 });

/**
 * US dollars to the cent: $1,234.50 — the one money formatter of the product (screens, bid PDF, mail,
 * price book). Rounded half up the way the engine rounds money (dollarsToCents), so a figure reads the
 * same wherever it is shown; a rounding remainder never prints as "-$0.00".
 */
export function usd(amount: number): string {
  if (!Number.isFinite(amount)) return dollars.format(amount);
  const rounded = dollarsToCents(amount);
  return dollars.format(rounded === 0 ? 0 : rounded);
}

/** A cut length as read off a tape: 5'-2 5/8"; under a foot in inches alone (11/16", 7 1/2"), as a crew says it. */
export const tapeLength = (inches: number) => formatLength(inches, { style: inches < 12 - 1 / 32 ? "inches" : "feet-inches" });

/** A width or thickness, which nobody reads in feet: 2 1/2". */
export const inchesText = (inches: number) => formatLength(inches);

/** Stock lengths are sold in whole feet (8', 10', 12'); anything else reads as a tape. */
export function stockLength(inches: number): string {
  return Number.isInteger(inches / 12) ? `${inches / 12}'` : tapeLength(inches);
}

/** Linear feet for totals and waste, one decimal: 436.6. */
export const feet = (ft: number) => oneDecimal.format(Math.abs(ft) < 0.05 ? 0 : ft);

export const count = (n: number) => whole.format(n);

/** A ratio as a percent, one decimal: 0.8947 → 89.5 %. */
export const ratioPercent = (ratio: number) => `${oneDecimal.format(ratio * 100)} %`;

/** A figure already in percent (gapPercent): 2.345 → 2.3 %. */
export const percent = (value: number) => `${oneDecimal.format(Math.abs(value) < 0.05 ? 0 : value)} %`;

/** Labour minutes as hours, one decimal: 1155 → 19.3 h. */
export const hours = (minutes: number) => `${oneDecimal.format(minutes / 60)} h`;
