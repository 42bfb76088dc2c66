import type { Role } from "@/db/schema";

/** The membership roles, for response schemas on the client (db/schema's enum would pull drizzle into the browser). */
export const ROLES = ["admin", "estimator", "project_manager"] as const satisfies readonly Role[];

// Fails to compile when a role is added to the database enum and not here.
const everyRole: Record<Role, true> = { admin: true, estimator: true, project_manager: true };
void everyRole;
