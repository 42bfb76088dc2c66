import { ceilToMultiple, exact, Fraction } from "../exact";
import type { CutPiece, End } from "../types";

export interface ScarfOptions {
  /**
   * Length each scarf joint takes up: both boards run this far past the joint line so the bevels overlap.
   * A 45° scarf across 3/4 in trim overlaps about the stock's thickness (common practice).
   */
  overlap: number;
  /** Saw kerf left on a board's offcut; a part must fit its board with one kerf to spare. Default 0. */
  kerf?: number;
}

/**
 * Splits each straight piece longer than every stock length into equal parts joined by scarf joints
 * (overlapping bevels, the usual splice for trim longer than the stock: 45° cuts; common practice),
 * rather than refusing the run. k parts of a piece of length L carry (L + (k−1)·overlap)/k each, rounded
 * up to 1/16 so the run is never short, with k the fewest for which a part and a kerf fit the longest
 * stock. Each part keeps the original's outer end and gets a "scarf" end at every joint; `scarf` says
 * which part of how many it is and the overlap allowed. Curved pieces and pieces that fit pass unchanged.
 */
export function splitLongPieces(pieces: readonly CutPiece[], stockLengths: readonly number[], options: ScarfOptions): CutPiece[] {
  if (!Array.isArray(stockLengths) || stockLengths.length === 0) throw new Error("stockLengths: give at least one stock length");
  if (!stockLengths.every((l) => Number.isFinite(l) && l > 0)) throw new Error("stockLengths: stock lengths must be greater than 0");
  if (!(Number.isFinite(options.overlap) && options.overlap >= 0)) throw new Error("overlap: scarf overlap must not be negative");
  const kerfIn = options.kerf ?? 0;
  if (!(Number.isFinite(kerfIn) && kerfIn >= 0)) throw new Error("kerf: kerf must not be negative");
  const kerf = exact(kerfIn);
  const overlap = exact(options.overlap);
  const room = exact(Math.max(...stockLengths)).sub(kerf);
  if (room.lte(overlap)) throw new Error("overlap: scarf overlap must be shorter than the longest stock length less a kerf");
  const sixteenth = new Fraction(1, 16);
  return pieces.flatMap((p) => {
    const length = exact(p.length);
    if (p.radius !== undefined || length.lte(room)) return [p];
    let k = 2;
    let part = ceilToMultiple(length.add(overlap).div(2), sixteenth);
    while (part.gt(room)) {
      k++;
      part = ceilToMultiple(length.add(overlap.mul(k - 1)).div(k), sixteenth);
    }
    return Array.from({ length: k }, (_, i) => {
      const ends: [End, End] = [i === 0 ? p.ends[0] : "scarf", i === k - 1 ? p.ends[1] : "scarf"];
      const out: CutPiece = { ...p, length: part.valueOf(), ends, scarf: { part: i + 1, of: k, overlap: options.overlap } };
      if (p.cutAngles) out.cutAngles = [i === 0 ? p.cutAngles[0] : 45, i === k - 1 ? p.cutAngles[1] : 45];
      return out;
    });
  });
}
