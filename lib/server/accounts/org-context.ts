import { findMembershipBySlug, type OrgContext } from "@/db/queries/memberships";
import { unauthenticated } from "@/lib/errors";

export type { OrgContext };

/**
 * The caller's membership in the organisation at this slug, or null — "not a member" and "no such org" look the
 * same. The session check rides on this read: a cookie issued under an older session version (before sign-out,
 * a password change or removal) is refused as signed out (401), whatever the slug.
 */
export async function getOrgContext(session: { userId: string; sessionVersion: number }, orgSlug: string): Promise<OrgContext | null> {
  // Slugs come from slugify (a-z, 0-9, hyphens). Anything else names no org — and a NUL would make PostgreSQL raise.
  if (!/^[a-z0-9-]{1,64}$/.test(orgSlug)) return null;
  const row = await findMembershipBySlug(session.userId, orgSlug);
  if (!row || row.sessionVersion !== session.sessionVersion) throw unauthenticated();
  if (!row.orgId || !row.orgSlug || !row.orgName || !row.role) return null;
  return { orgId: row.orgId, orgSlug: row.orgSlug, orgName: row.orgName, userId: session.userId, role: row.role };
}
