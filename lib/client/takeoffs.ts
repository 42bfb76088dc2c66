import { queryOptions } from "@tanstack/react-query";
import { z } from "zod";
import type { TakeoffDetail } from "@/lib/takeoffs/view";
import { request } from "./fetch";
import { projectKey, projectPath, type ProjectScope } from "./project-scope";

/** One row of GET …/takeoffs: the headline figures only. */
export const takeoffListItemSchema = z.object({
  id: z.string(),
  name: z.string(),
  note: z.string().nullable(),
  status: z.enum(["draft", "submitted"]),
  createdAt: z.string(),
  createdByName: z.string().nullable(),
  submittedAt: z.string().nullable(),
  priceBookName: z.string(),
  openingsTotal: z.number(),
  bidTotal: z.number(),
});
const listSchema = z.object({ takeoffs: z.array(takeoffListItemSchema) });

export interface TakeoffScope extends ProjectScope {
  takeoffId: string;
}

export const takeoffsPath = (s: ProjectScope) => `${projectPath(s)}/takeoffs`;
export const takeoffPath = (s: TakeoffScope) => `${takeoffsPath(s)}/${s.takeoffId}`;

/** The project's saved takeoffs, cached as a bare list. */
export const takeoffsQuery = (s: ProjectScope) =>
  queryOptions({
    queryKey: [...projectKey(s), "takeoffs"] as const,
    queryFn: async () => listSchema.parse(await request(takeoffsPath(s))).takeoffs,
  });

/** One saved takeoff; its figures never change, only its status. Its sends sit under this key too. */
export const takeoffQuery = (s: TakeoffScope) =>
  queryOptions({
    queryKey: [...projectKey(s), "takeoff", s.takeoffId] as const,
    queryFn: async () => (await request<{ takeoff: TakeoffDetail }>(takeoffPath(s))).takeoff,
  });

export const takeoffsKey = (s: ProjectScope) => takeoffsQuery(s).queryKey;
export const takeoffKey = (s: TakeoffScope) => takeoffQuery(s).queryKey;
