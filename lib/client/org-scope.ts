/** Where an organisation's client resources live; project resources sit under projectKey (project-scope.ts). */
export const orgPath = (orgSlug: string) => `/api/orgs/${orgSlug}`;

export const orgKey = (orgSlug: string) => ["orgs", orgSlug] as const;
