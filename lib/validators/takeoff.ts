import { z } from "zod";
import { optionalText, text, uuid } from "./common";

export const runTakeoffSchema = z.object({
  name: text("Takeoff name", 80),
  note: optionalText("Note", 500),
  priceBookId: uuid,
  /** An alternate: price every window with this casing instead of each type's own. */
  casingItemId: uuid.nullable().optional(),
});
export type RunTakeoffInput = z.infer<typeof runTakeoffSchema>;
