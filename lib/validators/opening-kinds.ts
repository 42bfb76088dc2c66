import { z } from "zod";
import { lengthInput } from "./length";

/**
 * The fields of an opening type beyond width, height and setback, one set per kind (the engine's
 * geometry for each is in takeoff/kinds). Which are required depends on the kind; missingKindFields
 * says which are missing, in words, so the API names the field.
 */
export const OPENING_KIND_NAMES = ["window", "mulled", "door", "round-top", "segment-top", "bay"] as const;

export const kindFields = {
  kind: z.enum(OPENING_KIND_NAMES, { error: `Kind must be one of ${OPENING_KIND_NAMES.join(", ")}.` }).optional(),
  widths: z
    .array(lengthInput("Unit width"), { error: "Unit widths must be a list of lengths, left to right." })
    .min(2, "A mulled unit needs at least two windows.")
    .max(6, "At most six units in one opening.")
    .optional(),
  mullGap: lengthInput("Mull gap").optional(),
  sides: z.coerce
    .number({ error: "Door sides must be 1 (exterior) or 2 (interior)." })
    .refine((n) => n === 1 || n === 2, "Door sides must be 1 (exterior) or 2 (interior).")
    .transform((n) => n as 1 | 2)
    .optional(),
  springHeight: lengthInput("Spring height").optional(),
  rise: lengthInput("Rise").optional(),
  turn: z.coerce
    .number({ error: "Corner turn must be a number of degrees." })
    .gt(0, "Corner turn must be more than 0°.")
    .lt(90, "Corner turn must be less than 90°.")
    .optional(),
};

type KindInput = { [K in keyof typeof kindFields]?: z.output<(typeof kindFields)[K]> } & { width?: number; height?: number };

/** What a kind needs that the input lacks: [field, message] pairs. */
export function missingKindFields(kind: (typeof OPENING_KIND_NAMES)[number], o: KindInput): [string, string][] {
  const need: [keyof KindInput, string][] = [];
  switch (kind) {
    case "window":
      need.push(["width", "Width is required."], ["height", "Height is required."]);
      break;
    case "mulled":
      need.push(["widths", "A mulled unit needs its windows' widths, left to right."], ["mullGap", "Give the mull gap between the units."], ["height", "Height is required."]);
      break;
    case "bay":
      need.push(["widths", "A bay needs its units' widths, left to right."], ["mullGap", "Give the mull gap at each corner."], ["turn", "Give the angle each corner turns."], ["height", "Height is required."]);
      if (o.widths && o.widths.length < 3) return [["widths", "A bay or bow needs at least three units."]];
      break;
    case "door":
      need.push(["width", "Width is required."], ["height", "Height is required."], ["sides", "Say whether the door is cased on 1 side (exterior) or 2 (interior)."]);
      break;
    case "round-top":
      need.push(["width", "Width is required."], ["springHeight", "Give the spring height: where the arch starts."]);
      break;
    case "segment-top":
      need.push(["width", "Width is required."], ["springHeight", "Give the spring height: where the arch starts."], ["rise", "Give the arch's rise above the spring line."]);
      break;
  }
  return need.filter(([k]) => o[k] === undefined).map(([k, m]) => [k, m]);
}
