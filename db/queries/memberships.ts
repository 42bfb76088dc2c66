import { and, asc, eq, sql } from "drizzle-orm";
import { db, type Tx } from "../client";
import { memberships, organisations, users, type Role } from "../schema";
import { conflict, notFound } from "@/lib/errors";

export interface OrgContext {
  orgId: string;
  orgSlug: string;
  orgName: string;
  userId: string;
  role: Role;
}

/** The caller's membership in the organisation at this slug, or null — "not a member" and "no such org" look the same. */
export async function getOrgContext(userId: string, orgSlug: string): Promise<OrgContext | null> {
  // Slugs come from slugify (a-z, 0-9, hyphens). Anything else names no org — and a NUL would make PostgreSQL raise.
  if (!/^[a-z0-9-]{1,64}$/.test(orgSlug)) return null;
  const [row] = await db
    .select({
      orgId: organisations.id,
      orgSlug: organisations.slug,
      orgName: organisations.name,
      userId: memberships.userId,
      role: memberships.role,
    })
    .from(memberships)
    .innerJoin(organisations, eq(organisations.id, memberships.orgId))
    .where(and(eq(memberships.userId, userId), eq(organisations.slug, orgSlug)))
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

/**
 * Locks the organisation's admin rows and refuses when the change would leave it without an admin.
 * The lock makes two admins demoting each other at the same moment safe.
 */
async function assertAnotherAdmin(tx: Tx, orgId: string, membershipId: string) {
  const admins = await tx
    .select({ id: memberships.id })
    .from(memberships)
    .where(and(eq(memberships.orgId, orgId), eq(memberships.role, "admin")))
    .for("update");
  if (admins.every((a) => a.id === membershipId)) {
    throw conflict("An organisation needs at least one admin. Make someone else an admin first.", {
      role: "The last admin cannot be removed or demoted.",
    });
  }
}

async function lockMember(tx: Tx, orgId: string, membershipId: string) {
  const [member] = await tx
    .select({ id: memberships.id, role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.orgId, orgId), eq(memberships.id, membershipId)))
    .for("update");
  if (!member) throw notFound("No such member.");
  return member;
}

export async function changeMemberRole({ orgId, membershipId, role }: { orgId: string; membershipId: string; role: Role }) {
  return db.transaction(async (tx) => {
    const member = await lockMember(tx, orgId, membershipId);
    if (member.role === "admin" && role !== "admin") await assertAnotherAdmin(tx, orgId, membershipId);
    const [row] = await tx
      .update(memberships)
      .set({ role })
      .where(and(eq(memberships.orgId, orgId), eq(memberships.id, membershipId)))
      .returning({ id: memberships.id, role: memberships.role });
    return row!;
  });
}

export async function removeMember({ orgId, membershipId }: { orgId: string; membershipId: string }) {
  await db.transaction(async (tx) => {
    const member = await lockMember(tx, orgId, membershipId);
    if (member.role === "admin") await assertAnotherAdmin(tx, orgId, membershipId);
    await tx.delete(memberships).where(and(eq(memberships.orgId, orgId), eq(memberships.id, membershipId)));
  });
}

export async function countMembers({ orgId }: { orgId: string }) {
  const [row] = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(memberships)
    .where(eq(memberships.orgId, orgId));
  return row?.n ?? 0;
}
