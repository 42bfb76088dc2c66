/**
 * Dry dressed sizes of softwood lumber by nominal size, in inches, per PS 20
 * (American Softwood Lumber Standard, NIST): 1-in nominal boards dress to
 * 3/4 in, 2-in dimension lumber to 1 1/2 in; widths 4/6/8/10/12 dress to
 * 3 1/2, 5 1/2, 7 1/4, 9 1/4, 11 1/4.
 */
export const DRESSED_LUMBER = {
  "1x4": { thickness: 0.75, width: 3.5 },
  "1x6": { thickness: 0.75, width: 5.5 },
  "1x8": { thickness: 0.75, width: 7.25 },
  "1x10": { thickness: 0.75, width: 9.25 },
  "1x12": { thickness: 0.75, width: 11.25 },
  "2x4": { thickness: 1.5, width: 3.5 },
  "2x6": { thickness: 1.5, width: 5.5 },
  "2x8": { thickness: 1.5, width: 7.25 },
} as const;

export type NominalLumber = keyof typeof DRESSED_LUMBER;
export type StudSize = "2x4" | "2x6" | "2x8";

/**
 * Gypsum board thicknesses, in inches, as listed in ASTM C1396 (Standard
 * Specification for Gypsum Board): 1/4, 3/8, 1/2 and 5/8 in.
 */
export const GYPSUM_BOARD_THICKNESS = {
  "1/4": 0.25,
  "3/8": 0.375,
  "1/2": 0.5,
  "5/8": 0.625,
} as const;

export type GypsumBoard = keyof typeof GYPSUM_BOARD_THICKNESS;
