import { listOrganisationsForUser } from "@/db/queries/memberships";

/** The organisations a person belongs to, by name, with their role in each (the org switcher and /orgs). */
export const organisationsOf = (userId: string) => listOrganisationsForUser(userId);
