import type { z } from "zod";
import { currentSession } from "@/lib/auth/session";
import { fieldErrors, forbidden, notFound, toAppError, unauthenticated } from "@/lib/errors";
import { can, type Permission } from "@/lib/permissions";
import { getOrgContext, type OrgContext } from "@/lib/server/accounts/org-context";

export type ActionResult<T> =
  | { ok: true; data: T }
  | { ok: false; status: number; error: string; fields?: Record<string, string> };

/**
 * The one wrapper for server actions, the twin of `withOrg`: session → membership → permission →
 * zod-validated FormData. The form posts its organisation as the hidden field `orgSlug`.
 * Results are plain data for `useActionState`; nothing is thrown to the client.
 */
export function orgAction<S extends z.ZodType, T>(
  options: { permission: Permission; schema: S },
  run: (input: z.output<S>, org: OrgContext) => Promise<T>,
) {
  return async (_previous: ActionResult<T> | null, formData: FormData): Promise<ActionResult<T>> => {
    try {
      const session = await currentSession();
      if (!session) throw unauthenticated();
      const org = await getOrgContext(session, String(formData.get("orgSlug") ?? ""));
      if (!org) throw notFound("No such organisation.");
      if (!can(org.role, options.permission)) throw forbidden();
      const raw = Object.fromEntries([...formData.entries()].filter(([k]) => k !== "orgSlug" && !k.startsWith("$")));
      const parsed = options.schema.safeParse(raw);
      if (!parsed.success) {
        return { ok: false, status: 422, error: "Some fields need attention.", fields: fieldErrors(parsed.error) };
      }
      return { ok: true, data: await run(parsed.data, org) };
    } catch (error) {
      const known = toAppError(error);
      if (!known) {
        console.error(error);
        return { ok: false, status: 500, error: "Something went wrong on our side." };
      }
      return { ok: false, status: known.status, error: known.message, fields: known.fields };
    }
  };
}
