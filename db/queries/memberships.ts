import { and, asc, eq, sql } from "drizzle-orm";
import { db, type Tx } from "../client";
import { memberships, organisations, users, type Role } from "../schema";

export interface OrgContext {
  orgId: string;
  orgSlug: string;
  orgName: string;
  userId: string;
  role: Role;
}

/**
 * The user's current session version with their membership in the organisation at this slug, in one
 * read; the org fields are null when there is no such organisation or they are not a member of it.
 * Null when there is no such user.
 */
export async function findMembershipBySlug(userId: string, orgSlug: string) {
  const [row] = await db
    .select({
      sessionVersion: users.sessionVersion,
      orgId: organisations.id,
      orgSlug: organisations.slug,
      orgName: organisations.name,
      role: memberships.role,
    })
    .from(users)
    .leftJoin(organisations, eq(organisations.slug, orgSlug))
    .leftJoin(memberships, and(eq(memberships.userId, users.id), eq(memberships.orgId, organisations.id)))
    .where(eq(users.id, userId))
    .limit(1);
  return row ?? null;
}

export async function listOrganisationsForUser(userId: string) {
  return db
    .select({ slug: organisations.slug, name: organisations.name, role: memberships.role })
    .from(memberships)
    .innerJoin(organisations, eq(organisations.id, memberships.orgId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(organisations.name));
}

export async function listMembers({ orgId }: { orgId: string }) {
  return db
    .select({
      id: memberships.id,
      userId: users.id,
      name: users.name,
      email: users.email,
      role: memberships.role,
      joinedAt: memberships.createdAt,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.orgId, orgId))
    .orderBy(asc(users.name));
}

/** The organisation's admin memberships, locked for the rest of the transaction. */
export async function lockAdmins(tx: Tx, orgId: string): Promise<string[]> {
  const admins = await tx
    .select({ id: memberships.id })
    .from(memberships)
    .where(and(eq(memberships.orgId, orgId), eq(memberships.role, "admin")))
    .for("update");
  return admins.map((a) => a.id);
}

/** The membership, locked for the rest of the transaction, or null. */
export async function lockMember(tx: Tx, orgId: string, membershipId: string) {
  const [member] = await tx
    .select({ id: memberships.id, role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.orgId, orgId), eq(memberships.id, membershipId)))
    .for("update");
  return member ?? null;
}

export async function updateMemberRole(tx: Tx, { orgId, membershipId, role }: { orgId: string; membershipId: string; role: Role }) {
  const [row] = await tx
    .update(memberships)
    .set({ role })
    .where(and(eq(memberships.orgId, orgId), eq(memberships.id, membershipId)))
    .returning({ id: memberships.id, role: memberships.role });
  return row ?? null;
}

/** Deletes the membership; returns whose it was, or null when there was none. */
export async function deleteMember(tx: Tx, { orgId, membershipId }: { orgId: string; membershipId: string }) {
  const [removed] = await tx
    .delete(memberships)
    .where(and(eq(memberships.orgId, orgId), eq(memberships.id, membershipId)))
    .returning({ userId: memberships.userId });
  return removed?.userId ?? null;
}

/** Adds the membership unless the person already has one here; false when they had. */
export async function insertMembership(tx: Tx, values: { orgId: string; userId: string; role: Role }): Promise<boolean> {
  const joined = await tx
    .insert(memberships)
    .values(values)
    .onConflictDoNothing({ target: [memberships.orgId, memberships.userId] })
    .returning({ id: memberships.id });
  return joined.length > 0;
}

/** Whether someone with this e-mail is already a member of the organisation. */
export async function isMemberByEmail(orgId: string, email: string): Promise<boolean> {
  const rows = await db
    .select({ id: memberships.id })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.orgId, orgId), eq(users.email, email)));
  return rows.length > 0;
}

export async function countMembers({ orgId }: { orgId: string }) {
  const [row] = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(memberships)
    .where(eq(memberships.orgId, orgId));
  return row?.n ?? 0;
}
