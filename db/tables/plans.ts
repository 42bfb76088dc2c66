import { sql } from "drizzle-orm";
import {
  bigint,
  check,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";
import type { TrimSpec } from "@/takeoff";
import type { WallBuildUp } from "@/takeoff";
import type { OpeningKindName, OpeningShape } from "@/takeoff/job/types";
import { createdAt, updatedAt } from "./common";
import { organisations, users } from "./accounts";
import { projects } from "./projects";

const orgId = () =>
  uuid("org_id")
    .notNull()
    .references(() => organisations.id, { onDelete: "cascade" });
const projectId = () =>
  uuid("project_id")
    .notNull()
    .references(() => projects.id, { onDelete: "cascade" });
// Optimistic concurrency: every edit names the version it started from; a stale one is refused.
const version = () => integer("version").notNull().default(1);

/** A repeated dwelling layout and how many of it the job has. */
export const unitTypes = pgTable(
  "unit_types",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: orgId(),
    projectId: projectId(),
    name: text("name").notNull(),
    count: integer("count").notNull(),
    version: version(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("unit_types_project_name_key").on(t.projectId, t.name), check("unit_types_count_positive", sql`${t.count} >= 1`)],
);

/** One uploaded PDF. The bytes live with the upload service under `fileKey`. */
export const planSets = pgTable(
  "plan_sets",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: orgId(),
    projectId: projectId(),
    name: text("name").notNull(),
    fileKey: text("file_key").notNull(),
    // SHA-256 of the bytes as the server read them back; null for sets uploaded before it was kept.
    contentHash: text("content_hash"),
    sizeBytes: bigint("size_bytes", { mode: "number" }).notNull(),
    pageCount: integer("page_count").notNull(),
    uploadedBy: uuid("uploaded_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("plan_sets_file_key_key").on(t.fileKey),
    index("plan_sets_project_idx").on(t.projectId),
    index("plan_sets_project_hash_idx").on(t.projectId, t.contentHash),
  ],
);

export const SHEET_COUNT_ROLES = ["counted", "reference"] as const;
export type SheetCountRole = (typeof SHEET_COUNT_ROLES)[number];

/** Two picked points on a known dimension, in PDF user space, and the length typed for it (inches). */
export interface CalibrationPoints {
  ax: number;
  ay: number;
  bx: number;
  by: number;
  inches: number;
}

/** One page of a plan set. Sizes and points are PDF user-space units (ISO 32000-1: 1/72 in × UserUnit). */
export const sheets = pgTable(
  "sheets",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: orgId(),
    projectId: projectId(),
    planSetId: uuid("plan_set_id")
      .notNull()
      .references(() => planSets.id, { onDelete: "cascade" }),
    pageNumber: integer("page_number").notNull(),
    label: text("label").notNull(),
    unitTypeId: uuid("unit_type_id").references(() => unitTypes.id, { onDelete: "set null" }),
    // Whether this sheet's tags count toward its unit type (or the common areas), or it is a reference
    // view (an enlarged plan, a repeat of a unit plan already counted) whose tags count for nothing.
    countRole: text("count_role", { enum: SHEET_COUNT_ROLES }).notNull().default("counted"),
    // The page box (unrotated) and how the page is turned for display.
    width: doublePrecision("width").notNull(),
    height: doublePrecision("height").notNull(),
    rotation: integer("rotation").notNull().default(0),
    userUnit: doublePrecision("user_unit").notNull().default(1),
    // The standard scale picked for the sheet, as its ratio (1/4" = 1'-0" → 48) and how it was written.
    scaleRatio: doublePrecision("scale_ratio"),
    scaleLabel: text("scale_label"),
    calibrationPoints: jsonb("calibration_points").$type<CalibrationPoints>(),
    // Real inches per PDF unit in effect: from the picked points when there are any, else from the scale.
    inchesPerUnit: doublePrecision("inches_per_unit"),
    version: version(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex("sheets_plan_set_page_key").on(t.planSetId, t.pageNumber),
    index("sheets_project_idx").on(t.projectId),
    check("sheets_rotation", sql`${t.rotation} in (0, 90, 180, 270)`),
    check("sheets_count_role", sql`${t.countRole} in ('counted', 'reference')`),
  ],
);

/** A line of the job's window list. Lengths in inches. */
export const openingTypes = pgTable(
  "opening_types",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: orgId(),
    projectId: projectId(),
    mark: text("mark").notNull(),
    width: doublePrecision("width").notNull(),
    height: doublePrecision("height").notNull(),
    setback: doublePrecision("setback").notNull(),
    wallBuildUp: jsonb("wall_build_up").$type<WallBuildUp>(),
    trimSpec: jsonb("trim_spec").$type<TrimSpec>().notNull(),
    notes: text("notes"),
    // What the opening is (see OpeningKindName); rows made before kinds existed are plain windows.
    kind: text("kind").$type<OpeningKindName>().notNull().default("window"),
    // The kind's own fields (mulled widths and gap, door sides, round-top spring height); null for a window.
    shape: jsonb("shape").$type<OpeningShape>(),
    version: version(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex("opening_types_project_mark_key").on(t.projectId, t.mark)],
);

/** "One opening of this type here": a point on a sheet in PDF user space. */
export const tags = pgTable(
  "tags",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: orgId(),
    projectId: projectId(),
    sheetId: uuid("sheet_id")
      .notNull()
      .references(() => sheets.id, { onDelete: "cascade" }),
    // Restrict: deleting a type that still has tags would silently drop openings from the count.
    openingTypeId: uuid("opening_type_id")
      .notNull()
      .references(() => openingTypes.id, { onDelete: "restrict" }),
    x: doublePrecision("x").notNull(),
    y: doublePrecision("y").notNull(),
    // A width measured on the drawing (jamb line to jamb line), to check against the type's width.
    measuredWidth: doublePrecision("measured_width"),
    version: version(),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("tags_sheet_idx").on(t.sheetId), index("tags_project_idx").on(t.projectId)],
);
