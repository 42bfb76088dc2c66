import { z } from "zod";
import { trimSpecSchema } from "@/takeoff";
import { lengthInput } from "./length";

/** The company's defaults: the trim spec new window types start from, and the kerf and waste every takeoff uses. */
export const settingsSchema = z
  .object({
    trimDefaults: trimSpecSchema.nullable().optional(),
    kerf: lengthInput("Kerf", { allowZero: true })
      .refine((k) => k <= 0.5, "Kerf must be at most 1/2 in.")
      .optional(),
    wastePercent: z.coerce
      .number({ error: "Waste allowance must be a number." })
      .min(0, "Waste allowance must not be negative.")
      .max(50, "Waste allowance must be at most 50%.")
      .optional(),
  })
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: "Nothing to change.", path: ["_"] });
export type SettingsInput = z.infer<typeof settingsSchema>;
