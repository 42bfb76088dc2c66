import { exact, Fraction, roundToCents, toNumber } from "../exact";
import { formatLength } from "../length-format";
import type { CutPiece, Material, TrimSpec } from "../types";
import { splitLongPieces } from "../kinds/scarf";
import { checkOpening, type OpeningProblem } from "./opening-check";
import { openingOf } from "./opening-of";
import { findItems, type ItemGap } from "./pick-items";
import type { PriceItemSnapshot, TakeoffInputs, TakeoffPrices } from "./types";

const PART_NAMES: Record<CutPiece["part"], string> = {
  "casing-leg": "casing leg",
  "casing-head": "casing head",
  "casing-bottom": "bottom casing",
  "casing-arch": "casing arch",
  "mullion-casing": "mullion casing",
  "seat-board": "seat board",
  stool: "stool",
  apron: "apron",
  "apron-return": "apron return",
  "extension-side": "jamb extension side",
  "extension-head": "jamb extension head",
  "extension-bottom": "jamb extension bottom",
  "extension-arch": "jamb extension arch",
};

/** One line of the window list as the takeoff sees it: a window, or another kind with its fields in `shape`. */
export type OpeningTypeInput = Pick<TakeoffInputs["openingTypes"][number], "id" | "mark" | "width" | "height" | "setback" | "trimSpec" | "kind" | "shape">;

/** A gap: what one opening type needs that the book cannot supply, and what would close it. */
export interface PriceGap extends ItemGap {
  openingTypeId: string;
  mark: string;
  kind: "no-item" | "too-long";
  /** The longest piece of this material the type needs (a placeholder's stock must hold it). */
  longestPiece: number;
  /** The real item a too-long piece would otherwise be cut from. */
  itemId?: string;
  fix: string;
}

export type Assessment =
  | { ok: true; spec: TrimSpec; pieces: CutPiece[]; picked: Partial<Record<Material, PriceItemSnapshot>>; gaps: PriceGap[] }
  | { ok: false; problem: OpeningProblem & { mark: string; openingTypeId: string } };

const longestStock = (i: PriceItemSnapshot) => Math.max(...i.stock.map((s) => s.length));

/**
 * One opening type against one price book: its cut list (or why it has none), the item each material
 * comes from, and the gaps — a size the book does not carry, or a piece longer than every stock length
 * of its item after the saw kerf. With `scarfOverlap` (takeoffs since splicing) a piece longer than
 * every stock length is spliced from two or more boards with scarf joints instead of being a gap.
 * Only materials the opening's pieces use are picked: a door has no stool to find.
 */
export function assessOpeningType(
  ot: OpeningTypeInput,
  prices: TakeoffPrices,
  kerf: number,
  override: PriceItemSnapshot | null,
  scarfOverlap?: number,
): Assessment {
  const spec = override ? { ...ot.trimSpec, casingWidth: override.faceWidth, casingThickness: override.thickness } : ot.trimSpec;
  const checked = checkOpening(openingOf(ot), spec);
  if ("problem" in checked) return { ok: false, problem: { ...checked.problem, mark: ot.mark, openingTypeId: ot.id } };
  let pieces = checked.pieces;
  const widthOf = (m: Material) => pieces.find((p) => p.material === m && p.width !== undefined)?.width;
  const longest = (m: Material) => Math.max(0, ...pieces.filter((p) => p.material === m).map((p) => p.length));
  const found = findItems(prices.items, ot.mark, spec, { stool: widthOf("stool"), extension: widthOf("extension"), mullion: widthOf("mullion") }, override);
  const used = new Set(pieces.map((p) => p.material));
  const picked = Object.fromEntries(Object.entries(found.picked).filter(([m]) => used.has(m as Material))) as Partial<Record<Material, PriceItemSnapshot>>;
  const itemGaps = found.gaps.filter((g) => used.has(g.material));
  if (scarfOverlap !== undefined) {
    pieces = pieces.flatMap((p) => {
      const item = picked[p.material];
      return item && p.radius === undefined && p.length + kerf > longestStock(item) ? splitLongPieces([p], item.stock.map((s) => s.length), { overlap: scarfOverlap, kerf }) : [p];
    });
  }
  const gaps: PriceGap[] = itemGaps.map((g) => ({
    ...g,
    openingTypeId: ot.id,
    mark: ot.mark,
    kind: "no-item",
    longestPiece: longest(g.material),
    fix: `Add ${g.material === "extension" ? "extension stock" : g.material} of that size to the price book, or run with a placeholder price.`,
  }));
  for (const [material, item] of Object.entries(picked) as [Material, PriceItemSnapshot][]) {
    const piece = pieces.filter((p) => p.material === material && p.radius === undefined).sort((a, b) => b.length - a.length)[0];
    if (!piece || piece.length + kerf <= longestStock(item)) continue;
    const need = Math.ceil((piece.length + kerf) / 12) * 12;
    gaps.push({
      material,
      width: item.faceWidth,
      thickness: item.thickness,
      openingTypeId: ot.id,
      mark: ot.mark,
      kind: "too-long",
      longestPiece: piece.length,
      itemId: item.id,
      message: `${ot.mark}'s ${PART_NAMES[piece.part]} is ${formatLength(piece.length, { style: "feet-inches" })} long, but the longest stock of “${item.name}” is ${formatLength(longestStock(item), { style: "feet-inches" })}.`,
      fix: `Add a ${formatLength(need, { style: "feet-inches" })} length to “${item.name}” in the price book, check ${ot.mark}'s width and height (${formatLength(ot.width)} × ${formatLength(ot.height)}), or run with a placeholder price.`,
    });
    delete picked[material];
  }
  return { ok: true, spec, pieces, picked, gaps };
}

/** A stand-in item for a gap, clearly named as one, priced at a real item's rate per inch where the book has one. */
export interface Placeholder {
  item: PriceItemSnapshot;
  material: Material;
  marks: string[];
  gaps: string[];
  /** How the price was set: "at the rate of …", or "$0: nothing like it in the price book". */
  basis: string;
}

/** The item's rate per inch at its best-value length, exactly, so a stand-in price rounds once. */
const exactRate = (i: PriceItemSnapshot) =>
  i.stock.map((s) => exact(s.price).div(exact(s.length))).reduce((a, b) => (b.compare(a) < 0 ? b : a));
const priceAt = (rate: Fraction, length: number) => toNumber(roundToCents(rate.mul(exact(length))));

const placeholderKey = (g: PriceGap) => `${g.material}|${g.kind === "too-long" ? g.itemId : `${g.width}x${g.thickness}`}`;

/**
 * Placeholders for every gap, one per material and size: stock long enough for the longest piece
 * (whole feet, at least 8'), priced at the rate per inch of the nearest real item of that kind — the
 * item itself for a too-long piece — so the bid is not short by the whole material. Marked so a bid
 * built on one is refused until the price book has the real item.
 */
export function placeholdersFor(gaps: PriceGap[], prices: TakeoffPrices, kerf: number): Map<string, Placeholder> {
  const out = new Map<string, Placeholder>();
  for (const g of gaps) {
    const key = placeholderKey(g);
    const length = Math.max(96, Math.ceil((g.longestPiece + kerf) / 12) * 12);
    const existing = out.get(key);
    if (existing) {
      const stock = existing.item.stock[0]!;
      if (length > stock.length) existing.item.stock = [{ length, price: priceAt(exact(stock.price).div(exact(stock.length)), length) }];
      if (!existing.marks.includes(g.mark)) existing.marks.push(g.mark);
      existing.gaps.push(g.message);
      continue;
    }
    const kind = g.material === "apron" ? ["apron", "casing"] : [g.material];
    const like =
      (g.itemId ? prices.items.find((i) => i.id === g.itemId) : undefined) ??
      prices.items.filter((i) => kind.includes(i.kind)).sort((a, b) => Math.abs(a.faceWidth - g.width) - Math.abs(b.faceWidth - g.width))[0];
    const rate = like ? exactRate(like) : new Fraction(0);
    out.set(key, {
      material: g.material,
      marks: [g.mark],
      gaps: [g.message],
      basis: like ? `at the rate per foot of “${like.name}”` : `$0: the price book has no ${g.material} to price it from`,
      item: {
        id: `placeholder:${key}`,
        name: `PLACEHOLDER ${g.material} ${g.kind === "too-long" ? `${formatLength(length, { style: "feet-inches" })} long` : `${formatLength(g.width)}${g.thickness ? ` × ${formatLength(g.thickness)}` : " wide"}`} (not in the price book)`,
        kind: g.material === "mullion" ? "casing" : g.material,
        faceWidth: g.width,
        thickness: g.thickness,
        species: null,
        supplierCode: null,
        stock: [{ length, price: priceAt(rate, length) }],
      },
    });
  }
  return out;
}

export const placeholderFor = (placeholders: Map<string, Placeholder>, g: PriceGap) => placeholders.get(placeholderKey(g));
