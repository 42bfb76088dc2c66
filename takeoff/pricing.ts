import { jobPieces } from "./demand";
import { exact, Fraction, roundToCents } from "./exact";
import { bidRatesSchema, labourRatesSchema } from "./schemas";
import type { Style, TakeoffLine } from "./types";
import { parseOrThrow } from "./validate";

/** A contractor's own production rates; no defaults, crews differ too much. */
export interface LabourRates {
  minutesPerOpening: Record<Style, number>;
  /** Extensions are ripped, glued and fitted per foot, so they are priced on length. */
  minutesPerExtensionFoot: number;
  hourlyRate: number;
}

export interface BidRates {
  /** Markup on cost, as a fraction: 0.15 is 15 %. */
  markup: number;
  /** Sales tax rate as a fraction: 0.0825 is 8.25 %. */
  taxRate: number;
  /** Tax labour too. Default false: many jurisdictions tax materials only; check yours. */
  taxLabour?: boolean;
}

export interface Bid {
  material: number;
  labour: number;
  subtotal: number;
  markup: number;
  tax: number;
  total: number;
}

const cents = (f: Fraction) => roundToCents(f).valueOf();

function exactLabourMinutes(lines: readonly TakeoffLine[], rates: LabourRates): Fraction {
  const r = parseOrThrow(labourRatesSchema, rates, "rates");
  const pieces = jobPieces(lines); // validates every line first
  let minutes = new Fraction(0);
  for (const line of lines) minutes = minutes.add(exact(r.minutesPerOpening[line.spec.style]).mul(line.quantity));
  let extensionInches = new Fraction(0);
  for (const { piece, count } of pieces) {
    if (piece.material === "extension") extensionInches = extensionInches.add(exact(piece.length).mul(count));
  }
  return minutes.add(extensionInches.div(12).mul(exact(r.minutesPerExtensionFoot)));
}

/** Labour minutes: per opening by style plus per linear foot of extension (cut lengths). */
export function labourMinutes(lines: readonly TakeoffLine[], rates: LabourRates): number {
  return exactLabourMinutes(lines, rates).valueOf();
}

/** Labour cost in cents: minutes / 60 × hourly rate. */
export function labourCost(lines: readonly TakeoffLine[], rates: LabourRates): number {
  const hourly = exact(parseOrThrow(labourRatesSchema, rates, "rates").hourlyRate);
  return cents(exactLabourMinutes(lines, rates).div(60).mul(hourly));
}

/**
 * Bid from material and labour cost. Markup applies to the whole subtotal;
 * tax to the marked-up materials (and labour when taxLabour). Each line is
 * rounded to the cent half up and the total is the sum of the rounded lines,
 * so the printed bid adds up.
 */
export function bidTotal(costs: { material: number; labour: number }, rates: BidRates): Bid {
  const r = parseOrThrow(bidRatesSchema, rates, "rates");
  const material = roundToCents(exact(costs.material));
  const labour = roundToCents(exact(costs.labour));
  const rate = exact(r.markup);
  const subtotal = material.add(labour);
  const markup = roundToCents(subtotal.mul(rate));
  const taxable = (r.taxLabour ? subtotal : material).mul(rate.add(1));
  const tax = roundToCents(taxable.mul(exact(r.taxRate)));
  return {
    material: material.valueOf(),
    labour: labour.valueOf(),
    subtotal: subtotal.valueOf(),
    markup: markup.valueOf(),
    tax: tax.valueOf(),
    total: subtotal.add(markup).add(tax).valueOf(),
  };
}
