import { pieceDemand, MATERIALS } from "./demand";
import { exact, Fraction } from "./exact";
import type { MaterialTotal, TakeoffLine } from "./types";

/**
 * Pieces and length per material over a job. Sums the rounded lengths (what
 * is actually cut) exactly, so linearInches is a multiple of 1/16 in;
 * linearFeet is that exact sum divided by 12.
 */
export function takeoffTotals(lines: readonly TakeoffLine[]): MaterialTotal[] {
  const acc = new Map<string, { pieces: number; inches: Fraction }>();
  for (const d of pieceDemand(lines)) {
    const t = acc.get(d.material) ?? { pieces: 0, inches: new Fraction(0) };
    t.pieces += d.quantity;
    t.inches = t.inches.add(exact(d.length).mul(d.quantity));
    acc.set(d.material, t);
  }
  return MATERIALS.flatMap((material) => {
    const t = acc.get(material);
    if (!t) return [];
    return [{ material, pieces: t.pieces, linearInches: t.inches.valueOf(), linearFeet: t.inches.div(12).valueOf() }];
  });
}
