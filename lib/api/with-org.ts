import type { NextRequest } from "next/server";
import { sessionFromRequest } from "@/lib/auth/session";
import { forbidden, notFound, unauthenticated } from "@/lib/errors";
import { errorResponse } from "./error-response";
import { refuseCrossSite } from "./same-origin";
import { can, type Permission } from "@/lib/permissions";
import { getOrgContext, type OrgContext } from "@/lib/server/accounts/org-context";

type Params = Record<string, string>;
type RouteContext<P> = { params: Promise<P> };

/**
 * The one wrapper for org-scoped route handlers: session → membership (by slug) → permission.
 * A slug you are not a member of answers 404, exactly like one that does not exist.
 */
export function withOrg<P extends Params & { orgSlug: string }>(
  handler: (args: { req: NextRequest; params: P; org: OrgContext }) => Promise<Response>,
  options: { permission: Permission },
) {
  return async (req: NextRequest, context: RouteContext<P>): Promise<Response> => {
    try {
      refuseCrossSite(req);
      const session = await sessionFromRequest(req);
      if (!session) throw unauthenticated();
      const params = await context.params;
      const org = await getOrgContext(session, params.orgSlug);
      if (!org) throw notFound("No such organisation.");
      if (!can(org.role, options.permission)) throw forbidden();
      return await handler({ req, params, org });
    } catch (error) {
      return errorResponse(error);
    }
  };
}

/** For routes anyone may call (sign-up, accepting an invitation): only the error mapping. */
export function publicRoute<P extends Params>(handler: (args: { req: NextRequest; params: P }) => Promise<Response>) {
  return async (req: NextRequest, context: RouteContext<P>): Promise<Response> => {
    try {
      refuseCrossSite(req);
      return await handler({ req, params: await context.params });
    } catch (error) {
      return errorResponse(error);
    }
  };
}
