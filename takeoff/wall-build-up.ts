import { z } from "zod";
import { exact, inchesOut } from "./exact";
import { DRESSED_LUMBER, GYPSUM_BOARD_THICKNESS, type GypsumBoard, type StudSize } from "./nominal-sizes";
import { parseOrThrow } from "./validate";

export interface WallBuildUp {
  /** Stud size; its dressed width (PS 20) is the framing depth. */
  stud: StudSize;
  /** Interior wallboard, by ASTM C1396 thickness. */
  wallboard: GypsumBoard;
  /** Layers of wallboard; default 1. */
  wallboardLayers?: number;
  /** Exterior sheathing thickness in inches, when the window frame depth is measured from its outer face; default 0. */
  sheathing?: number;
  /** Window frame depth, from the same outer datum to the inside edge of the jamb. */
  frameDepth: number;
}

export const wallBuildUpSchema = z.object({
  stud: z.enum(["2x4", "2x6", "2x8"], { error: 'stud must be "2x4", "2x6" or "2x8"' }),
  wallboard: z.enum(["1/4", "3/8", "1/2", "5/8"], { error: "wallboard must be 1/4, 3/8, 1/2 or 5/8" }),
  wallboardLayers: z.number({ error: "wallboard layers must be a number" }).int().min(1).optional(),
  sheathing: z
    .number({ error: "sheathing must be a finite number" })
    .min(0, { error: "sheathing must not be negative" })
    .optional(),
  frameDepth: z.number({ error: "frame depth must be a finite number" }).gt(0, { error: "frame depth must be greater than 0" }),
});

/**
 * Setback (jamb extension width): how far the finished wall face stands
 * beyond the window's jamb edge = sheathing + stud depth + wallboard − frame
 * depth, rounded to 1/16 in. Throws when the frame is deeper than the wall.
 */
export function wallSetback(wall: WallBuildUp): number {
  const w = parseOrThrow(wallBuildUpSchema, wall, "wall");
  const wallDepth = exact(w.sheathing ?? 0)
    .add(exact(DRESSED_LUMBER[w.stud].width))
    .add(exact(GYPSUM_BOARD_THICKNESS[w.wallboard]).mul(w.wallboardLayers ?? 1));
  const setback = wallDepth.sub(exact(w.frameDepth));
  if (setback.lt(0)) throw new Error("wall.frameDepth: frame depth is greater than the wall depth");
  return inchesOut(setback);
}
