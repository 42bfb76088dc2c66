import { queryOptions } from "@tanstack/react-query";
import { z } from "zod";
import type { TagView } from "@/lib/plans/api-types";
import { request } from "./fetch";
import { projectKey, projectPath, type ProjectScope } from "./project-scope";

/** A tag as the tags routes send it (`satisfies` keeps the schema in step with TagView). */
export const tagSchema = z.object({
  id: z.string(),
  sheetId: z.string(),
  openingTypeId: z.string(),
  x: z.number(),
  y: z.number(),
  measuredWidth: z.number().nullable(),
  widthMismatch: z.boolean(),
  version: z.number(),
}) satisfies z.ZodType<TagView>;
const listSchema = z.object({ tags: z.array(tagSchema) });

/** A tag as the viewer holds it: `pending` while its POST is on the way (not yet editable). */
export type ViewerTag = TagView & { pending?: boolean };

/** The tags on one sheet, cached as a bare list. */
export const tagsQuery = (s: ProjectScope, sheetId: string) =>
  queryOptions({
    queryKey: [...projectKey(s), "tags", sheetId] as const,
    queryFn: async (): Promise<ViewerTag[]> => listSchema.parse(await request(`${projectPath(s)}/tags?sheetId=${sheetId}`)).tags,
  });

/** Keys carry their data's type, so setQueryData and getQueryData know the cached shape. */
export const tagsKey = (s: ProjectScope, sheetId: string) => tagsQuery(s, sheetId).queryKey;
