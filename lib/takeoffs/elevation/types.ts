import type { Part } from "@/takeoff";
import type { PlacedCallout } from "../elevation-callouts";

/**
 * An opening's trim as seen from the room, in inches, y downward. Rectangular kinds put the origin at the
 * top-left corner of the (leftmost) jamb opening; arched heads put it on the left jamb at the spring line.
 */
export type Pt = { x: number; y: number };

export interface DrawnPiece {
  part: Part;
  /** Outline, clockwise from the first corner; miters show as the slanted edge. Arcs are sampled here. */
  points: Pt[];
  /** Jamb extensions sit behind the casing: drawn as hidden (dashed) lines. */
  hidden: boolean;
  /** Exact SVG outline when the piece is curved (true arcs); `points` still bound it. */
  d?: string;
}

export interface Dimension {
  /** "casing-width" | "leg" | "stool" | "apron" | "outside-width" | "unit-0" … */
  key: string;
  label: string;
  axis: "x" | "y";
  /** Span along the axis, and where the dimension line runs across it. */
  from: number;
  to: number;
  at: number;
  /** Where the witness lines start (the piece's edge). */
  base: number;
  value: number;
}

/** The glass side of the jambs: its outline and two short lines of text. */
export interface OpeningShape {
  d: string;
  points: Pt[];
  lines: [string, string];
  at: Pt;
}

/** A radius leader: an arrow from `from` (where the text sits) to `to` on the curved edge. */
export interface RadiusLabel {
  from: Pt;
  to: Pt;
  text: string;
  value: number;
}

/** A reference line (finished floor, a bay corner folded flat) with its note. */
export interface Mark {
  line: [Pt, Pt];
  text: string;
  at: Pt;
  kind: "floor" | "fold";
}

export interface Elevation {
  openings: OpeningShape[];
  pieces: DrawnPiece[];
  dimensions: Dimension[];
  callouts: PlacedCallout[];
  calloutX: number;
  radii: RadiusLabel[];
  marks: Mark[];
  /** Sentences the drawing needs beside it ("one side drawn, cased both sides"). */
  notes: string[];
  /** Text size and spacing unit, proportional to the opening so every drawing reads alike when fitted. */
  unit: number;
  scaleBar: { x: number; y: number; length: number };
  bounds: { minX: number; minY: number; maxX: number; maxY: number };
}
