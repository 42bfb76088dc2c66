import { db, type Tx } from "@/db/client";
import { deleteMember, listMembers, lockAdmins, lockMember, updateMemberRole } from "@/db/queries/memberships";
import { bumpSessionVersion } from "@/db/queries/users";
import type { Role } from "@/db/schema";
import { conflict, orNotFound } from "@/lib/errors";

const MISSING = "No such member.";

export const membersOf = (org: { orgId: string }) => listMembers(org);

/**
 * Refuses when the change would leave the organisation without an admin. The admin rows are locked
 * first, so two admins demoting each other at the same moment cannot both succeed.
 */
async function assertAnotherAdmin(tx: Tx, orgId: string, membershipId: string) {
  const admins = await lockAdmins(tx, orgId);
  if (admins.every((id) => id === membershipId)) {
    throw conflict("An organisation needs at least one admin. Make someone else an admin first.", {
      role: "The last admin cannot be removed or demoted.",
    });
  }
}

export async function changeMemberRole(args: { orgId: string; membershipId: string; role: Role }) {
  return db.transaction(async (tx) => {
    const member = orNotFound(await lockMember(tx, args.orgId, args.membershipId), MISSING);
    if (member.role === "admin" && args.role !== "admin") await assertAnotherAdmin(tx, args.orgId, args.membershipId);
    return orNotFound(await updateMemberRole(tx, args), MISSING);
  });
}

export async function removeMember(args: { orgId: string; membershipId: string }) {
  await db.transaction(async (tx) => {
    const member = orNotFound(await lockMember(tx, args.orgId, args.membershipId), MISSING);
    if (member.role === "admin") await assertAnotherAdmin(tx, args.orgId, args.membershipId);
    const userId = await deleteMember(tx, args);
    // A removed person's open sessions end too, so nothing they had loaded keeps working anywhere.
    if (userId) await bumpSessionVersion(userId, tx);
  });
}
