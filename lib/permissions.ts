import type { Role } from "@/db/schema";

/**
 * Role → permissions, the only place that says who may do what. The role itself lives on the
 * membership row, so a change there takes effect on the next request.
 */
export const permissions = {
  "project.read": ["admin", "estimator", "project_manager"],
  "project.write": ["admin", "estimator"],
  "member.read": ["admin", "estimator", "project_manager"],
  "member.write": ["admin"],
  // The company's default trim spec, kerf and waste allowance.
  "settings.read": ["admin", "estimator", "project_manager"],
  "settings.write": ["admin"],
  // Plan sets, sheets, unit types, the window list and tags.
  "plans.read": ["admin", "estimator", "project_manager"],
  "plans.write": ["admin", "estimator"],
  // Price books: everyone prices with them, only admins change them.
  "priceBook.read": ["admin", "estimator", "project_manager"],
  "priceBook.write": ["admin"],
  // Takeoffs: estimators run them; everyone reads them.
  "takeoff.read": ["admin", "estimator", "project_manager"],
  "takeoff.run": ["admin", "estimator"],
  // Project managers mark the submitted bid (which locks it) and send it; admins may too.
  "takeoff.submit": ["admin", "project_manager"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof permissions;

export function can(role: Role, permission: Permission): boolean {
  return (permissions[permission] as readonly Role[]).includes(role);
}

export const roleLabels: Record<Role, string> = {
  admin: "Admin",
  estimator: "Estimator",
  project_manager: "Project manager",
};
