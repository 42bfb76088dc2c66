import { queryOptions } from "@tanstack/react-query";
import { request } from "./fetch";
import type { TagView } from "@/lib/plans/api-types";
import { projectKey, projectPath, type ProjectScope } from "./project-scope";

/** A tag as the viewer holds it: `pending` while its POST is on the way (not yet editable). */
export type ViewerTag = TagView & { pending?: boolean };

/** The tags on one sheet, cached as a bare list. */
export const tagsQuery = (s: ProjectScope, sheetId: string) =>
  queryOptions({
    queryKey: [...projectKey(s), "tags", sheetId] as const,
    queryFn: async (): Promise<ViewerTag[]> => (await request<{ tags: TagView[] }>(`${projectPath(s)}/tags?sheetId=${sheetId}`)).tags,
  });

/** Keys carry their data's type, so setQueryData and getQueryData know the cached shape. */
export const tagsKey = (s: ProjectScope, sheetId: string) => tagsQuery(s, sheetId).queryKey;
