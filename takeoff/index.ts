/** Public entry of the takeoff engine: re-exports only. */
export type {
  ArchSegments,
  BayOpening,
  BoardPattern,
  CurvedTotal,
  CutPiece,
  DoorOpening,
  Demand,
  End,
  Material,
  MaterialTotal,
  MulledOpening,
  Opening,
  OpeningKind,
  Part,
  PlanOptions,
  RoundTopOpening,
  SegmentTopOpening,
  StockItem,
  StockPlan,
  Style,
  TakeoffLine,
  TrimSpec,
  WindowOpening,
} from "./types";
export { cutList } from "./cut-list";
export { splitLongPieces, type ScarfOptions } from "./kinds/scarf";
export { archSegments } from "./kinds/arch-segments";
export { takeoffTotals } from "./totals";
export { pieceDemand, MATERIALS, type PieceDemand } from "./demand";
export { planStock } from "./stock-plan/plan-stock";
export { dollarsToCents } from "./exact";
export { parseLength } from "./length-parse";
export { formatLength, formatLengthExact, type LengthStyle } from "./length-format";
export { bidTotal, labourCost, labourMinutes, type Bid, type BidRates, type LabourRates } from "./pricing";
export { wallSetback, wallBuildUpSchema, type WallBuildUp } from "./wall-build-up";
export { DRESSED_LUMBER, GYPSUM_BOARD_THICKNESS, type GypsumBoard, type NominalLumber, type StudSize } from "./nominal-sizes";
export { TRIM_DEFAULTS } from "./trim-defaults";
export {
  bayOpeningSchema,
  bidRatesSchema,
  demandSchema,
  doorOpeningSchema,
  labourRatesSchema,
  lengthTextSchema,
  mulledOpeningSchema,
  OPENING_KINDS,
  openingSchema,
  planOptionsSchema,
  roundTopOpeningSchema,
  segmentTopOpeningSchema,
  stockItemSchema,
  styleSchema,
  takeoffLineSchema,
  trimSpecSchema,
  windowOpeningSchema,
} from "./schemas";

// A whole job from its snapshots: what a takeoff run executes and what a saved takeoff stores.
export { computeTakeoff, type RunOptions } from "./job/compute";
export { openingOf } from "./job/opening-of";
export { DEFAULT_RUN_PLAN_SECONDS } from "./job/plan-budget";
export { materialCost } from "./job/materials";
export { MissingItem, OpeningTypeProblem, PriceGaps } from "./job/errors";
export { assessOpeningType, type Assessment, type OpeningTypeInput, type PriceGap } from "./job/price-gaps";
export { checkOpening, type OpeningProblem } from "./job/opening-check";
export type {
  BoardOrder,
  MaterialSummary,
  OpeningTypeResult,
  PlaceholderLine,
  PlanningSummary,
  PriceItemSnapshot,
  RipLayout,
  RipPlan,
  TakeoffInputs,
  TakeoffPrices,
  TakeoffResult,
  TakeoffSettings,
  OpeningKindName,
  OpeningShape,
} from "./job/types";
