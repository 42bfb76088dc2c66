import { z } from "zod";
import { email, optionalText, text, uuid } from "./common";

export const runTakeoffSchema = z.object({
  name: text("Takeoff name", 80),
  note: optionalText("Note", 500),
  priceBookId: uuid,
  /** An alternate: price every window with this casing instead of each type's own. */
  casingItemId: uuid.nullable().optional(),
  /** Price what the price book lacks with marked placeholders instead of refusing; such a takeoff cannot be submitted. */
  allowPlaceholders: z.boolean({ error: "allowPlaceholders is true or false." }).optional(),
});
export type RunTakeoffInput = z.infer<typeof runTakeoffSchema>;

export const updateTakeoffSchema = z
  .object({ name: text("Takeoff name", 80).optional(), note: optionalText("Note", 500) })
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: "Nothing to change.", path: ["_"] });

export const sendBidSchema = z.object({
  to: email,
  message: optionalText("Message", 2000),
});
