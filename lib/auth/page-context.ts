import { cache } from "react";
import { headers } from "next/headers";
import { notFound, redirect } from "next/navigation";
import { getSessionUser } from "@/db/queries/users";
import { can, type Permission } from "@/lib/permissions";
import { getOrgContext } from "@/lib/server/accounts/org-context";
import { REQUEST_PATH_HEADER, safeReturnPath } from "./return-to";
import { currentSession } from "./session";

/** Signed-in user for a server page, or a redirect to sign-in that comes back here. */
export const requireUser = cache(async (returnTo: string) => {
  const session = await currentSession();
  const user = session ? await getSessionUser(session) : null;
  if (!session || !user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(returnTo)}`);
  return { ...user, session };
});

/** The page this request asked for (set by proxy.ts), so sign-in can bring a deep link back to it. */
async function requestedPath(fallback: string) {
  return safeReturnPath((await headers()).get(REQUEST_PATH_HEADER), fallback);
}

/** The caller's membership for an org page; a slug they don't belong to is a 404, like one that doesn't exist. */
export const requireOrg = cache(async (orgSlug: string) => {
  const user = await requireUser(await requestedPath(`/${orgSlug}`));
  const org = await getOrgContext(user.session, orgSlug);
  if (!org) notFound();
  return {
    user,
    org,
    can: (p: Permission) => can(org.role, p),
  };
});
