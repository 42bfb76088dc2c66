import { z } from "zod";
import { request } from "./fetch";
import { trimSpecShape } from "./opening-types";
import { orgPath } from "./org-scope";

/** The company's settings as the settings route answers; the page is handed them by the server, so nothing caches them. */
export const settingsSchema = z.object({
  trimDefaults: trimSpecShape,
  trimDefaultsOwn: z.boolean(),
  kerf: z.number(),
  wastePercent: z.number(),
  /** null: rips take the saw kerf. */
  ripKerf: z.number().nullable(),
  planSeconds: z.number(),
  scarfOverlap: z.number(),
});
export type ClientSettings = z.infer<typeof settingsSchema>;

export const saveSettings = async (orgSlug: string, body: unknown) =>
  z.object({ settings: settingsSchema }).parse(await request(`${orgPath(orgSlug)}/settings`, { method: "PATCH", body })).settings;
