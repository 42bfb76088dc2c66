import { queryOptions } from "@tanstack/react-query";
import { z } from "zod";
import { ROLES } from "@/lib/client/roles";
import { request } from "./fetch";
import { orgKey, orgPath } from "./org-scope";

export const memberSchema = z.object({ id: z.string(), userId: z.string(), name: z.string(), email: z.string(), role: z.enum(ROLES) });
export type ClientMember = z.infer<typeof memberSchema>;
const listSchema = z.object({ members: z.array(memberSchema) });

export const membersPath = (orgSlug: string) => `${orgPath(orgSlug)}/members`;

/** The organisation's members by name, cached as a bare list. */
export const membersQuery = (orgSlug: string) =>
  queryOptions({
    queryKey: [...orgKey(orgSlug), "members"] as const,
    queryFn: async () => listSchema.parse(await request(membersPath(orgSlug))).members,
  });

export const membersKey = (orgSlug: string) => membersQuery(orgSlug).queryKey;
