import { z } from "zod";
import { kindFields, missingKindFields } from "./opening-kinds";
import { trimSpecSchema, wallBuildUpSchema } from "@/takeoff";
import { optionalText, text, uuid, version, versionParam } from "./common";
import { lengthInput } from "./length";

const coordinate = (label: string) =>
  z.number({ error: `${label} must be a number.` }).finite(`${label} must be a finite number.`).min(-1e6).max(1e6);
const nonEmpty = <T extends z.ZodType>(schema: T) =>
  schema.refine((v) => Object.keys(v as object).filter((k) => k !== "version").length > 0, {
    message: "Nothing to change.",
    path: ["_"],
  });

export const unitTypeSchema = z.object({
  name: text("Unit type name", 60),
  count: z.coerce
    .number({ error: "Count must be a whole number." })
    .int("Count must be a whole number.")
    .min(1, "Count must be at least 1.")
    .max(100_000, "Count must be at most 100000."),
});
export const unitTypeUpdateSchema = nonEmpty(unitTypeSchema.partial().extend({ version }).strict());

export const sheetUpdateSchema = nonEmpty(
  z
    .object({
      version,
      label: text("Sheet label", 40).optional(),
      unitTypeId: uuid.nullable().optional(),
      countRole: z.enum(["counted", "reference"], { error: "Count role is counted or reference." }).optional(),
      scale: z
        .object({
          ratio: z.number({ error: "Scale ratio must be a number." }).positive("Scale ratio must be more than zero.").max(100_000),
          label: text("Scale label", 40),
        })
        .nullable()
        .optional(),
      calibrationPoints: z
        .object({
          ax: coordinate("Point A x"),
          ay: coordinate("Point A y"),
          bx: coordinate("Point B x"),
          by: coordinate("Point B y"),
          length: lengthInput("Known length"),
        })
        .refine((p) => Math.hypot(p.bx - p.ax, p.by - p.ay) > 1, {
          message: "Pick two points farther apart.",
          path: ["bx"],
        })
        .nullable()
        .optional(),
    })
    .strict(),
);
export type SheetUpdateInput = z.infer<typeof sheetUpdateSchema>;

const mark = z
  .string({ error: "Mark is required." })
  .trim()
  .min(1, "Mark is required.")
  .max(12, "Mark must be at most 12 characters.")
  .regex(/^[A-Za-z0-9][A-Za-z0-9 .\-/]*$/, "Mark may use letters, digits, spaces, dots, dashes and slashes.");

const openingFields = {
  mark,
  ...kindFields,
  width: lengthInput("Width"),
  height: lengthInput("Height"),
  setback: lengthInput("Setback", { allowZero: true }).optional(),
  wallBuildUp: wallBuildUpSchema.nullable().optional(),
  // Partial: what is left out comes from the organisation's defaults; the engine checks the result.
  trimSpec: z.object(trimSpecSchema.shape).partial().optional(),
  notes: optionalText("Notes", 500),
};

export const openingTypeCreateSchema = z
  .object({ ...openingFields, width: openingFields.width.optional(), height: openingFields.height.optional() })
  .strict()
  .superRefine((o, ctx) => {
    const kind = o.kind ?? "window";
    // A door stands on the floor in a wall it is hung in: its casing has no setback to cover.
    if (kind !== "door" && o.setback === undefined && !o.wallBuildUp) ctx.addIssue({ code: "custom", path: ["setback"], message: "Give the setback, or a wall build-up to work it out from." });
    for (const [field, message] of missingKindFields(kind, o)) ctx.addIssue({ code: "custom", path: [field], message });
  });
export type OpeningTypeCreateInput = z.infer<typeof openingTypeCreateSchema>;

export const openingTypeUpdateSchema = nonEmpty(z.object({ version, ...openingFields }).partial().required({ version: true }).strict());
export type OpeningTypeUpdateInput = z.infer<typeof openingTypeUpdateSchema>;

export const tagCreateSchema = z.object({
  sheetId: uuid,
  openingTypeId: uuid,
  x: coordinate("x"),
  y: coordinate("y"),
  measuredWidth: lengthInput("Measured width").nullable().optional(),
});
export type TagCreateInput = z.infer<typeof tagCreateSchema>;

export const tagUpdateSchema = nonEmpty(
  z
    .object({
      version,
      openingTypeId: uuid.optional(),
      x: coordinate("x").optional(),
      y: coordinate("y").optional(),
      measuredWidth: lengthInput("Measured width").nullable().optional(),
    })
    .strict(),
);
export type TagUpdateInput = z.infer<typeof tagUpdateSchema>;

/** `?version=N` on a DELETE: the version the client last saw. */
export { versionParam };

/** `?tags=N` on a DELETE that takes tags with it: how many the person agreed to remove. */
export const confirmTagsParam = z.coerce.number({ error: "Give ?tags=N: the number of tags you agreed to delete." }).int().min(0).max(10_000_000);
