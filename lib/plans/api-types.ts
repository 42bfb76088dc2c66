/**
 * Shapes the plans API answers with, shared by the route handlers and the client views.
 * Coordinates and page sizes are PDF user-space units (ISO 32000-1); lengths are inches.
 */
import type { OpeningTypeValues } from "@/db/queries/opening-types";

export interface UnitTypeView {
  id: string;
  name: string;
  /** How many of this layout the job has. */
  count: number;
  /** Sent back with an edit or delete; a stale one is refused with the row as it is now. */
  version: number;
}

export interface PlanSetView {
  id: string;
  name: string;
  sizeBytes: number;
  pageCount: number;
  /** SHA-256 of the file's bytes (hex), or null for sets uploaded before it was kept. */
  contentHash: string | null;
  createdAt: string;
}

export interface CalibrationPointsView {
  ax: number;
  ay: number;
  bx: number;
  by: number;
  /** The real length between the points, inches. */
  inches: number;
}

/** Counted: the sheet's tags count toward its unit type (or the common areas). Reference: an enlarged plan or a repeat, not counted. */
export type SheetCountRole = "counted" | "reference";

export interface SheetView {
  id: string;
  planSetId: string;
  planSetName: string;
  pageNumber: number;
  label: string;
  unitTypeId: string | null;
  countRole: SheetCountRole;
  /** Unrotated page box size, PDF units. */
  width: number;
  height: number;
  /** Page /Rotate: 0, 90, 180 or 270 (clockwise, as displayed). */
  rotation: number;
  userUnit: number;
  scaleRatio: number | null;
  scaleLabel: string | null;
  calibrationPoints: CalibrationPointsView | null;
  /** Real inches per PDF unit in effect, or null when the sheet is not calibrated. */
  inchesPerUnit: number | null;
  /** Set when picked points and the chosen scale disagree by more than 1%. */
  scaleMismatchPercent: number | null;
  tagCount: number;
  version: number;
}

/** An opening type as the API sends it: the stored values with its id and version. */
export interface OpeningTypeView extends OpeningTypeValues {
  id: string;
  version: number;
}

export interface TagView {
  id: string;
  sheetId: string;
  openingTypeId: string;
  x: number;
  y: number;
  measuredWidth: number | null;
  /** True when a measured width differs from the type's width by more than 1 in. */
  widthMismatch: boolean;
  version: number;
}

/** Opening counts keyed by opening type id. */
export type CountByType = Record<string, number>;

/**
 * Something in the counts an estimator should look at before a takeoff:
 * two counted sheets of one unit type carrying the same tag layout (likely the same plan counted twice),
 * or a unit type whose sheets are all reference views (so it counts nothing).
 */
export type CountWarning =
  | { kind: "same-layout"; unitTypeId: string | null; sheetIds: string[]; message: string }
  | { kind: "no-counted-sheet"; unitTypeId: string; sheetIds: string[]; message: string };

export interface CountsView {
  /** Every sheet with its own tags; only `counted` ones feed the unit types, the common areas and the job. */
  sheets: { sheetId: string; label: string; unitTypeId: string | null; countRole: SheetCountRole; byType: CountByType; total: number }[];
  unitTypes: { unitTypeId: string; name: string; unitCount: number; perUnit: CountByType; allUnits: CountByType }[];
  /** Tags on sheets without a unit type: common areas, counted once. */
  commonAreas: CountByType;
  /** Per unit type (tags × unit count) plus common areas. */
  job: CountByType;
  jobTotal: number;
  warnings: CountWarning[];
}

/** A refused stale edit: 409 with the row as it is now, so the client can show the latest state. */
export interface StaleEdit<T> {
  error: string;
  current: T | null;
}

/** What the upload route hands back to the browser once the server has checked the PDF. */
export type PlanUploadResult = { ok: true; planSetId: string; pageCount: number } | { ok: false; error: string };

/** The window list checked against a price book (GET …/price-gaps). */
export interface PriceGapsView {
  /** The book checked: the one asked for, else the one this project's last takeoff used, else the organisation's first. */
  priceBook: { id: string; name: string } | null;
  /** Per opening type: what the book cannot supply (with the fix), or why the window cannot be cut at all. */
  gaps: { openingTypeId: string; mark: string; material: string; kind: "no-item" | "too-long" | "cannot-cut"; message: string; fix: string }[];
}
