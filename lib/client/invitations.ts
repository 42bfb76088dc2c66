import { queryOptions } from "@tanstack/react-query";
import { z } from "zod";
import { ROLES } from "@/lib/client/roles";
import { request } from "./fetch";
import { orgKey, orgPath } from "./org-scope";

export const invitationSchema = z.object({ id: z.string(), email: z.string(), role: z.enum(ROLES), expiresAt: z.string() });
export type ClientInvitation = z.infer<typeof invitationSchema>;
const listSchema = z.object({ invitations: z.array(invitationSchema) });

/** What POST …/invitations answers: the new invitation and the earlier ones to the same address it replaced. */
export const sentInvitationSchema = z.object({
  invitation: z.object({ email: z.string(), role: z.enum(ROLES) }),
  replaced: z.array(z.object({ role: z.enum(ROLES) })),
});

export const invitationsPath = (orgSlug: string) => `${orgPath(orgSlug)}/invitations`;

/** Invitations not yet used, withdrawn or expired, newest first, cached as a bare list. */
export const invitationsQuery = (orgSlug: string) =>
  queryOptions({
    queryKey: [...orgKey(orgSlug), "invitations"] as const,
    queryFn: async () => listSchema.parse(await request(invitationsPath(orgSlug))).invitations,
  });

export const invitationsKey = (orgSlug: string) => invitationsQuery(orgSlug).queryKey;

export const sendInvitation = async (orgSlug: string, body: { email: string; role: string }) =>
  sentInvitationSchema.parse(await request(invitationsPath(orgSlug), { method: "POST", body }));
