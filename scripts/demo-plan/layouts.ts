/**
 * The invented project's floor plans as data, in real inches. Origin at the outside corner of the
 * exterior wall, x to the right, y "up" the sheet; y = 0 is the street facade. Walls are axis-aligned;
 * interior walls are centerlines that end on another wall's face. Windows sit in exterior walls and are
 * placed by the center of the rough opening along that side, the way window locations are dimensioned
 * (common practice).
 */

export type WindowMark = "W1" | "W2" | "W3" | "W4";

/** The project's window list: rough-opening width × height in inches. */
export const DEMO_WINDOW_TYPES: Record<WindowMark, { widthInches: number; heightInches: number; description: string }> = {
  W1: { widthInches: 36, heightInches: 60, description: "SINGLE HUNG" },
  W2: { widthInches: 30, heightInches: 48, description: "SINGLE HUNG" },
  W3: { widthInches: 72, heightInches: 60, description: "HORIZONTAL SLIDER" },
  W4: { widthInches: 24, heightInches: 36, description: "AWNING, OBSCURE GLASS" },
};

export type Side = "bottom" | "top" | "left" | "right";
export type RoomKind = "bed" | "living" | "kitchen" | "bath" | "closet" | "laundry" | "lobby" | "mail" | "fitness" | "corridor" | "stair";

export interface WallDef {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
}

export interface WindowDef {
  mark: WindowMark;
  side: Side;
  /** Center of the rough opening along the side, from the left (bottom/top) or bottom (left/right) corner. */
  at: number;
}

export interface DoorDef {
  /** The wall the door is in: its direction and centerline coordinate. */
  axis: "h" | "v";
  line: number;
  at: number;
  width: number;
  /** Which jamb carries the hinges: the lower-coordinate one (-1) or the higher (+1). */
  hinge: -1 | 1;
  /** Which side of the wall the leaf swings into (-1 toward lower coordinates). */
  swing: -1 | 1;
}

export interface RoomDef {
  name: string;
  kind: RoomKind;
  /** Clear room rectangle between wall faces: x0, y0, x1, y1. */
  rect: [number, number, number, number];
}

export interface UnitLayout {
  key: "A" | "B" | "C" | "common";
  /** Unit type name as the estimator will see it; null for common areas. */
  unitTypeName: string | null;
  title: string;
  description: string;
  width: number;
  depth: number;
  exteriorWall: number;
  interiorWall: number;
  walls: WallDef[];
  windows: WindowDef[];
  doors: DoorDef[];
  rooms: RoomDef[];
}

/** 2×6 studs + sheathing + gypsum board ≈ 6 1/2"; 2×4 + two layers of 1/2" board = 4 1/2" (common practice). */
const EXT = 6.5;
const INT = 4.5;
const DEPTH = 360;
const top = DEPTH - EXT / 2;

export const TYPE_A: UnitLayout = {
  key: "A",
  unitTypeName: "Type A",
  title: "UNIT TYPE A — FLOOR PLAN",
  description: "2 BEDROOM / 2 BATH",
  width: 463.5,
  depth: DEPTH,
  exteriorWall: EXT,
  interiorWall: INT,
  walls: [
    { x1: 152, y1: 6.5, x2: 152, y2: 353.5 },
    { x1: 320, y1: 6.5, x2: 320, y2: 353.5 },
    { x1: 6.5, y1: 200, x2: 149.75, y2: 200 },
    { x1: 90, y1: 202.25, x2: 90, y2: 353.5 },
    { x1: 322.25, y1: 200, x2: 457, y2: 200 },
    { x1: 388, y1: 202.25, x2: 388, y2: 353.5 },
  ],
  windows: [
    { mark: "W1", side: "bottom", at: 78 },
    { mark: "W3", side: "bottom", at: 236 },
    { mark: "W1", side: "bottom", at: 390 },
    { mark: "W2", side: "left", at: 100 },
    { mark: "W4", side: "left", at: 290 },
    { mark: "W2", side: "right", at: 100 },
    { mark: "W4", side: "right", at: 290 },
  ],
  doors: [
    { axis: "h", line: top, at: 236, width: 36, hinge: -1, swing: -1 },
    { axis: "v", line: 152, at: 150, width: 32, hinge: 1, swing: -1 },
    { axis: "h", line: 200, at: 48, width: 30, hinge: -1, swing: 1 },
    { axis: "h", line: 200, at: 121, width: 28, hinge: 1, swing: 1 },
    { axis: "v", line: 320, at: 150, width: 32, hinge: 1, swing: 1 },
    { axis: "h", line: 200, at: 424, width: 30, hinge: 1, swing: 1 },
    { axis: "v", line: 320, at: 290, width: 30, hinge: -1, swing: 1 },
  ],
  rooms: [
    { name: "BEDROOM 1", kind: "bed", rect: [6.5, 6.5, 149.75, 197.75] },
    { name: "BATH 1", kind: "bath", rect: [6.5, 202.25, 87.75, 353.5] },
    { name: "W.I.C.", kind: "closet", rect: [92.25, 202.25, 149.75, 353.5] },
    { name: "LIVING / DINING", kind: "living", rect: [154.25, 6.5, 317.75, 220] },
    { name: "KITCHEN", kind: "kitchen", rect: [154.25, 220, 317.75, 353.5] },
    { name: "BEDROOM 2", kind: "bed", rect: [322.25, 6.5, 457, 197.75] },
    { name: "LAUNDRY", kind: "laundry", rect: [322.25, 202.25, 385.75, 353.5] },
    { name: "BATH 2", kind: "bath", rect: [390.25, 202.25, 457, 353.5] },
  ],
};

export const TYPE_B: UnitLayout = {
  key: "B",
  unitTypeName: "Type B",
  title: "UNIT TYPE B — FLOOR PLAN",
  description: "1 BEDROOM / 1 BATH",
  width: 334.5,
  depth: DEPTH,
  exteriorWall: EXT,
  interiorWall: INT,
  walls: [
    { x1: 150, y1: 6.5, x2: 150, y2: 353.5 },
    { x1: 6.5, y1: 200, x2: 147.75, y2: 200 },
    { x1: 100, y1: 202.25, x2: 100, y2: 353.5 },
  ],
  windows: [
    { mark: "W1", side: "bottom", at: 78 },
    { mark: "W3", side: "bottom", at: 240 },
    { mark: "W2", side: "left", at: 100 },
    { mark: "W4", side: "left", at: 280 },
    { mark: "W2", side: "right", at: 110 },
  ],
  doors: [
    { axis: "h", line: top, at: 240, width: 36, hinge: -1, swing: -1 },
    { axis: "v", line: 150, at: 150, width: 32, hinge: 1, swing: -1 },
    { axis: "h", line: 200, at: 52, width: 30, hinge: -1, swing: 1 },
    { axis: "h", line: 200, at: 125, width: 28, hinge: 1, swing: 1 },
  ],
  rooms: [
    { name: "BEDROOM", kind: "bed", rect: [6.5, 6.5, 147.75, 197.75] },
    { name: "BATH", kind: "bath", rect: [6.5, 202.25, 97.75, 353.5] },
    { name: "CLOSET", kind: "closet", rect: [102.25, 202.25, 147.75, 353.5] },
    { name: "LIVING", kind: "living", rect: [152.25, 6.5, 328, 220] },
    { name: "KITCHEN", kind: "kitchen", rect: [152.25, 220, 328, 353.5] },
  ],
};

export const TYPE_C: UnitLayout = {
  key: "C",
  unitTypeName: "Type C",
  title: "UNIT TYPE C — FLOOR PLAN",
  description: "STUDIO",
  width: 268.75,
  depth: DEPTH,
  exteriorWall: EXT,
  interiorWall: INT,
  walls: [
    { x1: 6.5, y1: 210, x2: 102.25, y2: 210 },
    { x1: 100, y1: 212.25, x2: 100, y2: 353.5 },
  ],
  windows: [
    { mark: "W3", side: "bottom", at: 134 },
    { mark: "W2", side: "left", at: 110 },
    { mark: "W4", side: "left", at: 290 },
    { mark: "W1", side: "right", at: 110 },
  ],
  doors: [
    { axis: "h", line: top, at: 190, width: 36, hinge: 1, swing: -1 },
    { axis: "h", line: 210, at: 52, width: 30, hinge: -1, swing: 1 },
  ],
  rooms: [
    { name: "LIVING / SLEEPING", kind: "living", rect: [6.5, 6.5, 262.25, 207.75] },
    { name: "BATH", kind: "bath", rect: [6.5, 212.25, 97.75, 353.5] },
    { name: "KITCHEN", kind: "kitchen", rect: [102.25, 212.25, 262.25, 353.5] },
  ],
};

export const COMMON_AREAS: UnitLayout = {
  key: "common",
  unitTypeName: null,
  title: "LEVEL 1 — COMMON AREAS PLAN",
  description: "LOBBY, MAIL, FITNESS",
  width: 699.25,
  depth: DEPTH,
  exteriorWall: EXT,
  interiorWall: INT,
  walls: [
    { x1: 6.5, y1: 240, x2: 692.75, y2: 240 },
    { x1: 200, y1: 6.5, x2: 200, y2: 237.75 },
    { x1: 480, y1: 6.5, x2: 480, y2: 237.75 },
    { x1: 580, y1: 242.25, x2: 580, y2: 353.5 },
  ],
  windows: [
    { mark: "W2", side: "bottom", at: 100 },
    { mark: "W3", side: "bottom", at: 270 },
    { mark: "W3", side: "bottom", at: 410 },
    { mark: "W1", side: "bottom", at: 540 },
    { mark: "W1", side: "bottom", at: 640 },
    { mark: "W2", side: "left", at: 120 },
    { mark: "W2", side: "right", at: 120 },
  ],
  doors: [
    { axis: "h", line: EXT / 2, at: 340, width: 36, hinge: -1, swing: 1 },
    { axis: "v", line: 200, at: 200, width: 32, hinge: 1, swing: -1 },
    { axis: "v", line: 480, at: 200, width: 32, hinge: 1, swing: 1 },
    { axis: "h", line: 240, at: 340, width: 36, hinge: -1, swing: 1 },
    { axis: "v", line: 580, at: 300, width: 36, hinge: -1, swing: 1 },
  ],
  rooms: [
    { name: "MAIL / PARCEL", kind: "mail", rect: [6.5, 6.5, 197.75, 237.75] },
    { name: "LOBBY", kind: "lobby", rect: [202.25, 6.5, 477.75, 237.75] },
    { name: "FITNESS", kind: "fitness", rect: [482.25, 6.5, 692.75, 237.75] },
    { name: "CORRIDOR", kind: "corridor", rect: [6.5, 242.25, 577.75, 353.5] },
    { name: "STAIR 2", kind: "stair", rect: [582.25, 242.25, 692.75, 353.5] },
  ],
};

export const UNIT_LAYOUTS = { A: TYPE_A, B: TYPE_B, C: TYPE_C } as const;
export type UnitTypeKey = keyof typeof UNIT_LAYOUTS;
