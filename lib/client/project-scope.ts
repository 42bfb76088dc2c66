/**
 * Where a project's client resources live. Every query key of a project resource is built here, mirroring the
 * route it is read from, so no two modules can file different shapes under one key (see STYLE.md, "One owner per
 * client resource").
 */
export interface ProjectScope {
  orgSlug: string;
  projectId: string;
}

export const projectPath = (s: ProjectScope) => `/api/orgs/${s.orgSlug}/projects/${s.projectId}`;

/** Everything of one project sits under this prefix: invalidating it refreshes all of them. */
export const projectKey = (s: ProjectScope) => ["orgs", s.orgSlug, "projects", s.projectId] as const;
