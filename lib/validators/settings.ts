import { z } from "zod";
import { trimSpecSchema } from "@/takeoff";
import { lengthInput } from "./length";

/**
 * The board-order time limit, in seconds of the whole run. The default matches the engine's own
 * (DEFAULT_RUN_PLAN_SECONDS, takeoff/job/types.ts) so a company that never set one sees what it gets.
 * Half a second still lets a small job prove its orders; a minute is as long as anyone waits for a run.
 */
const KERF_EXAMPLE = "1/8, 3/32 or 3 mm";

export const PLAN_SECONDS = { default: 2, min: 0.5, max: 60 } as const;

const kerfLimit = (label: string) => lengthInput(label, { allowZero: true, example: KERF_EXAMPLE }).refine((k) => k <= 0.5, `${label} must be at most 1/2 in.`);
/** A blank field (the form sends it as "") and null both mean "not set". */
const blankToNull = (v: unknown) => (v === "" || (typeof v === "string" && v.trim() === "") ? null : v);

/** The company's defaults: the trim spec new window types start from, and the kerf and waste every takeoff uses. */
export const settingsSchema = z
  .object({
    trimDefaults: trimSpecSchema.nullable().optional(),
    kerf: lengthInput("Kerf", { allowZero: true, example: KERF_EXAMPLE })
      .refine((k) => k <= 0.5, "Kerf must be at most 1/2 in.")
      .optional(),
    wastePercent: z.coerce
      .number({ error: "Waste allowance must be a number." })
      .min(0, "Waste allowance must not be negative.")
      .max(50, "Waste allowance must be at most 50%.")
      .optional(),
    /** The rip cut between strips of one board; null (or blank) = the saw kerf. */
    ripKerf: z.preprocess(blankToNull, kerfLimit("Rip kerf").nullable()).optional(),
    /** What each scarf joint takes up; null (or blank) = the default. */
    scarfOverlap: z
      .preprocess(
        blankToNull,
        lengthInput("Scarf overlap", { allowZero: true, example: "1, 3/4 or 20 mm" })
          .refine((v) => v <= 12, "Scarf overlap must be at most 12 in.")
          .nullable(),
      )
      .optional(),
    /** Seconds a run may spend planning its board orders; null (or blank) = the default. */
    planSeconds: z
      .preprocess(
        blankToNull,
        z.coerce
          .number({ error: "Board-order time limit must be a number of seconds." })
          .min(PLAN_SECONDS.min, `Board-order time limit must be at least ${PLAN_SECONDS.min} seconds.`)
          .max(PLAN_SECONDS.max, `Board-order time limit must be at most ${PLAN_SECONDS.max} seconds.`)
          .nullable(),
      )
      .optional(),
  })
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: "Nothing to change.", path: ["_"] });
export type SettingsInput = z.infer<typeof settingsSchema>;
