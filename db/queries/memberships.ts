import { and, asc, eq, sql } from "drizzle-orm";
import { db, type Tx } from "../client";
import { memberships, organisations, users, type Role } from "../schema";
import { conflict, notFound, unauthenticated } from "@/lib/errors";
import { bumpSessionVersion } from "./users";

export interface OrgContext {
  orgId: string;
  orgSlug: string;
  orgName: string;
  userId: string;
  role: Role;
}

/**
 * The caller's membership in the organisation at this slug, or null — "not a member" and "no such org" look the
 * same. The session check rides on this read: a cookie issued under an older session version (before sign-out,
 * a password change or removal) is refused as signed out (401), whatever the slug.
 */
export async function getOrgContext(
  session: { userId: string; sessionVersion: number },
  orgSlug: string,
): Promise<OrgContext | null> {
  // Slugs come from slugify (a-z, 0-9, hyphens). Anything else names no org — and a NUL would make PostgreSQL raise.
  if (!/^[a-z0-9-]{1,64}$/.test(orgSlug)) return null;
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
    .where(eq(users.id, session.userId))
    .limit(1);
  if (!row || row.sessionVersion !== session.sessionVersion) throw unauthenticated();
  if (!row.orgId || !row.orgSlug || !row.orgName || !row.role) return null;
  return { orgId: row.orgId, orgSlug: row.orgSlug, orgName: row.orgName, userId: session.userId, role: row.role };
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
    const [removed] = await tx
      .delete(memberships)
      .where(and(eq(memberships.orgId, orgId), eq(memberships.id, membershipId)))
      .returning({ userId: memberships.userId });
    // A removed person's open sessions end too, so nothing they had loaded keeps working anywhere.
    if (removed) await bumpSessionVersion(removed.userId, tx);
  });
}

export async function countMembers({ orgId }: { orgId: string }) {
  const [row] = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(memberships)
    .where(eq(memberships.orgId, orgId));
  return row?.n ?? 0;
}
