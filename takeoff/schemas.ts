import { z } from "zod";
import { parseLengthExact } from "./length-parse";

/**
 * zod schemas for the engine's inputs, shared with the API and forms. Each
 * message starts with the field's plain-English name; validate.ts prefixes the
 * field path, so an Error reads "casingThickness: casing thickness must be …".
 */

const finite = (label: string) => z.number({ error: `${label} must be a finite number` });
const positive = (label: string) => finite(label).gt(0, { error: `${label} must be greater than 0` });
const nonNegative = (label: string) => finite(label).min(0, { error: `${label} must not be negative` });
const count = (label: string) =>
  finite(label).int({ error: `${label} must be a whole number` }).min(0, { error: `${label} must not be negative` });

export const styleSchema = z.enum(["stool-and-apron", "picture-frame"], {
  error: 'style must be "stool-and-apron" or "picture-frame"',
});

export const openingSchema = z.object({
  width: positive("opening width"),
  height: positive("opening height"),
  setback: nonNegative("setback"),
});

export const trimSpecSchema = z
  .object({
    style: styleSchema,
    casingWidth: positive("casing width"),
    casingThickness: positive("casing thickness"),
    reveal: nonNegative("reveal").optional(),
    stoolHorn: nonNegative("stool horn").optional(),
    stoolProjection: nonNegative("stool projection").optional(),
    apronInset: nonNegative("apron inset").optional(),
    apronReturns: z.boolean({ error: "apron returns must be true or false" }).optional(),
    extensionThickness: positive("extension thickness").optional(),
  })
  .superRefine((spec, ctx) => {
    // A reveal as wide as the casing would leave nothing of the casing on the jamb.
    if (spec.reveal !== undefined && spec.reveal >= spec.casingWidth) {
      ctx.addIssue({ code: "custom", path: ["reveal"], message: "reveal must be less than the casing width" });
    }
  });

export const takeoffLineSchema = z.object({
  opening: openingSchema,
  spec: trimSpecSchema,
  quantity: count("quantity"),
});

export const demandSchema = z.object({
  length: positive("piece length"),
  quantity: count("quantity"),
});

export const stockItemSchema = z.object({
  length: positive("stock length"),
  price: nonNegative("price"),
  width: positive("stock width").optional(),
});

export const planOptionsSchema = z.object({ kerf: nonNegative("kerf") });

export const labourRatesSchema = z.object({
  minutesPerOpening: z.object({
    "stool-and-apron": nonNegative("minutes per stool-and-apron opening"),
    "picture-frame": nonNegative("minutes per picture-frame opening"),
  }),
  minutesPerExtensionFoot: nonNegative("minutes per foot of extension"),
  hourlyRate: nonNegative("hourly rate"),
});

export const bidRatesSchema = z.object({
  markup: nonNegative("markup"),
  taxRate: nonNegative("tax rate"),
  taxLabour: z.boolean().optional(),
});

/** A length as typed in a form ("2'-1 7/8\"", "635 mm") → inches; the issue carries the parse error. */
export const lengthTextSchema = z.string().transform((text, ctx) => {
  try {
    return parseLengthExact(text).valueOf();
  } catch (e) {
    ctx.addIssue({ code: "custom", message: (e as Error).message });
    return z.NEVER;
  }
});
