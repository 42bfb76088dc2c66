import type { LabourRates } from "@/takeoff";
import { KIND_RATES } from "./kind-rates";
import { sameLength } from "./length-text";
import type { FieldDiff, ItemFields, StockPrice } from "./types";

/** Before/after of the fields that differ: what the change log stores and the import preview shows. */

const cents = (dollars: number) => Math.round(dollars * 100);

export function sameStock(a: readonly StockPrice[], b: readonly StockPrice[]): boolean {
  const sa = [...a].sort((x, y) => x.length - y.length);
  const sb = [...b].sort((x, y) => x.length - y.length);
  return sa.length === sb.length && sa.every((s, i) => sameLength(s.length, sb[i]!.length) && cents(s.price) === cents(sb[i]!.price));
}

const ITEM_SAME: { [K in keyof ItemFields]: (a: ItemFields[K], b: ItemFields[K]) => boolean } = {
  name: (a, b) => a === b,
  kind: (a, b) => a === b,
  faceWidth: sameLength,
  thickness: sameLength,
  species: (a, b) => (a ?? null) === (b ?? null),
  supplierCode: (a, b) => (a ?? null) === (b ?? null),
  stock: sameStock,
};
export const ITEM_FIELDS = Object.keys(ITEM_SAME) as (keyof ItemFields)[];

/** Fields that changed from `before` to `after`; a created item has every field with before null, a deleted one after null. */
export function itemDiff(before: ItemFields | null, after: ItemFields | null): FieldDiff {
  const out: FieldDiff = {};
  for (const field of ITEM_FIELDS) {
    const b = before ? (before[field] ?? null) : null;
    const a = after ? (after[field] ?? null) : null;
    const same = before && after ? (ITEM_SAME[field] as (x: unknown, y: unknown) => boolean)(b, a) : b === null && a === null;
    if (!same) out[field] = { before: b, after: a };
  }
  return out;
}

export interface BookFields {
  name: string;
  labour: LabourRates;
  markup: number;
  taxRate: number;
  taxLabour: boolean;
}

/** A book's fields flattened to one key per value a person edits, so the log names exactly what moved. */
export function flattenBook(b: BookFields): Record<string, string | number | boolean> {
  return {
    name: b.name,
    minutesStoolAndApron: b.labour.minutesPerOpening["stool-and-apron"],
    minutesPictureFrame: b.labour.minutesPerOpening["picture-frame"],
    minutesPerExtensionFoot: b.labour.minutesPerExtensionFoot,
    hourlyRate: b.labour.hourlyRate,
    ...Object.fromEntries(KIND_RATES.flatMap((r) => (b.labour[r.key] === undefined ? [] : [[r.key, b.labour[r.key]!]]))),
    markup: b.markup,
    taxRate: b.taxRate,
    taxLabour: b.taxLabour,
  };
}

export function bookDiff(before: BookFields | null, after: BookFields | null): FieldDiff {
  const b = before ? flattenBook(before) : {};
  const a = after ? flattenBook(after) : {};
  const out: FieldDiff = {};
  for (const key of Object.keys({ ...b, ...a })) {
    const x = b[key] ?? null;
    const y = a[key] ?? null;
    const same = typeof x === "number" && typeof y === "number" ? Math.abs(x - y) < 1e-9 : x === y;
    if (!same) out[key] = { before: x, after: y };
  }
  return out;
}
