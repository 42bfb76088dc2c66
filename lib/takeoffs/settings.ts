import type { TakeoffSettings } from "@/takeoff";

/**
 * When a company has set none: a 1/8 in kerf, the width of a common thin-kerf miter-saw blade
 * (recalled from memory: 10 in thin-kerf blades are about 0.090–0.100 in, full-kerf about 0.125 in; 1/8 in
 * errs on the safe side), and 10 % extra boards for defects and miscuts (common practice).
 */
export const DEFAULT_TAKEOFF_SETTINGS: TakeoffSettings = { kerf: 0.125, wastePercent: 10 };

/**
 * Scarf overlap when a company has set none: 1 in. A 45° scarf through 11/16–3/4 in trim runs about
 * the stock's thickness past the joint line (common practice), rounded up to a whole inch so a splice
 * is never short.
 */
export const DEFAULT_SCARF_OVERLAP = 1;
