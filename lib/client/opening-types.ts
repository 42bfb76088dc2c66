import { queryOptions } from "@tanstack/react-query";
import { z } from "zod";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import type { TrimSpec, WallBuildUp } from "@/takeoff";
import { request } from "./fetch";
import { projectKey, projectPath, type ProjectScope } from "./project-scope";

/*
 * The shape only, not the engine's rules (takeoff/schemas.ts): a row stored under older rules must still be
 * shown so it can be fixed. `satisfies` keeps each schema in step with the type the routes build.
 */
export const trimSpecShape = z.object({
  style: z.enum(["stool-and-apron", "picture-frame"]),
  casingWidth: z.number(),
  casingThickness: z.number(),
  reveal: z.number().optional(),
  stoolHorn: z.number().optional(),
  stoolProjection: z.number().optional(),
  apronInset: z.number().optional(),
  apronReturns: z.boolean().optional(),
  extensionThickness: z.number().optional(),
}) satisfies z.ZodType<TrimSpec>;

const wallBuildUp = z.object({
  stud: z.enum(["2x4", "2x6", "2x8"]),
  wallboard: z.enum(["1/4", "3/8", "1/2", "5/8"]),
  wallboardLayers: z.number().optional(),
  sheathing: z.number().optional(),
  frameDepth: z.number(),
}) satisfies z.ZodType<WallBuildUp>;

export const openingTypeSchema = z.object({
  id: z.string(),
  mark: z.string(),
  width: z.number(),
  height: z.number(),
  setback: z.number(),
  wallBuildUp: wallBuildUp.nullable(),
  trimSpec: trimSpecShape,
  notes: z.string().nullable(),
  kind: z.enum(["window", "mulled", "door", "round-top"]),
  shape: z
    .object({
      widths: z.array(z.number()).optional(),
      mullGap: z.number().optional(),
      sides: z.union([z.literal(1), z.literal(2)]).optional(),
      springHeight: z.number().optional(),
    })
    .nullable(),
  version: z.number(),
}) satisfies z.ZodType<OpeningTypeView>;
const listSchema = z.object({ openingTypes: z.array(openingTypeSchema) });

/** The project's window list, cached as a bare list in the order the server sends (by mark). */
export const openingTypesQuery = (s: ProjectScope) =>
  queryOptions({
    queryKey: [...projectKey(s), "opening-types"] as const,
    queryFn: async () => listSchema.parse(await request(`${projectPath(s)}/opening-types`)).openingTypes,
  });

/** Keys carry their data's type, so setQueryData and getQueryData know the cached shape. */
export const openingTypesKey = (s: ProjectScope) => openingTypesQuery(s).queryKey;
