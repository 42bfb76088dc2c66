import { ceilToMultiple, Fraction } from "../exact";
import { usedLength } from "./assemble";
import type { Instance } from "./instance";

/**
 * Bounds every plan obeys whatever the LP did (derived): each board holds at
 * most its own length of pieces-plus-kerf, so the boards bought total at least
 * the length L the demand uses, and cost at least L × the lowest price per
 * unit length. Every plan's cost is a multiple of `costStep` and its length a
 * multiple of `lengthStep`, so both round up to those grids.
 */
export function trivialBounds(
  inst: Instance,
  demand: ArrayLike<number>,
  costStep: Fraction,
  lengthStep: Fraction,
): { cost: Fraction; length: Fraction } {
  const needed = usedLength(inst, demand);
  let rate: Fraction | undefined;
  for (const s of inst.stocks) {
    const r = s.price.div(s.length);
    if (rate === undefined || r.lt(rate)) rate = r;
  }
  return {
    cost: ceilToMultiple(needed.mul(rate ?? new Fraction(0)), costStep),
    length: ceilToMultiple(needed, lengthStep),
  };
}
