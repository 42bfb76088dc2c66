import { z } from "zod";
import { MATERIAL_KINDS } from "@/lib/price-books/kinds";
import type { PriceBookChangeView, PriceBookItemView, PriceBookListEntry, PriceBookSummary, PriceBookView } from "@/lib/price-books/types";

/**
 * What the price-book routes answer, as zod schemas the fetchers parse with; `satisfies` keeps each in step with
 * the view type the routes build (lib/price-book/types.ts). Structure only: the rules live in lib/validators.
 */
const labour = z.object({
  minutesPerOpening: z.object({ "stool-and-apron": z.number(), "picture-frame": z.number() }),
  minutesPerExtensionFoot: z.number(),
  hourlyRate: z.number(),
  minutesPerDoorSide: z.number().optional(),
  minutesPerMull: z.number().optional(),
  minutesArchPremium: z.number().optional(),
  minutesPerBayCorner: z.number().optional(),
});

export const priceBookSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  labour,
  markup: z.number(),
  taxRate: z.number(),
  taxLabour: z.boolean(),
  version: z.number(),
  updatedAt: z.string(),
}) satisfies z.ZodType<PriceBookSummary>;

export const priceBookListEntrySchema = priceBookSummarySchema.extend({ itemCount: z.number() }) satisfies z.ZodType<PriceBookListEntry>;

export const priceBookItemSchema = z.object({
  id: z.string(),
  version: z.number(),
  name: z.string(),
  kind: z.enum(MATERIAL_KINDS),
  faceWidth: z.number(),
  thickness: z.number(),
  species: z.string().nullable(),
  supplierCode: z.string().nullable(),
  stock: z.array(z.object({ length: z.number(), price: z.number() })),
}) satisfies z.ZodType<PriceBookItemView>;

export const priceBookSchema = priceBookSummarySchema.extend({ items: z.array(priceBookItemSchema) }) satisfies z.ZodType<PriceBookView>;

export const priceBookChangeSchema = z.object({
  id: z.string(),
  action: z.string(),
  itemId: z.string().nullable(),
  summary: z.string(),
  diff: z.record(z.string(), z.object({ before: z.unknown(), after: z.unknown() })).nullable(),
  at: z.string(),
  userId: z.string().nullable(),
  userName: z.string().nullable(),
}) satisfies z.ZodType<PriceBookChangeView>;
