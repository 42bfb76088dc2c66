import { KIND_RATES } from "./kind-rates";
import { KIND_LABELS, type MaterialKind } from "./kinds";
import { sameLength, sizeText, stockLengthText } from "./length-text";
import { formatMoney, percentText } from "./numbers";
import type { FieldDiff, ItemFields, StockPrice } from "./types";

/**
 * Words for changes: the one-line summaries in the change log and the field names and values the
 * import preview and the log's details show. Lengths read like a tape, money in dollars.
 */
export const FIELD_LABELS: Record<string, string> = {
  name: "name",
  kind: "kind",
  faceWidth: "face width",
  thickness: "thickness",
  species: "species or finish",
  supplierCode: "supplier code",
  stock: "stock",
  minutesStoolAndApron: "minutes per stool-and-apron opening",
  minutesPictureFrame: "minutes per picture-frame opening",
  minutesPerExtensionFoot: "minutes per foot of extension",
  hourlyRate: "hourly rate",
  ...Object.fromEntries(KIND_RATES.map((r) => [r.key, r.log])),
  markup: "markup",
  taxRate: "tax rate",
  taxLabour: "tax labour",
};

export function formatValue(field: string, value: unknown): string {
  if (value === null || value === undefined || value === "") return "—";
  switch (field) {
    case "faceWidth":
    case "thickness":
      return sizeText(value as number);
    case "kind":
      return KIND_LABELS[value as MaterialKind] ?? String(value);
    case "stock":
      return (value as StockPrice[]).map((s) => `${stockLengthText(s.length)} ${formatMoney(s.price)}`).join(", ");
    case "hourlyRate":
      return formatMoney(value as number);
    case "markup":
    case "taxRate":
      return `${percentText(value as number)} %`;
    case "taxLabour":
      return value ? "yes" : "no";
    default:
      return String(value);
  }
}

/** Per stock length: "8' $14.20 → $14.60", "16' added at $30.00", "7' removed". */
export function stockChanges(before: readonly StockPrice[], after: readonly StockPrice[]): string[] {
  const out: string[] = [];
  for (const a of after) {
    const b = before.find((s) => sameLength(s.length, a.length));
    if (!b) out.push(`${stockLengthText(a.length)} added at ${formatMoney(a.price)}`);
    else if (Math.round(b.price * 100) !== Math.round(a.price * 100)) out.push(`${stockLengthText(a.length)} ${formatMoney(b.price)} → ${formatMoney(a.price)}`);
  }
  for (const b of before) if (!after.some((a) => sameLength(a.length, b.length))) out.push(`${stockLengthText(b.length)} removed`);
  return out;
}

/** Each changed field as "label before → after" (stock per length). */
export function describeDiff(diff: FieldDiff): string[] {
  return Object.entries(diff).flatMap(([field, { before, after }]) =>
    field === "stock" && Array.isArray(before) && Array.isArray(after)
      ? stockChanges(before as StockPrice[], after as StockPrice[])
      : [`${FIELD_LABELS[field] ?? field} ${formatValue(field, before)} → ${formatValue(field, after)}`],
  );
}

const MAX_SUMMARY = 240;
const clip = (s: string) => (s.length > MAX_SUMMARY ? `${s.slice(0, MAX_SUMMARY - 1)}…` : s);

export const itemLabel = (i: Pick<ItemFields, "kind" | "name">) => `${KIND_LABELS[i.kind].toLowerCase()} "${i.name}"`;

export function itemSummary(action: "create" | "update" | "delete", before: ItemFields | null, after: ItemFields | null, diff: FieldDiff, via = ""): string {
  const suffix = via ? ` (${via})` : "";
  if (action === "create" && after) {
    const n = after.stock.length;
    return clip(`Added ${itemLabel(after)}: ${sizeText(after.faceWidth)} × ${sizeText(after.thickness)}, ${n} stock length${n === 1 ? "" : "s"}${suffix}`);
  }
  if (action === "delete" && before) return clip(`Removed ${itemLabel(before)}${suffix}`);
  return clip(`Changed ${itemLabel(before ?? after!)}${suffix}: ${describeDiff(diff).join("; ")}`);
}

export function bookSummary(action: "create" | "update" | "delete", name: string, diff: FieldDiff, itemCount = 0): string {
  if (action === "create") return clip(`Created price book "${name}"`);
  if (action === "delete") return clip(`Deleted price book "${name}" and its ${itemCount} item${itemCount === 1 ? "" : "s"}`);
  return clip(`Changed ${describeDiff(diff).join("; ")}`);
}

/** An item's values on one line, as the import preview shows a new row: 2 1/2" × 11/16", poplar · 8' $14.20, 16' $28.00. */
export function itemDetails(i: ItemFields): string {
  const species = i.species ? `, ${i.species}` : "";
  const code = i.supplierCode ? ` · code ${i.supplierCode}` : "";
  return `${sizeText(i.faceWidth)} × ${sizeText(i.thickness)}${species} · ${formatValue("stock", i.stock)}${code}`;
}
