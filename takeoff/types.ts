/** Public shapes of the takeoff engine. All lengths are inches. */

export type Style = "stool-and-apron" | "picture-frame";

export interface TrimSpec {
  style: Style;
  /** Face width of the casing. */
  casingWidth: number;
  casingThickness: number;
  /** Casing set back from the jamb edge; default 1/8. */
  reveal?: number;
  /** Stool runs past the outer edge of each casing leg by this; default 2 × casingThickness. */
  stoolHorn?: number;
  /** Stool front edge beyond the finished wall face; default in trim-defaults.ts. */
  stoolProjection?: number;
  /** Each apron end set in from the casing's outer edge; default 0. */
  apronInset?: number;
  /** Return-mitered apron ends; default true. */
  apronReturns?: boolean;
  /** Jamb extension stock thickness; default in trim-defaults.ts. */
  extensionThickness?: number;
}

/** width jamb to jamb, height per style, setback = jamb edge to finished wall face. */
export interface Opening {
  width: number;
  height: number;
  setback: number;
}

export type Part =
  | "casing-leg"
  | "casing-head"
  | "casing-bottom"
  | "stool"
  | "apron"
  | "apron-return"
  | "extension-side"
  | "extension-head"
  | "extension-bottom";

export type Material = "casing" | "stool" | "apron" | "extension";

export type End = "square" | "miter" | "return";

export interface CutPiece {
  part: Part;
  material: Material;
  quantity: number;
  length: number;
  width?: number;
  ends: [End, End];
}

export interface TakeoffLine {
  opening: Opening;
  spec: TrimSpec;
  quantity: number;
}

export interface MaterialTotal {
  material: Material;
  pieces: number;
  linearInches: number;
  linearFeet: number;
}

export interface Demand {
  length: number;
  quantity: number;
}

export interface StockItem {
  length: number;
  price: number;
  /** Board width; lets ripped parts (extensions) pick the narrowest board wide enough. */
  width?: number;
}

export interface PlanOptions {
  kerf: number;
  /**
   * Wall-clock time the search may take, in milliseconds. When it ends the planner returns the best
   * plan found so far with the bound proven so far (`proof: "best-found"`). Absent: the planner's
   * default (DEFAULT_PLAN_BUDGET_MS).
   */
  budgetMs?: number;
}

export interface BoardPattern {
  stockLength: number;
  /** How many boards are cut to this pattern. */
  count: number;
  /** Piece lengths cut from one board, longest first. */
  cuts: number[];
  /** stockLength − Σ(cut + kerf). */
  offcut: number;
  /** In a ripped order: the width of the strip these cuts are made along. */
  width?: number;
}

export interface StockPlan {
  boards: BoardPattern[];
  boardCount: number;
  purchasedLength: number;
  cost: number;
  /** Proven lower bounds: no plan can cost less, and no plan can buy less length. */
  lowerBound: { length: number; cost: number };
  /**
   * "optimal": the plan's cost meets the proven bound, so no plan costs less. "best-found": the search
   * ended (its time budget, or the size limits of the exact step) with the plan above the bound; the plan
   * is the best found and the bound is still proven. Absent in plans saved before it was recorded.
   */
  proof?: "optimal" | "best-found";
  /** True when the time budget ended the search before it finished. */
  budgetSpent?: boolean;
}
