import { z } from "zod";
import { MATERIAL_KINDS } from "@/lib/price-books/kinds";
import { sameLength, stockLengthText } from "@/lib/price-books/length-text";
import { readDecimal } from "@/lib/price-books/numbers";
import { optionalText, text, version } from "./common";
import { lengthInput } from "./length";

/**
 * Price books and their items, shared by the forms, the CSV import and the API. Markup and tax are
 * fractions here (0.15 is 15 %); the forms show and take percentages and convert at the edge.
 */

const nonEmpty = <T extends z.ZodType>(schema: T) =>
  schema.refine((v) => Object.keys(v as object).filter((k) => k !== "version").length > 0, {
    message: "Nothing to change.",
    path: ["_"],
  });

/** A number typed or sent as JSON, with a bound and a number of decimals (money: 2). */
const decimal = (label: string, max: number, decimals: number, dollars = false) =>
  z.union([z.number(), z.string()], { error: `${label} is required.` }).transform((value, ctx) => {
    const read = readDecimal(value, { label, max, decimals, dollars });
    if (read.ok) return read.value;
    ctx.addIssue({ code: "custom", message: read.message });
    return z.NEVER;
  });
export const money = (label: string, max = 100_000) => decimal(label, max, 2, true);

const fraction = (label: string, max: number) =>
  z
    .number({ error: `${label} must be a number.` })
    .finite(`${label} must be a number.`)
    .min(0, `${label} must be zero or more.`)
    .max(max, `${label} must be at most ${max * 100} %.`);

export const labourSchema = z
  .object({
    minutesPerOpening: z
      .object({
        "stool-and-apron": decimal("Minutes per stool-and-apron opening", 1440, 2),
        "picture-frame": decimal("Minutes per picture-frame opening", 1440, 2),
      })
      .strict(),
    minutesPerExtensionFoot: decimal("Minutes per foot of extension", 600, 2),
    hourlyRate: money("Hourly rate", 10_000),
    // Per opening kind; absent = not set (see takeoff/pricing.ts for what that means).
    minutesPerDoorSide: decimal("Minutes per door side", 1440, 2).optional(),
    minutesPerMull: decimal("Minutes per mull", 1440, 2).optional(),
    minutesArchPremium: decimal("Minutes added for an arched head", 1440, 2).optional(),
    minutesPerBayCorner: decimal("Minutes per bay corner", 1440, 2).optional(),
  })
  .strict();
export type LabourInput = z.infer<typeof labourSchema>;

const bookFields = {
  name: text("Price book name", 120),
  labour: labourSchema,
  markup: fraction("Markup", 10),
  taxRate: fraction("Tax rate", 1),
  taxLabour: z.boolean({ error: "Tax labour must be true or false." }),
};

/** Rates left out start at zero: a new book shows them unset rather than inventing a crew's pace. */
export const priceBookCreateSchema = z.object(bookFields).partial().required({ name: true }).strict();
export type PriceBookCreateInput = z.infer<typeof priceBookCreateSchema>;

// `.extend` after `.partial`: a required version keeps its own message ("reload and try again").
export const priceBookUpdateSchema = nonEmpty(z.object(bookFields).partial().extend({ version }).strict());
export type PriceBookUpdateInput = z.infer<typeof priceBookUpdateSchema>;

/** Bare numbers are inches, so "8" for an 8-foot board would mean 8 inches: nobody sells stock that short. */
export const stockLength = lengthInput("Stock length").refine((inches) => inches >= 12, {
  message: `Stock length is under a foot: write feet with a ' (8' or 8 ft, not 8).`,
});

const stockEntry = z.object({ length: stockLength, price: money("Price") }).strict();

export const stockSchema = z
  .array(stockEntry, { error: "Give the stock lengths and their prices." })
  .min(1, "Give at least one stock length and its price.")
  .max(12, "At most 12 stock lengths per item.")
  .superRefine((stock, ctx) => {
    stock.forEach((s, i) => {
      const first = stock.findIndex((o) => sameLength(o.length, s.length));
      if (first < i) ctx.addIssue({ code: "custom", path: [i, "length"], message: `${stockLengthText(s.length)} is listed twice.` });
    });
  })
  // Stored shortest first, so the table, the export and the change log list them in one order.
  .transform((stock) => [...stock].sort((a, b) => a.length - b.length));

const size = (label: string) =>
  lengthInput(label).refine((inches) => inches <= 24, { message: `${label} is over 24" — wider than any trim board.` });

const itemFields = {
  name: text("Item name", 120),
  kind: z.enum(MATERIAL_KINDS, { error: "Kind must be casing, stool, apron, extension or other." }),
  faceWidth: size("Face width"),
  thickness: size("Thickness"),
  species: optionalText("Species or finish", 80),
  supplierCode: optionalText("Supplier code", 40),
  stock: stockSchema,
};

export const priceBookItemCreateSchema = z.object(itemFields).strict();
export type PriceBookItemCreateInput = z.infer<typeof priceBookItemCreateSchema>;

export const priceBookItemUpdateSchema = nonEmpty(z.object(itemFields).partial().extend({ version }).strict());
export type PriceBookItemUpdateInput = z.infer<typeof priceBookItemUpdateSchema>;

export const csvImportSchema = z
  .object({
    csv: z.string({ error: "Paste or choose a CSV file." }).min(1, "The CSV is empty."),
    mode: z.enum(["merge", "replace"], { error: 'Mode must be "merge" or "replace".' }).default("merge"),
    apply: z.boolean({ error: "Apply must be true or false." }).default(false),
    /** The preview's token: applying refuses if the book changed since that preview was made. */
    previewToken: z.string().max(128).optional(),
  })
  .strict();
export type CsvImportInput = z.infer<typeof csvImportSchema>;
