import { and, desc, eq, gt, inArray, isNull } from "drizzle-orm";
import { db } from "../client";
import { isUniqueViolation } from "../errors";
import { invitations, memberships, organisations, users, type Role } from "../schema";
import { AppError, conflict, gone, notFound } from "@/lib/errors";
import { hashInviteToken, INVITE_LIFETIME_MS, newInviteToken } from "@/lib/auth/invite-token";
import { hashPassword, verifyPassword } from "@/lib/auth/password";
import { getUserByEmail } from "./users";

const invitationFields = {
  id: invitations.id,
  email: invitations.email,
  role: invitations.role,
  expiresAt: invitations.expiresAt,
  createdAt: invitations.createdAt,
} as const;

/** Not used, withdrawn or replaced (it may still have expired). */
const live = () => and(isNull(invitations.usedAt), isNull(invitations.revokedAt), isNull(invitations.supersededAt));
const ONE_LIVE = "invitations_one_live_per_address";

export async function listPendingInvitations({ orgId }: { orgId: string }) {
  return db
    .select(invitationFields)
    .from(invitations)
    .where(
      and(eq(invitations.orgId, orgId), live(), gt(invitations.expiresAt, new Date())),
    )
    .orderBy(desc(invitations.createdAt));
}


/**
 * Creates the invitation and returns the raw token (for the e-mail only; it is not stored). A new
 * invitation to an address that already holds one replaces it: the admin is usually correcting the
 * role or re-sending a lost e-mail, and refusing would only make them withdraw and invite again. The
 * old link then says it was replaced (describeInvitation), and a partial unique index keeps one live
 * invitation per address even when two admins send at the same moment.
 */
export async function createInvitation(args: { orgId: string; invitedBy: string; email: string; role: Role }) {
  const already = await db
    .select({ id: memberships.id })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.orgId, args.orgId), eq(users.email, args.email)));
  if (already.length > 0) {
    throw conflict("This person is already a member.", { email: "Already a member of this organisation." });
  }
  const token = newInviteToken();
  try {
    return await db.transaction(async (tx) => {
      const replaced = await tx
        .update(invitations)
        .set({ supersededAt: new Date() })
        .where(and(eq(invitations.orgId, args.orgId), eq(invitations.email, args.email), live()))
        .returning({ id: invitations.id, role: invitations.role, expiresAt: invitations.expiresAt });
      const [row] = await tx
        .insert(invitations)
        .values({
          orgId: args.orgId,
          email: args.email,
          role: args.role,
          invitedBy: args.invitedBy,
          tokenHash: hashInviteToken(token),
          expiresAt: new Date(Date.now() + INVITE_LIFETIME_MS),
        })
        .returning(invitationFields);
      if (replaced.length > 0) {
        await tx.update(invitations).set({ supersededBy: row!.id }).where(inArray(invitations.id, replaced.map((r) => r.id)));
      }
      // Only a replaced invitation that could still have been used is worth telling the admin about.
      const pending = replaced.filter((r) => r.expiresAt.getTime() > Date.now());
      return { invitation: row!, token, replaced: pending.map((r) => ({ role: r.role })) };
    });
  } catch (error) {
    if (isUniqueViolation(error, ONE_LIVE)) {
      throw conflict("Another invitation to this address was sent at the same moment. Reload to see it.", { email: "An invitation to this address was just sent." });
    }
    throw error;
  }
}

/**
 * Takes back an invitation whose e-mail never went out, and gives the one it replaced its place back,
 * so a failed send leaves things as they were.
 */
export async function withdrawUnsentInvitation({ orgId, invitationId }: { orgId: string; invitationId: string }) {
  await db.transaction(async (tx) => {
    await tx
      .update(invitations)
      .set({ revokedAt: new Date() })
      .where(and(eq(invitations.orgId, orgId), eq(invitations.id, invitationId)));
    await tx
      .update(invitations)
      .set({ supersededAt: null, supersededBy: null })
      .where(and(eq(invitations.orgId, orgId), eq(invitations.supersededBy, invitationId)));
  });
}

export async function revokeInvitation({ orgId, invitationId }: { orgId: string; invitationId: string }) {
  const [row] = await db
    .update(invitations)
    .set({ revokedAt: new Date() })
    .where(and(eq(invitations.orgId, orgId), eq(invitations.id, invitationId), isNull(invitations.usedAt)))
    .returning({ id: invitations.id });
  if (!row) throw notFound("No such pending invitation.");
}

const superseded = () =>
  gone("This invitation was replaced by a newer one sent to the same address, so this link no longer works and nothing was changed. Use the link in the most recent invitation e-mail.");

/** Looks a token up and says, in words a person understands, why it cannot be used. */
export async function describeInvitation(token: string) {
  const [row] = await db
    .select({
      id: invitations.id,
      email: invitations.email,
      role: invitations.role,
      expiresAt: invitations.expiresAt,
      usedAt: invitations.usedAt,
      revokedAt: invitations.revokedAt,
      supersededAt: invitations.supersededAt,
      orgId: invitations.orgId,
      orgName: organisations.name,
      orgSlug: organisations.slug,
    })
    .from(invitations)
    .leftJoin(organisations, eq(organisations.id, invitations.orgId))
    .where(eq(invitations.tokenHash, hashInviteToken(token)))
    .limit(1);
  if (!row) throw notFound("This invitation link is not valid. Check that you copied the whole link, or ask for a new invitation.");
  if (row.usedAt) throw gone("This invitation has already been used. Sign in instead, or ask for a new invitation.");
  if (row.revokedAt) throw gone("This invitation was withdrawn by an admin. Ask for a new invitation.");
  if (row.supersededAt) throw superseded();
  if (!row.orgId || !row.orgSlug || !row.orgName) throw gone("The organisation that sent this invitation no longer exists.");
  if (row.expiresAt.getTime() <= Date.now()) throw gone("This invitation has expired. Invitations last 7 days; ask for a new one.");
  const existing = await getUserByEmail(row.email);
  return {
    id: row.id,
    email: row.email,
    role: row.role,
    orgId: row.orgId,
    orgName: row.orgName,
    orgSlug: row.orgSlug,
    expiresAt: row.expiresAt,
    hasAccount: existing !== null,
  };
}

/**
 * Accepts an invitation: a new person gets an account; an existing one proves it with their password.
 * The used-at stamp is set in the same transaction with a guard, so a link works exactly once.
 */
export async function acceptInvitation(args: { token: string; name?: string; password: string }) {
  const invite = await describeInvitation(args.token);
  const existing = await getUserByEmail(invite.email);
  if (existing) {
    if (!(await verifyPassword(args.password, existing.passwordHash))) {
      throw new AppError(422, "That password does not match your existing account.", { password: "Wrong password for this account." });
    }
  } else if (!args.name) {
    throw new AppError(422, "Tell us your name.", { name: "Name is required." });
  }
  const passwordHash = existing ? null : await hashPassword(args.password);

  return db.transaction(async (tx) => {
    const claimed = await tx
      .update(invitations)
      .set({ usedAt: new Date() })
      .where(and(eq(invitations.id, invite.id), live()))
      .returning({ id: invitations.id });
    if (claimed.length === 0) {
      // Replaced or withdrawn between the look-up and now: say which, as the look-up would.
      await describeInvitation(args.token);
      throw gone("This invitation has already been used. Sign in instead.");
    }

    let userId = existing?.id;
    if (!userId) {
      const [created] = await tx
        .insert(users)
        .values({ name: args.name!, email: invite.email, passwordHash: passwordHash! })
        .returning({ id: users.id });
      userId = created!.id;
    }
    const joined = await tx
      .insert(memberships)
      .values({ orgId: invite.orgId, userId, role: invite.role })
      .onConflictDoNothing({ target: [memberships.orgId, memberships.userId] })
      .returning({ id: memberships.id });
    // Rolled back with the claim, so the link stays unused rather than "accepted" to no effect.
    if (joined.length === 0) throw conflict(`You are already a member of ${invite.orgName}. Sign in to continue.`);
    return { email: invite.email, orgSlug: invite.orgSlug, role: invite.role };
  });
}
