import { sql } from "drizzle-orm";
import { boolean, check, doublePrecision, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import type { LabourRates } from "@/takeoff";
import { createdAt, updatedAt } from "./common";
import { organisations, users } from "./accounts";

export const materialKindEnum = pgEnum("material_kind", ["casing", "stool", "apron", "extension", "other"]);

/** One stock length a supplier sells and its price (inches, dollars). */
export interface StockLengthPrice {
  length: number;
  price: number;
}

/** A company's prices: materials with their stock lengths, labour rates, markup and tax. */
export const priceBooks = pgTable(
  "price_books",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    labour: jsonb("labour").$type<LabourRates>().notNull(),
    /** Fractions: 0.15 is 15 %. */
    markup: doublePrecision("markup").notNull().default(0),
    taxRate: doublePrecision("tax_rate").notNull().default(0),
    taxLabour: boolean("tax_labour").notNull().default(false),
    version: integer("version").notNull().default(1),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("price_books_org_idx").on(t.orgId)],
);

export const priceBookItems = pgTable(
  "price_book_items",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    priceBookId: uuid("price_book_id")
      .notNull()
      .references(() => priceBooks.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    kind: materialKindEnum("kind").notNull(),
    /** Face width of a profile, or the board width extensions are ripped from (inches). */
    faceWidth: doublePrecision("face_width").notNull(),
    thickness: doublePrecision("thickness").notNull(),
    species: text("species"),
    supplierCode: text("supplier_code"),
    stock: jsonb("stock").$type<StockLengthPrice[]>().notNull(),
    version: integer("version").notNull().default(1),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("price_book_items_book_idx").on(t.priceBookId),
    check("price_book_items_sizes", sql`${t.faceWidth} > 0 and ${t.thickness} > 0`),
  ],
);

/** Every change to a price book: who, when, what (a before/after of the fields that changed). */
export const priceBookChanges = pgTable(
  "price_book_changes",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    priceBookId: uuid("price_book_id").references(() => priceBooks.id, { onDelete: "set null" }),
    userId: uuid("user_id").references(() => users.id, { onDelete: "set null" }),
    action: text("action").notNull(),
    itemId: uuid("item_id"),
    summary: text("summary").notNull(),
    diff: jsonb("diff").$type<Record<string, { before: unknown; after: unknown }>>(),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("price_book_changes_book_idx").on(t.priceBookId, t.at)],
);
