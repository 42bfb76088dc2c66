import type { Opening } from "../types";
import type { TakeoffInputs } from "./types";

type StoredOpeningType = Pick<TakeoffInputs["openingTypes"][number], "width" | "height" | "setback" | "kind" | "shape">;

/**
 * The engine's opening for an opening type as a takeoff stores it: width, height and setback, plus the
 * kind's own fields in `shape` (see OpeningShape). A stored type without a kind is a window (takeoffs
 * saved before kinds existed). Missing kind fields are passed on as they are, so the engine's own
 * validation refuses them with its message, naming the field.
 */
export function openingOf(ot: StoredOpeningType): Opening {
  const s = ot.shape ?? {};
  switch (ot.kind ?? "window") {
    case "window":
      return { width: ot.width, height: ot.height, setback: ot.setback };
    case "mulled":
      return { kind: "mulled", widths: s.widths ?? [], height: ot.height, setback: ot.setback, mullGap: s.mullGap ?? 0 };
    case "door":
      return { kind: "door", width: ot.width, height: ot.height, sides: s.sides ?? 2 };
    case "round-top":
      return { kind: "round-top", width: ot.width, springHeight: s.springHeight ?? 0, setback: ot.setback };
    case "segment-top":
      return { kind: "segment-top", width: ot.width, springHeight: s.springHeight ?? 0, rise: s.rise ?? 0, setback: ot.setback };
    case "bay":
      return { kind: "bay", widths: s.widths ?? [], turn: s.turn ?? 0, height: ot.height, setback: ot.setback, mullGap: s.mullGap ?? 0, ...(s.seat ? { seat: s.seat } : {}) };
  }
}
