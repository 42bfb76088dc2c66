import type { Opening, PriceItemSnapshot } from "@/takeoff";
import { archElevation } from "./elevation/arch";
import { finish, type ElevationInput } from "./elevation/common";
import { doorElevation } from "./elevation/door";
import { unitsElevation } from "./elevation/units";
import { windowElevation } from "./elevation/window";
import type { Elevation } from "./elevation/types";

export type { Dimension, DrawnPiece, Elevation, Mark, OpeningShape, Pt, RadiusLabel } from "./elevation/types";
export type { ElevationInput } from "./elevation/common";

/**
 * The opening type's trim seen from the room, drawn to scale from its cut list, for every opening kind.
 * An opening saved before kinds existed has no `kind` and is a window. A kind this code does not know
 * (a newer engine's), or units without widths, gets an empty frame rather than a wrong drawing or a throw.
 */
export function elevation(ot: ElevationInput, items: PriceItemSnapshot[] = []): Elevation {
  const o: Opening = ot.kindOpening ?? ot.opening;
  switch (o.kind) {
    case undefined:
    case "window":
      return windowElevation(ot, o, items);
    case "mulled":
    case "bay":
      return o.widths.length > 0 ? unitsElevation(ot, o, items) : blank();
    case "door":
      return doorElevation(ot, o);
    case "round-top":
    case "segment-top":
      return archElevation(ot, o, items);
    default:
      return blank();
  }
}

const blank = (): Elevation =>
  finish({ left: 0, right: 12, top: 0, foot: 12 }, 0.4, 12, { openings: [], pieces: [], dimensions: [], anchors: [], notes: ["No drawing for this kind of opening."] });
