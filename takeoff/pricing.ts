import { jobPieces } from "./demand";
import { exact, Fraction, roundToCents } from "./exact";
import { bidRatesSchema, labourRatesSchema } from "./schemas";
import type { z } from "zod";
import type { Opening, Style, TakeoffLine } from "./types";
import { parseOrThrow } from "./validate";

/**
 * A contractor's own production rates; no defaults, crews differ too much. The per-kind rates are
 * optional because price books written before opening kinds lack them (see kindMinutes for what an
 * absent one means).
 */
export interface LabourRates {
  minutesPerOpening: Record<Style, number>;
  /** Extensions are ripped, glued and fitted per foot, so they are priced on length. */
  minutesPerExtensionFoot: number;
  hourlyRate: number;
  /** A door is cased per side (two legs and a head); absent: a picture-frame opening's minutes per side. */
  minutesPerDoorSide?: number;
  /** Each mull of a mulled unit or bay (fitting its mullion casing), on top of the opening's minutes; absent: 0. */
  minutesPerMull?: number;
  /** A round-top or segment head (fitting the curved casing and extension), on top of the opening's minutes; absent: 0. */
  minutesArchPremium?: number;
  /** Each corner of a bay or bow (angled stool, apron and casing joints), on top of its mulls; absent: 0. */
  minutesPerBayCorner?: number;
}

type Rates = z.infer<typeof labourRatesSchema>;

/**
 * Minutes to trim one opening by its kind (common practice: a premium per mull, per arched head and per
 * bay corner on the style's minutes; doors per side, their style not applying). A door side without its
 * own rate is priced as a picture-frame opening — three of its four pieces — rather than as nothing.
 */
function kindMinutes(opening: Opening, style: Style, r: Rates): Fraction {
  const base = exact(r.minutesPerOpening[style]);
  switch (opening.kind ?? "window") {
    case "door": {
      const door = opening as Extract<Opening, { kind: "door" }>;
      return exact(r.minutesPerDoorSide ?? r.minutesPerOpening["picture-frame"]).mul(door.sides);
    }
    case "mulled": {
      const units = (opening as Extract<Opening, { kind: "mulled" }>).widths.length;
      return base.add(exact(r.minutesPerMull ?? 0).mul(units - 1));
    }
    case "bay": {
      const units = (opening as Extract<Opening, { kind: "bay" }>).widths.length;
      return base.add(exact((r.minutesPerMull ?? 0) + (r.minutesPerBayCorner ?? 0)).mul(units - 1));
    }
    case "round-top":
    case "segment-top":
      return base.add(exact(r.minutesArchPremium ?? 0));
    default:
      return base;
  }
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
  for (const line of lines) minutes = minutes.add(kindMinutes(line.opening, line.spec.style, r).mul(line.quantity));
  let extensionInches = new Fraction(0);
  for (const { piece, count } of pieces) {
    if (piece.material === "extension") extensionInches = extensionInches.add(exact(piece.length).mul(count));
  }
  return minutes.add(extensionInches.div(12).mul(exact(r.minutesPerExtensionFoot)));
}

/** Labour minutes: per opening by kind and style plus per linear foot of extension (cut lengths). */
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
