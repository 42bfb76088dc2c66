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

export const windowOpeningSchema = z.object({
  kind: z.literal("window").optional(),
  width: positive("opening width"),
  height: positive("opening height"),
  setback: nonNegative("setback"),
});

export const mulledOpeningSchema = z.object({
  kind: z.literal("mulled"),
  widths: z
    .array(positive("unit width"), { error: "widths must be a list of unit widths" })
    .min(2, { error: "a mulled opening needs at least two units" }),
  height: positive("opening height"),
  setback: nonNegative("setback"),
  mullGap: positive("mull gap"),
});

export const doorOpeningSchema = z.object({
  kind: z.literal("door"),
  width: positive("door width"),
  height: positive("door height"),
  sides: z.union([z.literal(1), z.literal(2)], { error: "sides must be 1 or 2" }),
});

export const roundTopOpeningSchema = z.object({
  kind: z.literal("round-top"),
  width: positive("opening width"),
  springHeight: positive("spring height"),
  setback: nonNegative("setback"),
});

export const segmentTopOpeningSchema = z
  .object({
    kind: z.literal("segment-top"),
    width: positive("opening width"),
    springHeight: positive("spring height"),
    rise: positive("rise"),
    setback: nonNegative("setback"),
  })
  .superRefine((o, ctx) => {
    // Beyond half the span the arc is more than a half-circle and the legs would have to lean in.
    if (o.rise > o.width / 2) ctx.addIssue({ code: "custom", path: ["rise"], message: "rise must be at most half the width" });
  });

export const bayOpeningSchema = z.object({
  kind: z.literal("bay"),
  widths: z
    .array(positive("unit width"), { error: "widths must be a list of unit widths" })
    .min(3, { error: "a bay or bow needs at least three units" }),
  turn: finite("turn")
    .gt(0, { error: "turn must be more than 0 degrees" })
    .lt(90, { error: "turn must be less than 90 degrees" }),
  height: positive("opening height"),
  setback: nonNegative("setback"),
  mullGap: positive("mull gap"),
  seat: z.enum(["segments", "one-piece"], { error: 'seat must be "segments" or "one-piece"' }).optional(),
});

export const OPENING_KINDS = ["window", "mulled", "door", "round-top", "segment-top", "bay"] as const;

/** Any opening; `kind` picks the shape of the rest and, when omitted, means "window". */
export const openingSchema = z.discriminatedUnion(
  "kind",
  [windowOpeningSchema, mulledOpeningSchema, doorOpeningSchema, roundTopOpeningSchema, segmentTopOpeningSchema, bayOpeningSchema],
  { error: `kind must be one of ${OPENING_KINDS.map((k) => `"${k}"`).join(", ")}` },
);

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
    curvedCasing: z.enum(["by-radius", "segments"], { error: 'curved casing must be "by-radius" or "segments"' }).optional(),
    segmentBoardWidth: positive("segment board width").optional(),
  })
  .superRefine((spec, ctx) => {
    // A reveal as wide as the casing would leave nothing of the casing on the jamb.
    if (spec.reveal !== undefined && spec.reveal >= spec.casingWidth) {
      ctx.addIssue({ code: "custom", path: ["reveal"], message: "reveal must be less than the casing width" });
    }
    if (spec.curvedCasing === "segments" && spec.segmentBoardWidth === undefined) {
      ctx.addIssue({ code: "custom", path: ["segmentBoardWidth"], message: "segment board width is needed to cut curved casing as segments" });
    }
    // A ring segment is always deeper than the casing is wide (depth Ro − Ri·cos(φ/2) > Ro − Ri).
    if (spec.segmentBoardWidth !== undefined && spec.segmentBoardWidth <= spec.casingWidth) {
      ctx.addIssue({ code: "custom", path: ["segmentBoardWidth"], message: "segment board width must be more than the casing width" });
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
  minutesPerDoorSide: nonNegative("minutes per door side").optional(),
  minutesPerMull: nonNegative("minutes per mull").optional(),
  minutesArchPremium: nonNegative("minutes added for an arched head").optional(),
  minutesPerBayCorner: nonNegative("minutes per bay corner").optional(),
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
