/** What the plan-set generator promises: positions are PDF user space of the page (unrotated, y up). */
import type { UnitTypeKey, WindowMark } from "./layouts";
import type { Rotation } from "./sheet-frame";

export interface GeneratedWindow {
  mark: WindowMark;
  /** Center of the rough opening, on the exterior wall's centerline. */
  x: number;
  y: number;
  widthInches: number;
  heightInches: number;
}

export interface KnownDimension {
  /** Ends of the overall dimension line under the plan (its tick marks). */
  ax: number;
  ay: number;
  bx: number;
  by: number;
  /** The real length it is labelled with. */
  inches: number;
}

export interface GeneratedSheet {
  pageNumber: number;
  label: string;
  title: string;
  /** "Type A" … or null for a common-area sheet (counted once for the job). */
  unitTypeName: string | null;
  /** Real / paper: 1/4" = 1'-0". */
  scaleRatio: 48;
  rotation: Rotation;
  userUnit: number;
  /** Unrotated page box, user-space units. */
  width: number;
  height: number;
  windows: GeneratedWindow[];
  knownDimension: KnownDimension;
}

export interface PlanSetOptions {
  /** Unit types to draw, one sheet each; default A (2-bed), B (1-bed), C (studio). */
  unitTypes?: readonly UnitTypeKey[];
  /** Start with a common-area sheet (no unit type); default true. */
  commonArea?: boolean;
  /** Extra vector paths (floor finish strokes) on every sheet, for rendering benchmarks; default 0. */
  dense?: number;
  /** Total pages; the base sheets repeat as further levels (A-301, A-302, …). Default: one pass. */
  pages?: number;
  /** /Rotate for every page, or a list cycled by page; the sheet still displays landscape. Default 0. */
  rotate?: Rotation | readonly Rotation[];
  /** /UserUnit for every page (ISO 32000-1 §14.11.2); the sheet keeps its 36 × 24 in size. Default 1. */
  userUnit?: number;
}
