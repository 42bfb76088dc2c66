import { and, desc, eq, gt, inArray, isNull } from "drizzle-orm";
import { db, type Tx } from "../client";
import { invitations, organisations, type Role } from "../schema";

const invitationFields = {
  id: invitations.id,
  email: invitations.email,
  role: invitations.role,
  expiresAt: invitations.expiresAt,
  createdAt: invitations.createdAt,
} as const;

/** Not used, withdrawn or replaced (it may still have expired). */
const live = () => and(isNull(invitations.usedAt), isNull(invitations.revokedAt), isNull(invitations.supersededAt));

/** The partial unique index that keeps one live invitation per address, even when two admins send at once. */
export const ONE_LIVE_INVITATION_KEY = "invitations_one_live_per_address";

export async function listPendingInvitations({ orgId }: { orgId: string }) {
  return db
    .select(invitationFields)
    .from(invitations)
    .where(and(eq(invitations.orgId, orgId), live(), gt(invitations.expiresAt, new Date())))
    .orderBy(desc(invitations.createdAt));
}

/** Marks the address's live invitations as replaced; returns them. */
export async function supersedeLiveInvitations(tx: Tx, orgId: string, email: string) {
  return tx
    .update(invitations)
    .set({ supersededAt: new Date() })
    .where(and(eq(invitations.orgId, orgId), eq(invitations.email, email), live()))
    .returning({ id: invitations.id, role: invitations.role, expiresAt: invitations.expiresAt });
}

/** The new invitation; only the token's hash is stored. */
export async function insertInvitation(
  tx: Tx,
  values: { orgId: string; email: string; role: Role; invitedBy: string; tokenHash: string; expiresAt: Date },
) {
  const [row] = await tx.insert(invitations).values(values).returning(invitationFields);
  return row!;
}

/** Records which invitation replaced these, so a failed send can give them their place back. */
export async function linkSupersededInvitations(tx: Tx, replacedIds: string[], byId: string) {
  if (replacedIds.length === 0) return;
  await tx.update(invitations).set({ supersededBy: byId }).where(inArray(invitations.id, replacedIds));
}

/** Withdraws an invitation and restores the ones it replaced, in one transaction. */
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

/** Withdraws an unused invitation; false when there was none. */
export async function revokeUnusedInvitation({ orgId, invitationId }: { orgId: string; invitationId: string }): Promise<boolean> {
  const rows = await db
    .update(invitations)
    .set({ revokedAt: new Date() })
    .where(and(eq(invitations.orgId, orgId), eq(invitations.id, invitationId), isNull(invitations.usedAt)))
    .returning({ id: invitations.id });
  return rows.length > 0;
}

/** The invitation stored under this token hash with its organisation (null fields when that is gone), or null. */
export async function findInvitationByTokenHash(tokenHash: string) {
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
    .where(eq(invitations.tokenHash, tokenHash))
    .limit(1);
  return row ?? null;
}

/** Stamps the invitation used if it is still live; false when it no longer was. */
export async function claimInvitation(tx: Tx, id: string): Promise<boolean> {
  const claimed = await tx.update(invitations).set({ usedAt: new Date() }).where(and(eq(invitations.id, id), live())).returning({ id: invitations.id });
  return claimed.length > 0;
}
