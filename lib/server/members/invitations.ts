import { db } from "@/db/client";
import { isUniqueViolation } from "@/db/errors";
import {
  findInvitationByTokenHash,
  insertInvitation,
  linkSupersededInvitations,
  listPendingInvitations,
  ONE_LIVE_INVITATION_KEY,
  revokeUnusedInvitation,
  supersedeLiveInvitations,
} from "@/db/queries/invitations";
import { isMemberByEmail } from "@/db/queries/memberships";
import { getUserByEmail } from "@/db/queries/users";
import type { Role } from "@/db/schema";
import { conflict, gone, notFound, orNotFound } from "@/lib/errors";
import { hashInviteToken, INVITE_LIFETIME_MS, newInviteToken } from "@/lib/auth/invite-token";

export const pendingInvitationsOf = (org: { orgId: string }) => listPendingInvitations(org);

/**
 * Creates the invitation and returns the raw token (for the e-mail only; it is not stored). A new
 * invitation to an address that already holds one replaces it: the admin is usually correcting the
 * role or re-sending a lost e-mail, and refusing would only make them withdraw and invite again. The
 * old link then says it was replaced (describeInvitation), and a partial unique index keeps one live
 * invitation per address even when two admins send at the same moment.
 */
export async function createInvitation(args: { orgId: string; invitedBy: string; email: string; role: Role }) {
  if (await isMemberByEmail(args.orgId, args.email)) {
    throw conflict("This person is already a member.", { email: "Already a member of this organisation." });
  }
  const token = newInviteToken();
  try {
    return await db.transaction(async (tx) => {
      const replaced = await supersedeLiveInvitations(tx, args.orgId, args.email);
      const invitation = await insertInvitation(tx, {
        orgId: args.orgId,
        email: args.email,
        role: args.role,
        invitedBy: args.invitedBy,
        tokenHash: hashInviteToken(token),
        expiresAt: new Date(Date.now() + INVITE_LIFETIME_MS),
      });
      await linkSupersededInvitations(tx, replaced.map((r) => r.id), invitation.id);
      // Only a replaced invitation that could still have been used is worth telling the admin about.
      const pending = replaced.filter((r) => r.expiresAt.getTime() > Date.now());
      return { invitation, token, replaced: pending.map((r) => ({ role: r.role })) };
    });
  } catch (error) {
    if (isUniqueViolation(error, ONE_LIVE_INVITATION_KEY)) {
      throw conflict("Another invitation to this address was sent at the same moment. Reload to see it.", { email: "An invitation to this address was just sent." });
    }
    throw error;
  }
}

export async function revokeInvitation(args: { orgId: string; invitationId: string }) {
  if (!(await revokeUnusedInvitation(args))) throw notFound("No such pending invitation.");
}

const superseded = () =>
  gone("This invitation was replaced by a newer one sent to the same address, so this link no longer works and nothing was changed. Use the link in the most recent invitation e-mail.");

/** Looks a token up and says, in words a person understands, why it cannot be used. */
export async function describeInvitation(token: string) {
  const row = orNotFound(
    await findInvitationByTokenHash(hashInviteToken(token)),
    "This invitation link is not valid. Check that you copied the whole link, or ask for a new invitation.",
  );
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
