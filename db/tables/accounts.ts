import { sql } from "drizzle-orm";
import { check, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid, type AnyPgColumn } from "drizzle-orm/pg-core";
import type { TrimSpec } from "@/takeoff";
import type { TakeoffSettings } from "@/takeoff";
import { createdAt } from "./common";

export const roleEnum = pgEnum("member_role", ["admin", "estimator", "project_manager"]);

export const users = pgTable(
  "users",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    name: text("name").notNull(),
    // Stored lower-cased so sign-in and invitations match however people type it.
    email: text("email").notNull(),
    passwordHash: text("password_hash").notNull(),
    createdAt: createdAt(),
    // --- sessions (security) ---
    // Every session cookie carries the version it was issued under; sign-out, a password change and removal
    // from an organisation add one, which ends every copy of every older cookie.
    sessionVersion: integer("session_version").notNull().default(0),
  },
  (t) => [uniqueIndex("users_email_key").on(t.email), check("users_email_lower", sql`${t.email} = lower(${t.email})`)],
);

export const organisations = pgTable(
  "organisations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    name: text("name").notNull(),
    slug: text("slug").notNull(),
    // The company's usual trim spec; a new opening type starts from it. Null = the engine's defaults.
    trimDefaults: jsonb("trim_defaults").$type<TrimSpec>(),
    // Kerf and waste allowance every takeoff of the company uses. Null = the defaults in lib/takeoffs/settings.ts.
    takeoffSettings: jsonb("takeoff_settings").$type<TakeoffSettings>(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("organisations_slug_key").on(t.slug)],
);

export const memberships = pgTable(
  "memberships",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: roleEnum("role").notNull(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("memberships_org_user_key").on(t.orgId, t.userId), index("memberships_user_idx").on(t.userId)],
);

export const invitations = pgTable(
  "invitations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    // Kept (set null) when the organisation is removed, so the link can say why it no longer works.
    orgId: uuid("org_id").references(() => organisations.id, { onDelete: "set null" }),
    email: text("email").notNull(),
    role: roleEnum("role").notNull(),
    // SHA-256 of the token; the token itself only ever exists in the e-mail.
    tokenHash: text("token_hash").notNull(),
    invitedBy: uuid("invited_by").references(() => users.id, { onDelete: "set null" }),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    usedAt: timestamp("used_at", { withTimezone: true }),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
    // A newer invitation to the same address replaced this one; its link then says so instead of working.
    supersededAt: timestamp("superseded_at", { withTimezone: true }),
    supersededBy: uuid("superseded_by").references((): AnyPgColumn => invitations.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex("invitations_token_hash_key").on(t.tokenHash),
    index("invitations_org_idx").on(t.orgId),
    // One live invitation per address and organisation, so nobody holds two links with two roles.
    uniqueIndex("invitations_one_live_per_address")
      .on(t.orgId, t.email)
      .where(sql`${t.usedAt} is null and ${t.revokedAt} is null and ${t.supersededAt} is null`),
  ],
);

/** Failed sign-ins counted per key ("email:…" or "ip:…"), so throttling holds across server instances. */
export const signInThrottle = pgTable("sign_in_throttle", {
  key: text("key").primaryKey(),
  failures: integer("failures").notNull().default(0),
  firstFailureAt: timestamp("first_failure_at", { withTimezone: true }).notNull().defaultNow(),
  blockedUntil: timestamp("blocked_until", { withTimezone: true }),
});

