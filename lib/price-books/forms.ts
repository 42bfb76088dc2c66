import { fieldErrorsOf } from "@/lib/plans/window-list/field-errors";
import { priceBookItemCreateSchema, priceBookUpdateSchema } from "@/lib/validators/price-books";
import { bookDiff } from "./diff";
import { KIND_RATES, type KindRateDraftKey } from "./kind-rates";
import type { MaterialKind } from "./kinds";
import { moneyText, percentText, readPercent } from "./numbers";
import type { PriceBookSummary } from "./types";

/**
 * The two forms of the price-book page as plain data: the book's rates (percentages typed, fractions
 * sent) and a new item (stock as rows of length and price). Each is checked with the API's schema
 * before it is sent, and messages are keyed by the form's own fields.
 */
export type RatesDraft = Record<KindRateDraftKey, string> & {
  name: string;
  stoolAndApron: string;
  pictureFrame: string;
  extensionFoot: string;
  hourlyRate: string;
  markup: string;
  taxRate: string;
  taxLabour: boolean;
};

export const ratesDraft = (b: PriceBookSummary): RatesDraft => ({
  name: b.name,
  stoolAndApron: String(b.labour.minutesPerOpening["stool-and-apron"]),
  pictureFrame: String(b.labour.minutesPerOpening["picture-frame"]),
  extensionFoot: String(b.labour.minutesPerExtensionFoot),
  hourlyRate: moneyText(b.labour.hourlyRate),
  markup: percentText(b.markup),
  taxRate: percentText(b.taxRate),
  taxLabour: b.taxLabour,
  ...(Object.fromEntries(KIND_RATES.map((r) => [r.draft, b.labour[r.key] === undefined ? "" : String(b.labour[r.key])])) as Record<KindRateDraftKey, string>),
});

const RATE_FIELD: Record<string, keyof RatesDraft> = {
  "labour.minutesPerOpening.stool-and-apron": "stoolAndApron",
  "labour.minutesPerOpening.picture-frame": "pictureFrame",
  "labour.minutesPerExtensionFoot": "extensionFoot",
  "labour.hourlyRate": "hourlyRate",
  ...Object.fromEntries(KIND_RATES.map((r) => [`labour.${r.key}`, r.draft])),
};

export type FormPlan<B> = { kind: "invalid"; fields: Record<string, string> } | { kind: "unchanged" } | { kind: "send"; body: B };

/** Maps the API's keys (`labour.hourlyRate`) to the form's (`hourlyRate`), for server refusals too. */
export const rateFieldOf = (key: string) => RATE_FIELD[key] ?? key;

export function planRates(book: PriceBookSummary, d: RatesDraft): FormPlan<Record<string, unknown>> {
  const fields: Record<string, string> = {};
  const markup = readPercent(d.markup, "Markup", 1000);
  const taxRate = readPercent(d.taxRate, "Tax rate", 100);
  if (!markup.ok) fields.markup = markup.message;
  if (!taxRate.ok) fields.taxRate = taxRate.message;
  const body = {
    version: book.version,
    name: d.name,
    labour: {
      minutesPerOpening: { "stool-and-apron": d.stoolAndApron, "picture-frame": d.pictureFrame },
      minutesPerExtensionFoot: d.extensionFoot,
      hourlyRate: d.hourlyRate,
      // A blank per-kind rate is left out: not set.
      ...Object.fromEntries(KIND_RATES.filter((r) => d[r.draft].trim() !== "").map((r) => [r.key, d[r.draft]])),
    },
    markup: markup.ok ? markup.value : 0,
    taxRate: taxRate.ok ? taxRate.value : 0,
    taxLabour: d.taxLabour,
  };
  const parsed = priceBookUpdateSchema.safeParse(body);
  if (!parsed.success) for (const [k, m] of Object.entries(fieldErrorsOf(parsed.error))) fields[rateFieldOf(k)] ??= m;
  if (Object.keys(fields).length > 0 || !parsed.success) return { kind: "invalid", fields };
  const { version: _, ...next } = parsed.data;
  const changed = bookDiff(book, { ...book, ...next });
  return Object.keys(changed).length === 0 ? { kind: "unchanged" } : { kind: "send", body };
}

export interface NewItemDraft {
  name: string;
  kind: MaterialKind;
  faceWidth: string;
  thickness: string;
  species: string;
  supplierCode: string;
  stock: { length: string; price: string }[];
}

export const emptyItemDraft = (kind: MaterialKind = "casing"): NewItemDraft => ({
  name: "",
  kind,
  faceWidth: "",
  thickness: "",
  species: "",
  supplierCode: "",
  stock: [
    { length: "8'", price: "" },
    { length: "", price: "" },
    { length: "", price: "" },
  ],
});

/** Blank stock rows are left out; messages about the others keep the row they were typed in. */
export function planNewItem(d: NewItemDraft): FormPlan<Record<string, unknown>> {
  const used = d.stock.map((s, i) => ({ ...s, i })).filter((s) => s.price.trim() !== "" || s.length.trim() !== "");
  const body = { ...d, stock: used.map(({ length, price }) => ({ length, price })) };
  const parsed = priceBookItemCreateSchema.safeParse(body);
  if (parsed.success) return { kind: "send", body };
  const fields: Record<string, string> = {};
  for (const [key, message] of Object.entries(fieldErrorsOf(parsed.error))) {
    const m = /^stock\.(\d+)\.(.+)$/.exec(key);
    fields[m ? `stock.${used[Number(m[1])]?.i ?? 0}.${m[2]}` : key] ??= message;
  }
  return { kind: "invalid", fields };
}
