import { formatLength, formatLengthExact, MATERIALS, type Material } from "@/takeoff";
import { KIND_RATES } from "@/lib/price-books/kind-rates";
import type { TakeoffInputs, TakeoffPrices, TakeoffResult } from "@/takeoff";
import { usd } from "./format";

export interface ComparedTakeoff {
  id: string;
  name: string;
  projectName: string;
  status: string;
  createdAt: string | Date;
  inputs: TakeoffInputs;
  prices: TakeoffPrices;
  result: TakeoffResult;
}

export interface ComparisonColumn {
  id: string;
  name: string;
  projectName: string;
  status: string;
  openings: number;
  units: number;
  materials: Partial<Record<Material, { linearFeet: number; boards: number; cost: number }>>;
  labourHours: number;
  labour: number;
  material: number;
  bidTotal: number;
  perOpening: number | null;
  perUnit: number | null;
}

const ft = (inches: number) => formatLength(inches, { style: "feet-inches" });
const pct = (x: number) => `${(x * 100).toFixed(2).replace(/\.?0+$/, "")}%`;

export function column(t: ComparedTakeoff): ComparisonColumn {
  const units = t.inputs.unitTypes.reduce((n, u) => n + u.count, 0);
  const r = t.result;
  return {
    id: t.id,
    name: t.name,
    projectName: t.projectName,
    status: t.status,
    openings: r.openingsTotal,
    units,
    materials: Object.fromEntries(
      r.materials.map((m) => [m.material, { linearFeet: m.linearFeet, boards: m.boardCount + m.allowanceBoards, cost: m.cost + m.allowanceCost }]),
    ),
    labourHours: r.labourMinutes / 60,
    labour: r.bid.labour,
    material: r.bid.material,
    bidTotal: r.bid.total,
    perOpening: r.openingsTotal > 0 ? r.bid.total / r.openingsTotal : null,
    perUnit: units > 0 ? r.bid.total / units : null,
  };
}

/**
 * Why a takeoff differs from the first one: sentences about opening counts, sizes, trim spec, prices,
 * labour and settings — the causes an estimator looks for when two bids disagree.
 */
export function explainDifferences(base: ComparedTakeoff, other: ComparedTakeoff): string[] {
  const out: string[] = [];
  const byMark = (t: ComparedTakeoff) => new Map(t.result.openingTypes.map((o) => [o.mark, o]));
  const a = byMark(base);
  const b = byMark(other);
  for (const mark of [...new Set([...a.keys(), ...b.keys()])].sort()) {
    const x = a.get(mark);
    const y = b.get(mark);
    if (!x) {
      out.push(`${mark} appears only here (${y!.quantity} openings).`);
      continue;
    }
    if (!y) {
      out.push(`${mark} is missing here (${x.quantity} openings in ${base.name}).`);
      continue;
    }
    if (x.quantity !== y.quantity) out.push(`${mark}: ${x.quantity} → ${y.quantity} openings.`);
    for (const k of ["width", "height", "setback"] as const) {
      if (x.opening[k] !== y.opening[k]) out.push(`${mark} ${k}: ${ft(x.opening[k])} → ${ft(y.opening[k])}.`);
    }
    if (x.spec.style !== y.spec.style) out.push(`${mark} style: ${x.spec.style} → ${y.spec.style}.`);
    if (x.spec.casingWidth !== y.spec.casingWidth || x.spec.casingThickness !== y.spec.casingThickness) {
      out.push(`${mark} casing: ${formatLength(x.spec.casingWidth)} × ${formatLength(x.spec.casingThickness)} → ${formatLength(y.spec.casingWidth)} × ${formatLength(y.spec.casingThickness)}.`);
    }
  }
  const casingName = (t: ComparedTakeoff) => (t.inputs.casingItemId ? t.prices.items.find((i) => i.id === t.inputs.casingItemId)?.name : null);
  if (casingName(base) !== casingName(other)) out.push(`Alternate casing: ${casingName(base) ?? "each window's own"} → ${casingName(other) ?? "each window's own"}.`);
  if (base.prices.priceBook.name !== other.prices.priceBook.name) out.push(`Price book: ${base.prices.priceBook.name} → ${other.prices.priceBook.name}.`);
  out.push(...priceChanges(base.prices, other.prices));
  const la = base.prices.labour;
  const lb = other.prices.labour;
  if (la.hourlyRate !== lb.hourlyRate) out.push(`Labour rate: ${usd(la.hourlyRate)}/h → ${usd(lb.hourlyRate)}/h.`);
  for (const style of ["stool-and-apron", "picture-frame"] as const) {
    if (la.minutesPerOpening[style] !== lb.minutesPerOpening[style]) out.push(`Minutes per ${style} opening: ${la.minutesPerOpening[style]} → ${lb.minutesPerOpening[style]}.`);
  }
  if (la.minutesPerExtensionFoot !== lb.minutesPerExtensionFoot) out.push(`Minutes per foot of extension: ${la.minutesPerExtensionFoot} → ${lb.minutesPerExtensionFoot}.`);
  for (const r of KIND_RATES) {
    const [x, y] = [la[r.key], lb[r.key]];
    if (x !== y) out.push(`${r.log.charAt(0).toUpperCase()}${r.log.slice(1)}: ${x ?? "not set"} → ${y ?? "not set"}.`);
  }
  if (base.prices.markup !== other.prices.markup) out.push(`Markup: ${pct(base.prices.markup)} → ${pct(other.prices.markup)}.`);
  if (base.prices.taxRate !== other.prices.taxRate) out.push(`Tax: ${pct(base.prices.taxRate)} → ${pct(other.prices.taxRate)}.`);
  const sa = base.inputs.settings;
  const sb = other.inputs.settings;
  // Exact: 3/32" and 1/8" both round to 1/8", which would read "Kerf: 1/8" → 1/8"".
  if (sa.kerf !== sb.kerf) out.push(`Kerf: ${formatLengthExact(sa.kerf)} → ${formatLengthExact(sb.kerf)}.`);
  if (sa.wastePercent !== sb.wastePercent) out.push(`Waste allowance: ${sa.wastePercent}% → ${sb.wastePercent}%.`);
  return out;
}

/** Stock prices that changed for items both books carry (matched by supplier code, else by name). */
function priceChanges(a: TakeoffPrices, b: TakeoffPrices): string[] {
  const key = (i: TakeoffPrices["items"][number]) => i.supplierCode ?? i.name;
  const theirs = new Map(b.items.map((i) => [key(i), i]));
  const out: string[] = [];
  for (const item of a.items) {
    const match = theirs.get(key(item));
    if (!match) continue;
    for (const s of item.stock) {
      const t = match.stock.find((x) => x.length === s.length);
      if (t && t.price !== s.price) out.push(`${item.name}, ${ft(s.length)}: ${usd(s.price)} → ${usd(t.price)}.`);
    }
  }
  return out;
}

export const COMPARED_MATERIALS = MATERIALS;
