import { sql } from "drizzle-orm";
import { index, jsonb, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import type { TakeoffInputs, TakeoffPrices, TakeoffResult } from "@/takeoff";
import { createdAt } from "./common";
import { organisations, users } from "./accounts";
import { projects } from "./projects";
import { priceBooks } from "./price-books";

export const takeoffStatusEnum = pgEnum("takeoff_status", ["draft", "submitted"]);

/**
 * A computed, saved takeoff. Inputs, prices and result are snapshots taken when it ran, so a later
 * change to the window list, the counts or the price book never rewrites it.
 */
export const takeoffs = pgTable(
  "takeoffs",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    note: text("note"),
    priceBookId: uuid("price_book_id").references(() => priceBooks.id, { onDelete: "set null" }),
    status: takeoffStatusEnum("status").notNull().default("draft"),
    inputs: jsonb("inputs").$type<TakeoffInputs>().notNull(),
    prices: jsonb("prices").$type<TakeoffPrices>().notNull(),
    result: jsonb("result").$type<TakeoffResult>().notNull(),
    /** SHA-256 of the engine version, inputs and prices the result was computed from: a rerun with the same reuses it. */
    inputHash: text("input_hash"),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    submittedAt: timestamp("submitted_at", { withTimezone: true }),
    submittedBy: uuid("submitted_by").references(() => users.id, { onDelete: "set null" }),
  },
  (t) => [
    index("takeoffs_project_idx").on(t.projectId, t.createdAt),
    index("takeoffs_input_hash_idx").on(t.orgId, t.inputHash),
    // A project is bid once: at most one of its takeoffs is the submitted bid, whatever races the app loses.
    uniqueIndex("takeoffs_one_submitted_per_project").on(t.projectId).where(sql`${t.status} = 'submitted'`),
  ],
);

/** Each time a bid summary was e-mailed: to whom, by whom, when. */
export const takeoffSends = pgTable(
  "takeoff_sends",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    takeoffId: uuid("takeoff_id")
      .notNull()
      .references(() => takeoffs.id, { onDelete: "cascade" }),
    to: text("to").notNull(),
    subject: text("subject").notNull(),
    sentBy: uuid("sent_by").references(() => users.id, { onDelete: "set null" }),
    sentAt: timestamp("sent_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("takeoff_sends_takeoff_idx").on(t.takeoffId, t.sentAt)],
);
