import { formatLength } from "../length-format";
import type { Material, TrimSpec } from "../types";
import type { PriceItemSnapshot } from "./types";

/** Profiles are sold in nominal fractions; within 1/64 in two sizes are the same profile. */
const SAME = 1 / 64;
const near = (a: number, b: number) => Math.abs(a - b) < SAME;
const size = (w: number, t: number) => `${formatLength(w)} × ${formatLength(t)}`;

/** A material one opening type needs that the price book cannot supply, in words, with the size it needs. */
export interface ItemGap {
  material: Material;
  /** Face width (casing, apron) or the rip width (stool, extension) needed, and the thickness where it matters. */
  width: number;
  thickness: number;
  message: string;
}

/** Dollars per inch at the item's best-value length: among equal candidates the cheaper one is picked. */
const unitPrice = (i: PriceItemSnapshot) => Math.min(...i.stock.map((s) => s.price / s.length));
const byValue = (a: PriceItemSnapshot, b: PriceItemSnapshot) => unitPrice(a) - unitPrice(b) || a.name.localeCompare(b.name);

const narrowestWideEnough = (items: PriceItemSnapshot[], width: number) =>
  items.filter((i) => i.faceWidth >= width - SAME).sort((a, b) => a.faceWidth - b.faceWidth || byValue(a, b))[0];

/**
 * Which price-book item each material of one opening type is cut from, and what the book lacks:
 * casing by its profile (face width × thickness), the cheaper per foot where several match; apron by the same profile, else from the casing
 * itself (aprons are commonly cut from casing stock — common practice); stool and extension from the
 * narrowest stock wide enough, since both are ripped to width.
 */
export function findItems(
  items: PriceItemSnapshot[],
  mark: string,
  spec: TrimSpec,
  widths: { stool?: number; extension?: number; mullion?: number },
  casingOverride: PriceItemSnapshot | null,
): { picked: Partial<Record<Material, PriceItemSnapshot>>; gaps: ItemGap[] } {
  const of = (kind: Material) => items.filter((i) => i.kind === kind);
  const picked: Partial<Record<Material, PriceItemSnapshot>> = {};
  const gaps: ItemGap[] = [];
  const casing = casingOverride ?? of("casing").filter((i) => near(i.faceWidth, spec.casingWidth) && near(i.thickness, spec.casingThickness)).sort(byValue)[0];
  if (casing) picked.casing = casing;
  else {
    gaps.push({
      material: "casing",
      width: spec.casingWidth,
      thickness: spec.casingThickness,
      message: `${mark} needs casing ${size(spec.casingWidth, spec.casingThickness)}: the price book has none of that size.`,
    });
  }
  if (spec.style === "stool-and-apron") {
    const w = casing?.faceWidth ?? spec.casingWidth;
    const t = casing?.thickness ?? spec.casingThickness;
    const apron = of("apron").filter((i) => near(i.faceWidth, w) && near(i.thickness, t)).sort(byValue)[0] ?? casing;
    if (apron) picked.apron = apron;
    else gaps.push({ material: "apron", width: w, thickness: t, message: `${mark} needs apron ${size(w, t)} (or casing of that size to cut it from): the price book has neither.` });
    const stool = narrowestWideEnough(of("stool"), widths.stool ?? 0);
    if (stool) picked.stool = stool;
    else gaps.push({ material: "stool", width: widths.stool ?? 0, thickness: 0, message: `${mark} needs stool at least ${formatLength(widths.stool ?? 0)} wide: the price book has none that wide.` });
  }
  if (widths.extension !== undefined) {
    const board = narrowestWideEnough(of("extension"), widths.extension);
    if (board) picked.extension = board;
    else {
      gaps.push({
        material: "extension",
        width: widths.extension,
        thickness: spec.extensionThickness ?? 0.75,
        message: `${mark} needs jamb extension ${formatLength(widths.extension)} wide: the price book has no extension stock that wide.`,
      });
    }
  }
  // Mullion casings are flat boards ripped to the mull's width, like extensions (common practice).
  if (widths.mullion !== undefined) {
    const board = narrowestWideEnough(of("extension"), widths.mullion);
    if (board) picked.mullion = board;
    else {
      gaps.push({
        material: "mullion",
        width: widths.mullion,
        thickness: spec.casingThickness,
        message: `${mark} needs mullion casing ${formatLength(widths.mullion)} wide: the price book has no flat (extension) stock that wide to rip it from.`,
      });
    }
  }
  return { picked, gaps };
}
