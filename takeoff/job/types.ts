/**
 * What a saved takeoff keeps: the inputs and prices as they were when it ran, and what the engine made
 * of them. Plain JSON (it lives in jsonb). Lengths in inches, money in dollars: every money total of a
 * result is an exact sum rounded once, half up, to the cent. Rows saved earlier must keep reading, so a
 * field added later is optional.
 */
import type { Bid, LabourRates } from "../pricing";
import type { CutPiece, Material, MaterialTotal, Opening, OpeningKind, StockPlan, TrimSpec } from "../types";

export interface TakeoffSettings {
  /** Saw kerf taken by every cut. */
  kerf: number;
  /** Extra boards bought for defects and miscuts, percent of the optimised count per stock length. */
  wastePercent: number;
  /** Kerf of the rip cut between strips ripped from one board; absent = `kerf` (takeoffs saved before it existed). */
  ripKerf?: number;
  /**
   * Seconds the whole run may spend planning board orders, shared out over its orders; absent = the
   * engine's default (DEFAULT_RUN_PLAN_SECONDS). When it ends, orders carry the best plan found so far.
   */
  planSeconds?: number;
  /**
   * Length each scarf joint takes up where a piece is longer than every stock length and is spliced from
   * two or more boards; absent = not set (takeoffs saved before splicing: such pieces were refused).
   */
  scarfOverlap?: number;
}

export type OpeningKindName = OpeningKind;

/**
 * A kind's own fields, as an opening type stores them. mulled: `widths` (two or more, left to right,
 * each jamb to jamb; `width` is then the whole span Σwidths + (n−1)·mullGap) and `mullGap`. door: `sides`
 * (1 exterior, 2 interior; `height` is floor to the underside of the head jamb; no setback). round-top:
 * `springHeight` (`height` is then springHeight + width/2, the whole opening).
 */
export interface OpeningShape {
  widths?: number[];
  mullGap?: number;
  sides?: 1 | 2;
  springHeight?: number;
  /** segment-top: the arch's rise above the spring line. */
  rise?: number;
  /** bay: the angle each corner turns, degrees; `widths` are the units, left to right. */
  turn?: number;
  seat?: "segments" | "one-piece";
}

export interface TakeoffInputs {
  settings: TakeoffSettings;
  /** An alternate: one casing item used for every window instead of each type's own profile. */
  casingItemId: string | null;
  unitTypes: { id: string; name: string; count: number }[];
  openingTypes: {
    id: string;
    mark: string;
    width: number;
    height: number;
    setback: number;
    trimSpec: TrimSpec;
    /** The opening's kind; absent = "window" (takeoffs saved before kinds existed). */
    kind?: OpeningKindName;
    /** The kind's own fields beyond width, height and setback (see OpeningShape). */
    shape?: OpeningShape;
  }[];
  /**
   * Price what the price book lacks with clearly named placeholders instead of refusing the run.
   * Absent in takeoffs saved before placeholders existed (= false). A bid with placeholders cannot be submitted.
   */
  allowPlaceholders?: boolean;
  /** Tags per opening type: on each unit type's sheets (one unit), on common-area sheets, and job-wide. */
  counts: { perUnit: Record<string, Record<string, number>>; commonAreas: Record<string, number>; job: Record<string, number> };
}

export interface PriceItemSnapshot {
  id: string;
  name: string;
  kind: Exclude<Material, "mullion"> | "other";
  faceWidth: number;
  thickness: number;
  species: string | null;
  supplierCode: string | null;
  stock: { length: number; price: number }[];
}

export interface TakeoffPrices {
  priceBook: { id: string; name: string };
  items: PriceItemSnapshot[];
  labour: LabourRates;
  markup: number;
  taxRate: number;
  taxLabour: boolean;
}

export interface OpeningTypeResult {
  openingTypeId: string;
  mark: string;
  quantity: number;
  spec: TrimSpec;
  /** Overall size: for a mulled unit or bay the whole span, for a round-top the whole height. */
  opening: { width: number; height: number; setback: number };
  /** The engine's opening with its kind's fields, for every kind but a plain window. */
  kindOpening?: Opening;
  cutList: CutPiece[];
  /** Price-book item each material of this type is cut from. */
  items: Partial<Record<Material, string>>;
}

export interface BoardOrder {
  itemId: string;
  itemName: string;
  material: Material;
  supplierCode: string | null;
  /** Rip width for extensions (the setback), and the board it is ripped from. */
  width?: number;
  stockWidth?: number;
  /**
   * Every strip width of an order whose boards are ripped to several widths, widest first (then `width`
   * is absent). Absent in takeoffs saved before mixed widths shared boards.
   */
  widths?: number[];
  pieces: number;
  linearInches: number;
  /**
   * The optimised plan. For a ripped order (rip present) its patterns are cut along strips, so a
   * pattern's count is strips; boardCount and cost are boards bought, and purchasedLength is every
   * strip bought, the unused ones included (they are offcut).
   */
  plan: StockPlan;
  /** Present when each board is ripped into several strips before crosscutting; absent in older takeoffs. */
  rip?: RipPlan;
  /** Boards per stock length with the waste allowance added (what to buy). */
  toBuy: { stockLength: number; count: number; price: number }[];
  /** Priced with a placeholder: the price book has no such item (see TakeoffResult.placeholders). */
  placeholder?: true;
}

/** How a ripped order's boards are shared out as strips. */
export interface RipPlan {
  /**
   * Strips of the order's width one board yields after the rip kerf; in an order of several widths
   * (BoardOrder.widths), strips of its narrowest width.
   */
  stripsPerBoard: number;
  /** Strips the plan cuts pieces from. */
  strips: number;
  /**
   * Strips bought but not used, their length offcut: strips of the narrowest width still to be had from
   * each board's offcut width. For one width that is boards × stripsPerBoard − strips.
   */
  offcutStrips: number;
  /** Per stock length, longest first: strips used and boards bought for them (before the allowance). */
  boards: { stockLength: number; strips: number; boards: number }[];
  /**
   * How the boards are ripped: each layout is `count` boards of `stockLength` ripped to the strip widths
   * listed, widest first, leaving `offcutWidth` of board. The crosscuts along each strip are the plan's
   * board patterns of that width (BoardPattern.width). Absent in takeoffs saved before mixed widths.
   */
  layouts?: RipLayout[];
}

export interface RipLayout {
  stockLength: number;
  count: number;
  /** Widths of the strips ripped from one board, widest first. */
  strips: number[];
  /** Board width left after the strips and the rip kerfs between them. */
  offcutWidth: number;
}

/** An item the price book lacked, priced with a stand-in so the estimator could carry on. */
export interface PlaceholderLine {
  itemId: string;
  itemName: string;
  material: Material;
  marks: string[];
  /** What was missing, per opening type, in words. */
  gaps: string[];
  /** How the stand-in price was set. */
  basis: string;
  pricePerFoot: number;
}

export interface MaterialSummary {
  material: Material;
  /** Pieces cut; absent in takeoffs saved before it was recorded. */
  pieces?: number;
  linearFeet: number;
  boardCount: number;
  /** Optimised boards per stock length, longest first; absent in takeoffs saved before it was recorded. */
  boards?: { stockLength: number; count: number }[];
  purchasedFeet: number;
  offcutFeet: number;
  /** Used length / purchased length of the optimised plan. */
  yield: number;
  cost: number;
  lowerBound: number;
  gapPercent: number;
  allowanceBoards: number;
  allowanceCost: number;
}

export interface TakeoffResult {
  openingsTotal: number;
  openingTypes: OpeningTypeResult[];
  unitTypes: { unitTypeId: string; name: string; unitCount: number; perUnit: MaterialTotal[]; allUnits: MaterialTotal[] }[];
  commonAreas: MaterialTotal[];
  job: MaterialTotal[];
  orders: BoardOrder[];
  materials: MaterialSummary[];
  labourMinutes: number;
  bid: Bid;
  /** Placeholders used; absent or empty when every item came from the price book. */
  placeholders?: PlaceholderLine[];
  /** How planning the orders went; absent in takeoffs saved before the planning budget existed. */
  planning?: PlanningSummary;
}

/** The run's planning budget and what came of it. */
export interface PlanningSummary {
  /** Seconds the run could spend planning its orders (TakeoffSettings.planSeconds or the default). */
  budgetSeconds: number;
  /** Every order's plan is proven optimal (its cost meets its proven lower bound). */
  allOptimal: boolean;
  /** Orders whose plan is the best found, above its bound (plan.proof "best-found"). */
  bestFound: number;
  /** Orders whose search the budget ended before it finished (plan.budgetSpent). */
  budgetSpent: number;
}
