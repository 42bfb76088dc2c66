/**
 * Every table, one import away. Tables live in db/tables/ by area; relations and inferred types are here.
 */
import { relations } from "drizzle-orm";
import { invitations, memberships, organisations, roleEnum, users } from "./tables/accounts";
import { projects, projectStatusEnum } from "./tables/projects";
import { openingTypes, planSets, sheets, tags, unitTypes } from "./tables/plans";

export * from "./tables/accounts";
export * from "./tables/projects";
export * from "./tables/plans";
export * from "./tables/price-books";
export * from "./tables/takeoffs";
export * from "./tables/uploads";
export * from "./tables/seed-marks";

export const organisationsRelations = relations(organisations, ({ many }) => ({
  memberships: many(memberships),
  projects: many(projects),
}));
export const usersRelations = relations(users, ({ many }) => ({ memberships: many(memberships) }));
export const membershipsRelations = relations(memberships, ({ one }) => ({
  organisation: one(organisations, { fields: [memberships.orgId], references: [organisations.id] }),
  user: one(users, { fields: [memberships.userId], references: [users.id] }),
}));
export const projectsRelations = relations(projects, ({ one }) => ({
  organisation: one(organisations, { fields: [projects.orgId], references: [organisations.id] }),
}));

export type User = typeof users.$inferSelect;
export type NewUser = typeof users.$inferInsert;
export type Organisation = typeof organisations.$inferSelect;
export type Membership = typeof memberships.$inferSelect;
export type Role = (typeof roleEnum.enumValues)[number];
export type Invitation = typeof invitations.$inferSelect;
export type Project = typeof projects.$inferSelect;
export type NewProject = typeof projects.$inferInsert;
export type ProjectStatus = (typeof projectStatusEnum.enumValues)[number];

export const unitTypesRelations = relations(unitTypes, ({ one }) => ({
  project: one(projects, { fields: [unitTypes.projectId], references: [projects.id] }),
}));
export const planSetsRelations = relations(planSets, ({ many }) => ({ sheets: many(sheets) }));
export const sheetsRelations = relations(sheets, ({ one, many }) => ({
  planSet: one(planSets, { fields: [sheets.planSetId], references: [planSets.id] }),
  unitType: one(unitTypes, { fields: [sheets.unitTypeId], references: [unitTypes.id] }),
  tags: many(tags),
}));
export const tagsRelations = relations(tags, ({ one }) => ({
  sheet: one(sheets, { fields: [tags.sheetId], references: [sheets.id] }),
  openingType: one(openingTypes, { fields: [tags.openingTypeId], references: [openingTypes.id] }),
}));

export type UnitType = typeof unitTypes.$inferSelect;
export type PlanSet = typeof planSets.$inferSelect;
export type Sheet = typeof sheets.$inferSelect;
export type OpeningType = typeof openingTypes.$inferSelect;
export type Tag = typeof tags.$inferSelect;

export type PriceBook = typeof import("./tables/price-books").priceBooks.$inferSelect;
export type PriceBookItem = typeof import("./tables/price-books").priceBookItems.$inferSelect;
export type Takeoff = typeof import("./tables/takeoffs").takeoffs.$inferSelect;
