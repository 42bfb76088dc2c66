import { queryOptions } from "@tanstack/react-query";
import { z } from "zod";
import { request } from "./fetch";
import { orgKey, orgPath } from "./org-scope";
import { projectKey, projectPath, type ProjectScope } from "./project-scope";

/** A project as GET …/projects and …/projects/[id] send it; timestamps come back as Dates, as server pages hand them. */
export const projectSchema = z.object({
  id: z.string(),
  name: z.string(),
  generalContractor: z.string().nullable(),
  bidDue: z.string().nullable(),
  status: z.enum(["draft", "submitted", "won", "lost"]),
  archivedAt: z.coerce.date().nullable(),
  createdAt: z.coerce.date(),
  updatedAt: z.coerce.date(),
  submittedTakeoff: z.object({ id: z.string(), name: z.string() }).nullable(),
});
export type ClientProject = z.infer<typeof projectSchema>;

const listSchema = z.object({ projects: z.array(projectSchema) });
const oneSchema = z.object({ project: projectSchema });

export const projectsPath = (orgSlug: string) => `${orgPath(orgSlug)}/projects`;

/** Both lists (with and without archived projects) sit under this prefix. Not under projectKey: a list is not a project. */
export const projectListKey = (orgSlug: string) => [...orgKey(orgSlug), "project-list"] as const;

/** The organisation's projects, bid due first; archived ones only when asked for. */
export const projectsQuery = (orgSlug: string, includeArchived: boolean) =>
  queryOptions({
    queryKey: [...projectListKey(orgSlug), includeArchived ? "with-archived" : "live"] as const,
    queryFn: async () => listSchema.parse(await request(`${projectsPath(orgSlug)}${includeArchived ? "?archived=include" : ""}`)).projects,
  });

/** One project's details, cached as the bare project. */
export const projectQuery = (s: ProjectScope) =>
  queryOptions({
    queryKey: [...projectKey(s), "details"] as const,
    queryFn: async () => oneSchema.parse(await request(projectPath(s))).project,
  });

export const projectDetailsKey = (s: ProjectScope) => projectQuery(s).queryKey;

export type ProjectPatch = Partial<{ name: string; generalContractor: string; bidDue: string; status: string; archived: boolean }>;

export const updateProject = async (s: ProjectScope, patch: ProjectPatch) =>
  oneSchema.parse(await request(projectPath(s), { method: "PATCH", body: patch })).project;

export const createProject = async (orgSlug: string, body: Record<string, string>) =>
  oneSchema.parse(await request(projectsPath(orgSlug), { method: "POST", body })).project;
