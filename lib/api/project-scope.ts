import type { OrgContext } from "@/db/queries/memberships";
import type { ProjectScope } from "@/db/queries/project-scope";
import { parseId } from "./read-input";

/** The org from the session's membership and the project from the URL: what every plans query takes. */
export const projectScope = (org: OrgContext, params: { projectId: string }): ProjectScope => ({
  orgId: org.orgId,
  projectId: parseId(params.projectId, "project"),
});
