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
  /** How curved casing is bought: bent/ordered by radius (default) or cut as flat segments from wide boards. */
  curvedCasing?: "by-radius" | "segments";
  /** Board width segments are cut from; required when curvedCasing is "segments". */
  segmentBoardWidth?: number;
}

/** Which geometry an opening takes; an opening without `kind` is a "window". */
export type OpeningKind = "window" | "mulled" | "door" | "round-top" | "segment-top" | "bay";

/** width jamb to jamb, height per style, setback = jamb edge to finished wall face. */
export interface WindowOpening {
  kind?: "window";
  width: number;
  height: number;
  setback: number;
}

/**
 * Two or more units side by side under one continuous head. `widths` left to right, each jamb to jamb;
 * `mullGap` = distance between adjacent units' inside jamb faces.
 */
export interface MulledOpening {
  kind: "mulled";
  widths: number[];
  height: number;
  setback: number;
  mullGap: number;
}

/** width jamb to jamb; height finished floor to the underside of the head jamb; cased on one or both sides. */
export interface DoorOpening {
  kind: "door";
  width: number;
  height: number;
  sides: 1 | 2;
}

/** A half-round head of diameter `width` on straight legs; springHeight from the stool top (or bottom jamb) to the spring line. */
export interface RoundTopOpening {
  kind: "round-top";
  width: number;
  springHeight: number;
  setback: number;
}

/**
 * A segment (eyebrow) head: a circular arc of span `width` (jamb to jamb) rising `rise` above the spring
 * line at mid-span (0 < rise ≤ width/2; rise = width/2 is a half-round).
 */
export interface SegmentTopOpening {
  kind: "segment-top";
  width: number;
  springHeight: number;
  rise: number;
  setback: number;
}

/**
 * A bay (three units) or bow (four or more) window: units left to right, each in its own plane, every
 * corner between adjacent units turning the same `turn` degrees (a 45° bay has turn 45; a bow of five
 * units at 10° turns 10 at each of its four corners). `mullGap` = distance between adjacent units' inside
 * jamb faces measured along the finished faces round the corner. `seat` = stool cut as one mitered
 * segment per unit (default) or as one wide seat board.
 */
export interface BayOpening {
  kind: "bay";
  widths: number[];
  turn: number;
  height: number;
  setback: number;
  mullGap: number;
  seat?: "segments" | "one-piece";
}

export type Opening = WindowOpening | MulledOpening | DoorOpening | RoundTopOpening | SegmentTopOpening | BayOpening;

export type Part =
  | "casing-leg"
  | "casing-head"
  | "casing-bottom"
  | "casing-arch"
  | "mullion-casing"
  | "stool"
  | "seat-board"
  | "apron"
  | "apron-return"
  | "extension-side"
  | "extension-head"
  | "extension-bottom"
  | "extension-arch";

export type Material = "casing" | "mullion" | "stool" | "apron" | "extension";

/**
 * "miter": cut across the face (45° unless `cutAngles` says otherwise), long point given; "bevel": cut
 * with the blade tilted, for boards meeting edge-on at a corner of two wall planes; "scarf": one half of
 * a scarf joint that splices a run longer than any stock length.
 */
export type End = "square" | "miter" | "return" | "bevel" | "scarf";

export interface CutPiece {
  part: Part;
  material: Material;
  quantity: number;
  /** Long point for mitered and beveled ends; for a curved piece, the arc along its outer edge. */
  length: number;
  width?: number;
  ends: [End, End];
  /** Saw setting of each end in degrees from square; present only when an end is not square or 45°. */
  cutAngles?: [number, number];
  /** Bevel ripped along one edge, in degrees from square (casing meeting casing at a bay corner). */
  edgeBevel?: number;
  /** Curved pieces: radius of the inner edge (casing) or of the face bent round the arch (extension). */
  radius?: number;
  /** Curved pieces: the angle the piece sweeps, degrees. */
  sweep?: number;
  /** A piece split for stock: which part of how many, and the overlap allowed at each joint. */
  scarf?: { part: number; of: number; overlap: number };
}

export interface TakeoffLine {
  opening: Opening;
  spec: TrimSpec;
  quantity: number;
}

export interface MaterialTotal {
  material: Material;
  /** Straight pieces only; curved pieces are in `curved`. */
  pieces: number;
  linearInches: number;
  linearFeet: number;
  /** Curved pieces of this material, by radius: present when the job has any. */
  curved?: CurvedTotal[];
}

/**
 * Curved pieces of one size across a job: ordered by radius and count, or, for casing when the spec says
 * "segments" and gives a board width, cut as flat ring segments from that board.
 */
export interface CurvedTotal {
  part: Part;
  /** Inner-edge radius (casing) or bent-face radius (extension). */
  radius: number;
  /** Outer-edge radius of a casing ring: radius + casing face width. */
  outerRadius?: number;
  sweep: number;
  pieces: number;
  /** Outer-edge arc of one piece. */
  length: number;
  segments?: ArchSegments;
}

/** A ring cut as equal segments from boards: per piece, each blank's length and end cut. */
export interface ArchSegments {
  boardWidth: number;
  /** Segments per curved piece. */
  count: number;
  /** Blank length: the chord of the outer edge, 2·Ro·sin(φ/2). */
  blankLength: number;
  /** Saw setting at each blank end, degrees from square (φ/2). */
  endCut: number;
  /** Blanks for the whole job: count × pieces. */
  blanks: number;
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
