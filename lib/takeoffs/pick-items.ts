import { formatLength, type Material, type TrimSpec } from "@/takeoff";
import type { PriceItemSnapshot } from "./types";

/** Profiles are sold in nominal fractions; within 1/64 in two sizes are the same profile. */
const SAME = 1 / 64;
const near = (a: number, b: number) => Math.abs(a - b) < SAME;
const size = (w: number, t: number) => `${formatLength(w)} × ${formatLength(t)}`;

export class MissingItem extends Error {}

/** Dollars per inch at the item's best-value length: among equal candidates the cheaper one is picked. */
const unitPrice = (i: PriceItemSnapshot) => Math.min(...i.stock.map((s) => s.price / s.length));
const byValue = (a: PriceItemSnapshot, b: PriceItemSnapshot) => unitPrice(a) - unitPrice(b) || a.name.localeCompare(b.name);

const narrowestWideEnough = (items: PriceItemSnapshot[], width: number) =>
  items.filter((i) => i.faceWidth >= width - SAME).sort((a, b) => a.faceWidth - b.faceWidth || byValue(a, b))[0];

/**
 * Which price-book item each material of one opening type is cut from:
 * casing by its profile (face width × thickness), the cheaper per foot where several match; apron by the same profile, else from the casing
 * itself (aprons are commonly cut from casing stock — common practice); stool and extension from the
 * narrowest stock wide enough, since both are ripped to width.
 */
export function pickItems(
  items: PriceItemSnapshot[],
  mark: string,
  spec: TrimSpec,
  widths: { stool?: number; extension?: number },
  casingOverride: PriceItemSnapshot | null,
): Partial<Record<Material, PriceItemSnapshot>> {
  const of = (kind: Material) => items.filter((i) => i.kind === kind);
  const casing = casingOverride ?? of("casing").filter((i) => near(i.faceWidth, spec.casingWidth) && near(i.thickness, spec.casingThickness)).sort(byValue)[0];
  if (!casing) throw new MissingItem(`${mark} needs casing ${size(spec.casingWidth, spec.casingThickness)}: the price book has none of that size.`);
  const picked: Partial<Record<Material, PriceItemSnapshot>> = { casing };
  if (spec.style === "stool-and-apron") {
    picked.apron = of("apron").filter((i) => near(i.faceWidth, casing.faceWidth) && near(i.thickness, casing.thickness)).sort(byValue)[0] ?? casing;
    const stool = narrowestWideEnough(of("stool"), widths.stool ?? 0);
    if (!stool) throw new MissingItem(`${mark} needs stool at least ${formatLength(widths.stool ?? 0)} wide: the price book has none that wide.`);
    picked.stool = stool;
  }
  if (widths.extension !== undefined) {
    const board = narrowestWideEnough(of("extension"), widths.extension);
    if (!board) throw new MissingItem(`${mark} needs jamb extension ${formatLength(widths.extension)} wide: the price book has no extension stock that wide.`);
    picked.extension = board;
  }
  return picked;
}
